import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { readJson, intParam } from '../../utils/http/readJson'
import { requireGroupRole } from '../../utils/auth/currentUser'
import { annotationOr404 } from '../../utils/db/annotations'
import { useDb } from '../../utils/db/connection'
import { AnnotationUpdateSchema } from '../../../shared/schemas/theoryRequests'
import { roleAtLeast } from '../../../shared/types/roles'
import { touchBasesOfTheory } from '../../utils/db/boardCache'

// The author (still at least commenter) or an editor edits a note; the old text goes to history.
export default defineApiHandler(async (event) => {
  const note = await annotationOr404(intParam(event, 'id'))
  const { user, role } = await requireGroupRole(event, note.group_id, 'commenter')
  if (note.author_id !== user.id && !roleAtLeast(role, 'editor')) fail(403, 'Only the author or an editor may change this note')
  const { body } = await readJson(event, AnnotationUpdateSchema)
  await useDb().transaction(async (trx) => {
    await trx('annotation_revisions').insert({ annotation_id: note.id, body: note.body, edited_by: user.id })
    await trx('annotations').where({ id: note.id }).update({ body, updated_at: trx.fn.now() })
  })
  await touchBasesOfTheory(note.theory_id)
  return { annotation: { id: note.id, body } }
})
