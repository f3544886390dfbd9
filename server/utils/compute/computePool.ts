import { ComputeLane } from './computeLane'
import { ComputeBudgetError } from './computeErrors'
import { ResultCache, inputKey, type Settled } from './resultCache'
import { EngineInputError } from '../../engine/errors'
import type { ComputeInput, ComputeKind, ComputeOutput } from '../../worker/computeTasks'

const threads = (fallback: number) => Math.max(1, Number(process.env.SCALEWRIGHT_COMPUTE_THREADS) || fallback)

/**
 * Two lanes, so that slow quick counts never hold up ladders, checks and curves. Their limits
 * are the site's promise that no account can take all the threads or all the memory.
 */
export const COMPUTE_LANES = {
  light: new ComputeLane('computations', { threads: threads(2), queue: 32, perUser: 4, idleMs: 300_000 }),
  count: new ComputeLane('quick counts', { threads: threads(2), queue: 4, perUser: 2, idleMs: 300_000 }),
}

/** Lane, time budget and the words for a message, per task. */
const TASKS: Record<ComputeKind, { lane: keyof typeof COMPUTE_LANES, budgetMs: number, what: string }> = {
  ladder: { lane: 'light', budgetMs: 5_000, what: 'This scale ladder' },
  ordersBelowTarget: { lane: 'light', budgetMs: 5_000, what: 'The estimate of these orders' },
  qcdRunning: { lane: 'light', budgetMs: 5_000, what: 'This α_s running' },
  qedRunning: { lane: 'light', budgetMs: 5_000, what: 'This α running' },
  anomalies: { lane: 'light', budgetMs: 5_000, what: 'The anomaly check of this theory' },
  couplings: { lane: 'count', budgetMs: 20_000, what: 'Checking the couplings against the order-0 basis' },
  integrateOut: { lane: 'light', budgetMs: 5_000, what: 'Integrating out these fields' },
  quickCount: { lane: 'count', budgetMs: 10_000, what: 'This count (a quick count is for up to 10 s; start a background run instead)' },
  typedFingerprints: { lane: 'count', budgetMs: 20_000, what: 'Placing this typed operator' },
  goldstoneTypedFingerprints: { lane: 'count', budgetMs: 20_000, what: 'Placing this typed operator' },
  // Rebuilds every class of one order (SMEFT dimension 6: about 20 s on an idle core).
  checkOperatorList: { lane: 'count', budgetMs: 180_000, what: 'Checking this operator list' },
}

const cache = new ResultCache(500, 32 * 1024 * 1024)
const inFlight = new Map<string, Promise<unknown>>()

/** Deterministic answers are remembered; "busy" and crashes are not. */
const cacheable = (e: Error) => e instanceof ComputeBudgetError || e instanceof EngineInputError

function replay(settled: Settled): unknown {
  if (settled.ok) return settled.value
  throw settled.error
}

/**
 * Compute an engine task off the event loop, in a bounded pool of threads, within its time
 * budget; equal inputs (canonical JSON) share one computation and its remembered answer.
 * `user` is who asked (their concurrent computations are limited per lane).
 */
export async function compute<K extends ComputeKind>(kind: K, input: ComputeInput<K>, user: string | number): Promise<Awaited<ComputeOutput<K>>> {
  const key = inputKey(kind, input)
  const hit = cache.get(key)
  if (hit) return replay(hit) as Awaited<ComputeOutput<K>>
  let pending = inFlight.get(key)
  if (!pending) {
    const task = TASKS[kind]
    pending = COMPUTE_LANES[task.lane].run(kind, input, { user: String(user), budgetMs: task.budgetMs, what: task.what })
      .then((value) => { cache.set(key, { ok: true, value }); return value },
        (error: Error) => { if (cacheable(error)) cache.set(key, { ok: false, error }); throw error })
      .finally(() => inFlight.delete(key))
    inFlight.set(key, pending)
  }
  return await pending as Awaited<ComputeOutput<K>>
}
