import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404, publicTheory } from '../../../utils/db/theories'

export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { role } = await requireGroupRole(event, theory.group_id, 'viewer')
  return { theory: publicTheory(theory), role }
})
