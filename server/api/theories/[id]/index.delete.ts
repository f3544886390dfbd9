import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { useDb } from '../../../utils/db/connection'

// Only owners delete a theory (with its bases, notes and share links).
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  await requireGroupRole(event, theory.group_id, 'owner')
  await useDb()('theories').where({ id: theory.id }).delete()
  return { deleted: theory.id }
})
