import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { intParam } from '../../utils/http/readJson'
import { requireGroupRole } from '../../utils/auth/currentUser'
import { annotationOr404 } from '../../utils/db/annotations'
import { useDb } from '../../utils/db/connection'
import { roleAtLeast } from '../../../shared/types/roles'
import { touchBasesOfTheory } from '../../utils/db/boardCache'

// The author (still at least commenter) or an owner deletes a note.
export default defineApiHandler(async (event) => {
  const note = await annotationOr404(intParam(event, 'id'))
  const { user, role } = await requireGroupRole(event, note.group_id, 'commenter')
  if (note.author_id !== user.id && !roleAtLeast(role, 'owner')) fail(403, 'Only the author or an owner may delete this note')
  await useDb()('annotations').where({ id: note.id }).delete()
  await touchBasesOfTheory(note.theory_id)
  return { deleted: note.id }
})
