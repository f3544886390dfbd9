import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { restoreDeleted } from '../../../utils/db/softDelete'

// Undo of a basis's deletion (owners).
export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'), { deleted: true })
  await requireGroupRole(event, basis.group_id, 'owner')
  await restoreDeleted('bases', basis.id)
  return { restored: basis.id }
})
