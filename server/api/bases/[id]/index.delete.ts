import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { markDeleted } from '../../../utils/db/softDelete'

// Only owners delete a basis: it leaves every list, board and share link (a share link shows
// the theory's newest basis that is not deleted); undo brings it back unchanged.
export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, basis.group_id, 'owner')
  await markDeleted('bases', basis.id, user.id)
  return { deleted: basis.id, undo: `/api/bases/${basis.id}/restore` }
})
