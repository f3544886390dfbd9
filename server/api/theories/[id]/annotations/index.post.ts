import { defineApiHandler, fail, created } from '../../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../../utils/db/theories'
import { useDb } from '../../../../utils/db/connection'
import { addNote } from '../../../../utils/db/annotations'
import { AnnotationCreateSchema } from '../../../../../shared/schemas/theoryRequests'
import { touchBasesOfTheory } from '../../../../utils/db/boardCache'
import { once } from '../../../../utils/http/requestKeys'

// Commenters and above leave notes on a theory or on one of its operators (capped: addNote;
// once per request key).
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, theory.group_id, 'commenter')
  const body = await readJson(event, AnnotationCreateSchema)
  if (body.operatorId) {
    const op = await useDb()('operators as o').join('bases as b', 'b.id', 'o.basis_id').where({ 'o.id': body.operatorId, 'b.theory_id': theory.id }).whereNull('b.deleted_at').first('o.id')
    if (!op) fail(404, `This theory has no operator ${body.operatorId}; the note was not saved`)
  }
  return once(event, user.id, body, async () => {
    const row = await addNote({ theoryId: theory.id, operatorId: body.operatorId ?? null, authorId: user.id, body: body.body })
    await touchBasesOfTheory(theory.id)
    created(event)
    return { annotation: { ...row, authorId: user.id, authorName: user.displayName, authorImported: false } }
  })
})
