import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { runOr404, publicRun } from '../../../utils/db/runs'
import { useDb } from '../../../utils/db/connection'

// Editors cancel a queued or running run; the worker sees the flag within a fraction of a second.
export default defineApiHandler(async (event) => {
  const run = await runOr404(intParam(event, 'id'))
  await requireGroupRole(event, run.group_id, 'editor')
  if (!['queued', 'running'].includes(run.status)) fail(409, `This run is already ${run.status}`)
  const patch = run.status === 'queued'
    ? { cancel_requested: true, status: 'cancelled', current_label: 'cancelled', finished_at: useDb().fn.now() }
    : { cancel_requested: true }
  const [row] = await useDb()('runs').where({ id: run.id }).update(patch).returning('*')
  return { run: publicRun(row) }
})
