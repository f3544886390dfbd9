import { defineApiHandler, fail, created } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { operatorOr404 } from '../../../utils/db/bases'
import { addTag } from '../../../utils/db/tags'
import { TagCreateSchema } from '../../../../shared/schemas/boardRequests'
import { touchBasesOfOperator } from '../../../utils/db/boardCache'
import { once } from '../../../utils/http/requestKeys'

// Commenters and above tag operators (threshold, tree, loop, CP-odd, B-violating, custom), once
// per request key; a tag the operator already carries is a 409.
export default defineApiHandler(async (event) => {
  const op = await operatorOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, op.group_id, 'commenter')
  const body = await readJson(event, TagCreateSchema)
  return once(event, user.id, body, async () => {
    const tag = await addTag({ operatorId: op.id, kind: body.kind, label: body.label ?? '', createdBy: user.id })
    if (!tag) fail(409, 'This operator already carries that tag')
    await touchBasesOfOperator(op.id)
    created(event)
    return { tag: { ...tag, authorName: user.displayName, authorImported: false } }
  })
})
