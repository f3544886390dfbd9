import { defineApiHandler, fail, created } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { operatorOr404 } from '../../../utils/db/bases'
import { useDb } from '../../../utils/db/connection'
import { TagCreateSchema } from '../../../../shared/schemas/boardRequests'
import { touchBasesOfOperator } from '../../../utils/db/boardCache'

// Commenters and above tag operators (threshold, tree, loop, CP-odd, B-violating, custom).
export default defineApiHandler(async (event) => {
  const op = await operatorOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, op.group_id, 'commenter')
  const body = await readJson(event, TagCreateSchema)
  const [tag] = await useDb()('tags').insert({ operator_id: op.id, kind: body.kind, label: body.label ?? '', created_by: user.id })
    .onConflict(['operator_id', 'kind', 'label']).ignore().returning(['id', 'operator_id as operatorId', 'kind', 'label'])
  if (!tag) fail(409, 'This operator already carries that tag')
  await touchBasesOfOperator(op.id)
  created(event)
  return { tag }
})
