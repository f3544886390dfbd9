import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { runOr404, publicRun, settleIfOrphaned } from '../../../utils/db/runs'

// Polled by the page for progress (every ~0.7 s while a run is active).
export default defineApiHandler(async (event) => {
  const run = await runOr404(intParam(event, 'id'))
  await requireGroupRole(event, run.group_id, 'viewer')
  return { run: publicRun(await settleIfOrphaned(run)) }
})
