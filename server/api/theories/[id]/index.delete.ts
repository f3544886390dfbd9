import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { markDeleted } from '../../../utils/db/softDelete'

// Only owners delete a theory; its bases, notes and share links go out of sight with it, and
// undo brings all of them back.
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, theory.group_id, 'owner')
  await markDeleted('theories', theory.id, user.id)
  return { deleted: theory.id, undo: `/api/theories/${theory.id}/restore` }
})
