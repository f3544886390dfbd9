import type { Knex } from 'knex'
import { startEngineTask } from './engineTask'
import { persistRunResult } from './persistRun'
import type { RunParams } from './runParams'
import { claimRun, heldRun, startLease, RunLostError } from './runLease'
import { RUN_LEASE, type SendRun } from '../utils/jobs/orphans'
import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../engine/errors'
import { reportInternalError } from '../utils/internalError'
import { RUN_LIMITS, overtimeMessage } from '../utils/jobs/runLimits'

/**
 * Carry out one run: claim it (only while queued), compute in a worker thread, beat the
 * heartbeat with the progress, honour a cancel request, and write the result in one
 * transaction. How its end is recorded: see recordEnd. Nothing is thrown: the queue never
 * retries by itself. A run past the time limit of its kind fails with a message.
 */
export async function executeRun(db: Knex, runId: number, send: SendRun, timeMinutes = RUN_LIMITS.timeMinutes): Promise<void> {
  const run = await claimRun(db, runId)
  if (!run) return // done, cancelled, or held by another worker: a duplicate job
  const params = run.params as RunParams
  let pending: { fraction: number; label: string } | undefined
  const handle = startEngineTask(
    { kind: run.kind as 'count' | 'basis', theory: params.theory, maxDim: params.maxDim, maxOrder: params.maxOrder, nf: params.nf, priorities: params.priorities },
    (fraction, label) => {
      pending = { fraction, label }
    },
  )
  const lease = startLease(
    db,
    run,
    () => {
      const p = pending
      pending = undefined
      return p
    },
    () => handle.cancel(),
  )
  // The run-time limit of its kind: past it the engine is stopped and the run fails with a message.
  let overtime = false
  const minutes = timeMinutes[run.kind] ?? 15
  const limit = setTimeout(() => {
    overtime = true
    handle.cancel()
  }, minutes * 60_000)
  try {
    const result = await handle.result
    await persistRunResult(db, { ...run, theory_id: run.theory_id, kind: run.kind, params }, result)
  } catch (error) {
    const why = lease.lost ? new RunLostError(run.id) : overtime ? new EngineInputError('executeRun', overtimeMessage(run.kind, minutes)) : error
    await recordEnd(db, run, why, send)
  } finally {
    clearTimeout(limit)
    lease.stop()
  }
}

/**
 * How a run ends when its computation fails. An engine input error fails it with its message;
 * a failed consistency check fails it with a logged reference (a bug: a retry gives the same
 * answer). Anything else is logged under a reference and retried once (a fresh job), then the
 * run fails with the reference of its retry. A run this worker lost is left to its new holder.
 */
async function recordEnd(db: Knex, run: { id: number; attempts: number }, error: unknown, send: SendRun) {
  const fail = (text: string) => heldRun(db, run).update({ status: 'failed', error: text, finished_at: db.fn.now() })
  try {
    if (error instanceof RunLostError) {
      console.error(`[worker] ${error.message}`)
    } else if (error instanceof EngineCancelledError) {
      await heldRun(db, run).update({ status: 'cancelled', current_label: 'cancelled', finished_at: db.fn.now() })
    } else if (error instanceof EngineInputError) {
      await fail(error.message)
    } else if (error instanceof EngineConsistencyError || run.attempts >= RUN_LEASE.maxAttempts) {
      await fail(reportInternalError(error, `run ${run.id} (attempt ${run.attempts})`).text)
    } else {
      const { ref } = reportInternalError(error, `run ${run.id} (attempt ${run.attempts}; queued again once)`)
      const n = await heldRun(db, run).update({ status: 'queued', job_id: null, worker: null, progress: 0, current_label: `retrying after an internal error (ref ${ref})` })
      if (n)
        await db('runs')
          .where({ id: run.id, status: 'queued' })
          .whereNull('job_id')
          .update({ job_id: await send(run.id) })
    }
  } catch (writeError) {
    // The database is away: the heartbeat stops with us, and a sweep settles the run later.
    console.error(`[worker] could not record the end of run ${run.id}:`, (writeError as Error).message)
  }
}
