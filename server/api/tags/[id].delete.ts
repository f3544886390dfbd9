import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { intParam } from '../../utils/http/readJson'
import { requireGroupRole } from '../../utils/auth/currentUser'
import { useDb } from '../../utils/db/connection'
import { touchBasesOfOperator } from '../../utils/db/boardCache'

export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const tag = await useDb()('tags as g').join('operators as o', 'o.id', 'g.operator_id').join('bases as b', 'b.id', 'o.basis_id')
    .join('theories as t', 't.id', 'b.theory_id').where('g.id', id).first('g.id', 't.group_id')
  if (!tag) fail(404, `No tag with id ${id}`)
  await requireGroupRole(event, tag.group_id, 'commenter')
  const { operator_id: operatorId } = await useDb()('tags').where({ id }).first('operator_id')
  await useDb()('tags').where({ id }).delete()
  await touchBasesOfOperator(operatorId)
  return { deleted: id }
})
