import { hostname } from 'node:os'
import type { Knex } from 'knex'
import { RUN_LEASE } from '../utils/jobs/orphans'

/** Who holds a run, as shown in the runs row (host and process id). */
export const WORKER_ID = `${hostname()}:${process.pid}`.slice(0, 120)

/** This worker no longer holds the run (its heartbeat lapsed and another took it, or it ended). */
export class RunLostError extends Error {
  constructor(runId: number) {
    super(`run ${runId} is no longer held by this worker (its heartbeat lapsed); its result is discarded`)
    this.name = 'RunLostError'
  }
}

/**
 * Claim a queued run: one conditional UPDATE, so of two workers handed the same run only one
 * gets it. The new attempt number is the claim's token: every later write of this worker
 * names it, and a worker whose run was taken from it can write nothing.
 */
export async function claimRun(db: Knex, runId: number) {
  const [run] = await db('runs')
    .where({ id: runId, status: 'queued', cancel_requested: false })
    .update({ status: 'running', started_at: db.fn.now(), heartbeat_at: db.fn.now(), worker: WORKER_ID, attempts: db.raw('attempts + 1'), progress: 0, current_label: 'starting', error: null })
    .returning('*')
  return run as (Record<string, any> & { id: number; attempts: number }) | undefined
}

/** The rows this worker may still write: its run, its attempt, still running. */
export function heldRun(db: Knex | Knex.Transaction, run: { id: number; attempts: number }) {
  return db('runs').where({ id: run.id, attempts: run.attempts, status: 'running' })
}

export interface Lease {
  readonly lost: boolean
  stop: () => void
}

/**
 * Every heartbeatMs: write the heartbeat (and the latest progress) and read the cancel flag, in
 * one statement. A failed write (database away) is tried again at the next beat.
 */
export function startLease(db: Knex, run: { id: number; attempts: number }, takeProgress: () => { fraction: number; label: string } | undefined, onStop: () => void): Lease {
  let lost = false
  let stopped = false
  let timer: NodeJS.Timeout | undefined
  let told = false
  const stopEngine = () => {
    if (!told) {
      told = true
      onStop()
    }
  }
  const beat = async () => {
    const p = takeProgress()
    const patch = { heartbeat_at: db.fn.now(), ...(p ? { progress: Math.min(0.99, p.fraction), current_label: p.label.slice(0, 200) } : {}) }
    try {
      const rows = await heldRun(db, run).update(patch).returning(['cancel_requested'])
      if (rows.length === 0) {
        lost = true
        stopEngine()
      } else if (rows[0].cancel_requested) stopEngine()
    } catch {
      /* the database is away: the next beat tries again */
    }
    if (!stopped && !lost) timer = setTimeout(beat, RUN_LEASE.heartbeatMs)
  }
  timer = setTimeout(beat, RUN_LEASE.heartbeatMs)
  return {
    get lost() {
      return lost
    },
    stop() {
      stopped = true
      clearTimeout(timer)
    },
  }
}
