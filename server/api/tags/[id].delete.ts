import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { intParam } from '../../utils/http/readJson'
import { requireGroupRole } from '../../utils/auth/currentUser'
import { useDb } from '../../utils/db/connection'
import { touchBasesOfOperator } from '../../utils/db/boardCache'
import { roleAtLeast } from '../../../shared/types/roles'

// The author (still at least commenter) or an owner deletes a tag: the same rule as for notes.
export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const tag = await useDb()('tags as g').join('operators as o', 'o.id', 'g.operator_id').join('bases as b', 'b.id', 'o.basis_id')
    .join('theories as t', 't.id', 'b.theory_id').where('g.id', id).first('g.id', 'g.operator_id', 'g.created_by', 't.group_id')
  if (!tag) fail(404, `No tag with id ${id}`)
  const { user, role } = await requireGroupRole(event, tag.group_id, 'commenter')
  if (tag.created_by !== user.id && !roleAtLeast(role, 'owner')) fail(403, 'Only the author or an owner may delete this tag')
  await useDb()('tags').where({ id }).delete()
  await touchBasesOfOperator(tag.operator_id)
  return { deleted: id }
})
