import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { intParam } from '../../utils/http/readJson'
import { requireGroupRole } from '../../utils/auth/currentUser'
import { tagOr404 } from '../../utils/db/tags'
import { markDeleted } from '../../utils/db/softDelete'
import { touchBasesOfOperator } from '../../utils/db/boardCache'
import { roleAtLeast } from '../../../shared/types/roles'

// The author (still at least commenter) or an owner deletes a tag, the same rule as for notes;
// undo restores it.
export default defineApiHandler(async (event) => {
  const tag = await tagOr404(intParam(event, 'id'))
  const { user, role } = await requireGroupRole(event, tag.group_id, 'commenter')
  if (tag.created_by !== user.id && !roleAtLeast(role, 'owner')) fail(403, 'Only the author or an owner may delete this tag')
  await markDeleted('tags', tag.id, user.id)
  await touchBasesOfOperator(tag.operator_id)
  return { deleted: tag.id, undo: `/api/tags/${tag.id}/restore` }
})
