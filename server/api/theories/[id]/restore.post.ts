import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404, publicTheory } from '../../../utils/db/theories'
import { restoreDeleted } from '../../../utils/db/softDelete'

// Undo of a theory's deletion (owners); refused while another theory of the group has its name.
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'), { deleted: true })
  await requireGroupRole(event, theory.group_id, 'owner')
  await restoreDeleted('theories', theory.id)
  return { restored: theory.id, theory: publicTheory(await theoryOr404(theory.id)) }
})
