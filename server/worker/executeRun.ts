import type { Knex } from 'knex'
import { startEngineTask } from './engineTask'
import { persistRunResult, type RunParams } from './persistRun'
import { claimRun, heldRun, startLease, RunLostError } from './runLease'
import { RUN_LEASE, type SendRun } from '../utils/jobs/orphans'

/**
 * Carry out one run: claim it (only while queued), compute in a worker thread, beat the
 * heartbeat with the progress, honour a cancel request, and write the result in one
 * transaction. An engine input error fails the run with its message; any other error retries
 * it once (a fresh job), then fails it. Nothing is thrown: the queue never retries by itself.
 */
export async function executeRun(db: Knex, runId: number, send: SendRun): Promise<void> {
  const run = await claimRun(db, runId)
  if (!run) return // done, cancelled, or held by another worker: a duplicate job
  const params = run.params as RunParams
  let pending: { fraction: number, label: string } | undefined
  const handle = startEngineTask({ kind: run.kind as 'count' | 'basis', theory: params.theory, maxDim: params.maxDim, maxOrder: params.maxOrder, nf: params.nf, priorities: params.priorities }, (fraction, label) => { pending = { fraction, label } })
  const lease = startLease(db, run, () => { const p = pending; pending = undefined; return p }, () => handle.cancel())
  try {
    const result = await handle.result
    await persistRunResult(db, { ...run, theory_id: run.theory_id, kind: run.kind, params }, result)
  } catch (error) {
    await recordEnd(db, run, lease.lost ? new RunLostError(run.id) : error as Error, send)
  } finally {
    lease.stop()
  }
}

async function recordEnd(db: Knex, run: { id: number, attempts: number }, e: Error, send: SendRun) {
  try {
    if (e.name === 'RunLostError') {
      console.error(`[worker] ${e.message}`)
    } else if (e.name === 'EngineCancelledError') {
      await heldRun(db, run).update({ status: 'cancelled', current_label: 'cancelled', finished_at: db.fn.now() })
    } else if (e.name === 'EngineInputError' || e.name === 'EngineConsistencyError') {
      await heldRun(db, run).update({ status: 'failed', error: e.message, finished_at: db.fn.now() })
    } else if (run.attempts < RUN_LEASE.maxAttempts) {
      console.error(`[worker] run ${run.id} stopped by an unexpected error; queued again once:`, e)
      const n = await heldRun(db, run).update({ status: 'queued', job_id: null, worker: null, progress: 0, current_label: 'retrying after an unexpected error' })
      if (n) await db('runs').where({ id: run.id, status: 'queued' }).whereNull('job_id').update({ job_id: await send(run.id) })
    } else {
      console.error(`[worker] run ${run.id} failed on its retry:`, e)
      await heldRun(db, run).update({ status: 'failed', error: `The run stopped on an unexpected error, also on its retry: ${e.message || String(e)}`, finished_at: db.fn.now() })
    }
  } catch (writeError) {
    // The database is away: the heartbeat stops with us, and a sweep settles the run later.
    console.error(`[worker] could not record the end of run ${run.id}:`, (writeError as Error).message)
  }
}
