import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { intParam } from '../../utils/http/readJson'
import { requireGroupRole } from '../../utils/auth/currentUser'
import { annotationOr404 } from '../../utils/db/annotations'
import { markDeleted } from '../../utils/db/softDelete'
import { roleAtLeast } from '../../../shared/types/roles'
import { touchBasesOfTheory } from '../../utils/db/boardCache'

// The author (still at least commenter) or an editor deletes a note; undo restores it.
export default defineApiHandler(async (event) => {
  const note = await annotationOr404(intParam(event, 'id'))
  const { user, role } = await requireGroupRole(event, note.group_id, 'commenter')
  if (note.author_id !== user.id && !roleAtLeast(role, 'editor')) fail(403, 'Only the author or an editor may delete this note')
  await markDeleted('annotations', note.id, user.id)
  await touchBasesOfTheory(note.theory_id)
  return { deleted: note.id, undo: `/api/annotations/${note.id}/restore` }
})
