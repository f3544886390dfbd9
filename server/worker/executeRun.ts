import type { Knex } from 'knex'
import { startEngineTask } from './engineTask'
import { persistRunResult, type RunParams } from './persistRun'

const CANCEL_POLL_MS = 400
const PROGRESS_WRITE_MS = 250

/**
 * Carry out one run: mark it running, compute in a worker thread, stream progress into the
 * runs row, honour a cancel request, and write the result in one transaction. An engine input
 * error fails the run with its message (no retry); anything else is rethrown so that the
 * queue retries the job.
 */
export async function executeRun(db: Knex, runId: number): Promise<void> {
  const run = await db('runs').where({ id: runId }).first()
  if (!run || ['done', 'cancelled'].includes(run.status)) return
  if (run.cancel_requested) {
    await db('runs').where({ id: runId }).update({ status: 'cancelled', finished_at: db.fn.now() })
    return
  }
  await db('runs').where({ id: runId }).update({ status: 'running', started_at: db.fn.now(), attempts: db.raw('attempts + 1'), progress: 0, current_label: 'starting' })
  const params = run.params as RunParams
  let pending: { fraction: number, label: string } | undefined
  const handle = startEngineTask({ kind: run.kind as 'count' | 'basis', theory: params.theory, maxDim: params.maxDim, maxOrder: params.maxOrder, nf: params.nf, priorities: params.priorities }, (fraction, label) => { pending = { fraction, label } })
  const timer = setInterval(async () => {
    if (pending) {
      const p = pending
      pending = undefined
      await db('runs').where({ id: runId, status: 'running' }).update({ progress: Math.min(0.99, p.fraction), current_label: p.label.slice(0, 200) }).catch(() => {})
    }
  }, PROGRESS_WRITE_MS)
  const poll = setInterval(async () => {
    const row = await db('runs').where({ id: runId }).first('cancel_requested').catch(() => null)
    if (row?.cancel_requested) handle.cancel()
  }, CANCEL_POLL_MS)
  try {
    const result = await handle.result
    await persistRunResult(db, { ...run, params }, result)
  } catch (error) {
    const e = error as Error
    if (e.name === 'EngineCancelledError') {
      await db('runs').where({ id: runId }).update({ status: 'cancelled', current_label: 'cancelled', finished_at: db.fn.now() })
    } else if (e.name === 'EngineInputError' || e.name === 'EngineConsistencyError') {
      await db('runs').where({ id: runId }).update({ status: 'failed', error: e.message, finished_at: db.fn.now() })
    } else {
      await db('runs').where({ id: runId }).update({ status: 'failed', error: e.message || String(e), finished_at: db.fn.now() })
      throw error
    }
  } finally {
    clearInterval(timer)
    clearInterval(poll)
  }
}
