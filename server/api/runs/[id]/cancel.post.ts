import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { runOr404, publicRun } from '../../../utils/db/runs'
import { useDb } from '../../../utils/db/connection'
import { cancelRun } from '../../../utils/jobs/orphans'

// Editors cancel a queued or running run. A live worker sees the flag within a second; a run
// that is queued, or whose worker stopped, is cancelled at once.
export default defineApiHandler(async (event) => {
  const run = await runOr404(intParam(event, 'id'))
  await requireGroupRole(event, run.group_id, 'editor')
  if (!['queued', 'running'].includes(run.status)) fail(409, `This run is already ${run.status}`)
  const row = await cancelRun(useDb(), run.id)
  if (!row) fail(409, `This run is already ${(await runOr404(run.id)).status}`)
  return { run: publicRun(row) }
})
