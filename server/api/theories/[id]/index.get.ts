import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole, requireRoleOn } from '../../../utils/auth/currentUser'
import { theoryOr404, publicTheory, type TheoryRow } from '../../../utils/db/theories'

export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const access = await requireRoleOn(event, 'theories', id, 'viewer')
  if (access) return { theory: publicTheory(access.row as TheoryRow), role: access.role }
  const theory = await theoryOr404(id)
  const { role } = await requireGroupRole(event, theory.group_id, 'viewer')
  return { theory: publicTheory(theory), role }
})
