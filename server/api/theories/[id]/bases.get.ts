import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { useDb } from '../../../utils/db/connection'

export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  await requireGroupRole(event, theory.group_id, 'viewer')
  const bases = await useDb()('bases')
    .where({ theory_id: theory.id })
    .whereNull('deleted_at')
    .orderBy('id', 'desc')
    .select('id', 'run_id as runId', 'theory_version as theoryVersion', 'max_order as maxOrder', 'counting_rule as countingRule', 'created_at as createdAt')
  return { bases }
})
