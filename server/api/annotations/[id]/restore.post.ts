import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { annotationOr404 } from '../../../utils/db/annotations'
import { restoreDeleted } from '../../../utils/db/softDelete'
import { roleAtLeast } from '../../../../shared/types/roles'
import { touchBasesOfTheory } from '../../../utils/db/boardCache'

// Undo of a note's deletion, by those who may delete it (its author, or an editor).
export default defineApiHandler(async (event) => {
  const note = await annotationOr404(intParam(event, 'id'), { deleted: true })
  const { user, role } = await requireGroupRole(event, note.group_id, 'commenter')
  if (note.author_id !== user.id && !roleAtLeast(role, 'editor')) fail(403, 'Only the author or an editor may restore this note')
  await restoreDeleted('annotations', note.id)
  await touchBasesOfTheory(note.theory_id)
  return { restored: note.id }
})
