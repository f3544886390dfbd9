import { defineApiHandler } from '../../../../utils/http/apiHandler'
import { intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../../utils/db/theories'
import { publicRun } from '../../../../utils/db/runs'
import { useDb } from '../../../../utils/db/connection'

export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  await requireGroupRole(event, theory.group_id, 'viewer')
  const rows = await useDb()('runs').where({ theory_id: theory.id }).orderBy('id', 'desc').limit(50)
  return { runs: rows.map(publicRun) }
})
