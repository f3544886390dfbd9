import type { Knex } from 'knex'

/**
 * Runs whose worker vanished. A worker holding a run writes `heartbeat_at` every half second
 * (executeRun.ts). Any worker's sweep, and the server when a run is read, settle a run whose
 * heartbeat is old: retried once, then failed with a message; a cancel request ends it.
 * Every change is one conditional UPDATE on the database clock, so any number of sweepers on
 * any number of machines may run at once and clocks need not agree.
 */
export const RUN_LEASE = {
  /** How often a worker writes its heartbeat (and progress, and reads the cancel flag). */
  heartbeatMs: 500,
  /** A running run without a heartbeat for this long has lost its worker. */
  staleSeconds: 30,
  /** A run whose cancel was asked for ends as cancelled after this long without a heartbeat. */
  cancelStaleSeconds: 5,
  /** The first try and one retry. */
  maxAttempts: 2,
  /** How often each worker sweeps. */
  sweepMs: 5000,
}

/** Sends a queue job for a run; returns the job id. */
export type SendRun = (runId: number) => Promise<string | null>

const lastSign = 'coalesce(heartbeat_at, started_at, created_at)'
const staleFor = (seconds: number) => `${lastSign} < now() - make_interval(secs => ${Number(seconds)})`

function stoppedMessage(row: { progress: number; current_label: string }) {
  const at = `${Math.round(100 * (row.progress ?? 0))} %${row.current_label ? `, "${row.current_label}"` : ''}`
  return (
    `The worker stopped while computing this run (at ${at}) and stopped again on the retry, so the run was not finished and nothing of it was saved. ` +
    "Start it again; if it keeps stopping, it may need more memory than the worker has (the worker's log says why it stopped)."
  )
}

/** Orphans (limited to `runId` when given) whose cancel was asked for: cancelled. */
async function cancelOrphans(db: Knex, runId?: number): Promise<number[]> {
  const q = db('runs').where({ status: 'running', cancel_requested: true }).whereRaw(staleFor(RUN_LEASE.cancelStaleSeconds))
  if (runId) q.andWhere({ id: runId })
  const rows = await q.update({ status: 'cancelled', current_label: 'cancelled', finished_at: db.fn.now() }).returning('id')
  return rows.map((r) => r.id)
}

/** Orphans that used up their attempts: failed with a message saying what happened. */
async function failOrphans(db: Knex, runId?: number): Promise<number[]> {
  const q = db('runs').where({ status: 'running' }).andWhere('attempts', '>=', RUN_LEASE.maxAttempts).whereRaw(staleFor(RUN_LEASE.staleSeconds))
  if (runId) q.andWhere({ id: runId })
  const rows = await q.select('id', 'progress', 'current_label')
  const failed: number[] = []
  for (const row of rows) {
    const n = await db('runs')
      .where({ id: row.id, status: 'running' })
      .whereRaw(staleFor(RUN_LEASE.staleSeconds))
      .update({ status: 'failed', error: stoppedMessage(row), finished_at: db.fn.now() })
    if (n) failed.push(row.id)
  }
  return failed
}

/** Orphans with an attempt left: back to the queue (a fresh job; the old one is dead). */
async function requeueOrphans(db: Knex, send: SendRun, runId?: number): Promise<number[]> {
  const q = db('runs').where({ status: 'running' }).andWhere('attempts', '<', RUN_LEASE.maxAttempts).whereRaw(staleFor(RUN_LEASE.staleSeconds))
  if (runId) q.andWhere({ id: runId })
  const rows = await q.update({ status: 'queued', job_id: null, worker: null, progress: 0, current_label: 'the worker stopped; waiting for another one (one retry)' }).returning('id')
  for (const { id } of rows) await sendJob(db, send, id)
  return rows.map((r) => r.id)
}

async function sendJob(db: Knex, send: SendRun, runId: number) {
  const jobId = await send(runId)
  await db('runs').where({ id: runId, status: 'queued' }).whereNull('job_id').update({ job_id: jobId })
}

/**
 * Queued runs without a job (the job could not be sent, or was lost): send one. Ten seconds of
 * grace cover the moment between inserting a run and sending its job. A duplicate job is
 * harmless: only one worker can claim a queued run.
 */
async function resendStranded(db: Knex, send: SendRun, runId?: number): Promise<number[]> {
  const q = db('runs').where({ status: 'queued', cancel_requested: false }).whereNull('job_id').whereRaw("created_at < now() - interval '10 seconds'")
  if (runId) q.andWhere({ id: runId })
  const rows = await q.limit(50).select('id')
  for (const { id } of rows) await sendJob(db, send, id)
  return rows.map((r) => r.id)
}

/** Settle every orphaned or stranded run (or only `runId`). */
export async function settleRuns(db: Knex, send: SendRun, runId?: number) {
  const cancelled = await cancelOrphans(db, runId)
  const failed = await failOrphans(db, runId)
  const requeued = await requeueOrphans(db, send, runId)
  const resent = await resendStranded(db, send, runId)
  return { cancelled, failed, requeued, resent }
}

/**
 * Cancel a run. Queued, or running without a recent heartbeat: cancelled at once. Running with
 * a live worker: the flag is set, the worker stops the engine within a second and records it.
 */
export async function cancelRun(db: Knex, runId: number) {
  const now = await db('runs')
    .where({ id: runId })
    .andWhere((w) => w.where({ status: 'queued' }).orWhere((r) => r.where({ status: 'running' }).whereRaw(staleFor(RUN_LEASE.cancelStaleSeconds))))
    .update({ cancel_requested: true, status: 'cancelled', current_label: 'cancelled', finished_at: db.fn.now() })
    .returning('*')
  if (now.length) return now[0]
  const [flagged] = await db('runs').where({ id: runId }).whereIn('status', ['queued', 'running']).update({ cancel_requested: true }).returning('*')
  return flagged
}
