import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404, boardData } from '../../../utils/db/bases'
import { coverageOfClasses } from '../../../utils/db/boardMath'

export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const basis = await basisOr404(id)
  const { role } = await requireGroupRole(event, basis.group_id, 'viewer')
  const { groupId: _g, ...data } = await boardData(id)
  return { ...data, coverage: await coverageOfClasses(id, data.basis.classes as { key: string, rank: number }[]), role }
})
