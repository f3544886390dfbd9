import { ComputeLane } from './computeLane'
import { ComputeBudgetError } from './computeErrors'
import { ResultCache, inputKey, type Settled } from './resultCache'
import { EngineInputError } from '../../engine/errors'
import type { ComputeInput, ComputeKind, ComputeOutput } from '../../worker/computeTasks'

const threads = (fallback: number) => Math.max(1, Number(process.env.SCALEWRIGHT_COMPUTE_THREADS) || fallback)

/**
 * Four lanes, so that slow quick counts never hold up ladders, checks and curves, and neither
 * holds up the board's math (which runs while a board lock is held), and a long gauge running
 * holds up nothing else. Their limits are the site's promise that no account or group can take
 * all the threads or all the memory; within a lane, groups take turns (computeLane.ts).
 */
export const COMPUTE_LANES = {
  light: new ComputeLane('computations', { threads: threads(2), queue: 32, perUser: 4, perGroup: 8, idleMs: 300_000 }),
  count: new ComputeLane('quick counts', { threads: threads(2), queue: 4, perUser: 2, perGroup: 3, idleMs: 300_000 }),
  board: new ComputeLane('board computations', { threads: threads(1), queue: 64, perUser: 8, perGroup: 16, idleMs: 300_000 }),
  running: new ComputeLane('gauge-coupling calculations', { threads: threads(1), queue: 8, perUser: 1, perGroup: 2, idleMs: 300_000 }),
}

/**
 * Lane, time budget and the words for a message, per task. `cache: false` for tasks whose input
 * is a board's state at one moment (it rarely repeats, and hashing it would cost the event loop).
 */
const TASKS: Record<ComputeKind, { lane: keyof typeof COMPUTE_LANES; budgetMs: number; what: string; cache?: false }> = {
  ladder: { lane: 'light', budgetMs: 5_000, what: 'This scale ladder' },
  ordersBelowTarget: { lane: 'light', budgetMs: 5_000, what: 'The estimate of these orders' },
  qcdRunning: { lane: 'light', budgetMs: 5_000, what: 'This α_s running' },
  qedRunning: { lane: 'light', budgetMs: 5_000, what: 'This α running' },
  anomalies: { lane: 'light', budgetMs: 5_000, what: 'The anomaly check of this theory' },
  couplings: { lane: 'count', budgetMs: 20_000, what: 'Checking the couplings against the order-0 basis' },
  integrateOut: { lane: 'light', budgetMs: 5_000, what: 'Integrating out these fields' },
  massPartners: { lane: 'light', budgetMs: 5_000, what: "Finding the fermions' mass partners" },
  towerHints: { lane: 'light', budgetMs: 5_000, what: 'The matching results along this tower' },
  gaugeInputs: { lane: 'light', budgetMs: 5_000, what: 'Reading the gauge content of this tower' },
  gaugeRunning: { lane: 'running', budgetMs: 20_000, what: 'This running (choose a smaller range of scales)' },
  coverage: { lane: 'board', budgetMs: 10_000, what: 'The coverage of this basis', cache: false },
  moveMath: { lane: 'board', budgetMs: 5_000, what: 'Checking this move', cache: false },
  importMath: { lane: 'board', budgetMs: 10_000, what: 'Checking this file against the basis', cache: false },
  rewriteOnto: { lane: 'board', budgetMs: 5_000, what: 'The rewrite of this operator', cache: false },
  ruleView: { lane: 'board', budgetMs: 5_000, what: 'The orders under this counting rule', cache: false },
  boardExport: { lane: 'board', budgetMs: 10_000, what: 'This export', cache: false },
  quickCount: { lane: 'count', budgetMs: 10_000, what: 'This count (a quick count is for up to 10 s; start a background run instead)' },
  typedFingerprints: { lane: 'count', budgetMs: 20_000, what: 'Placing this typed operator' },
  goldstoneTypedFingerprints: { lane: 'count', budgetMs: 20_000, what: 'Placing this typed operator' },
  // Rebuilds every class of one order (SMEFT dimension 6: about 20 s on an idle core).
  checkOperatorList: { lane: 'count', budgetMs: 180_000, what: 'Checking this operator list' },
  typedRewrite: { lane: 'count', budgetMs: 20_000, what: 'Placing this typed operator' },
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
 * `user` is who asked and `group` the group whose data it reads, when there is one (their
 * concurrent computations are limited per lane). A shared page asks as `share:<theory>` of its group.
 */
export async function compute<K extends ComputeKind>(kind: K, input: ComputeInput<K>, user: string | number, group?: number): Promise<Awaited<ComputeOutput<K>>> {
  const task = TASKS[kind]
  const caller = { user: String(user), group: group === undefined ? undefined : String(group), budgetMs: task.budgetMs, what: task.what }
  if (task.cache === false) return (await COMPUTE_LANES[task.lane].run(kind, input, caller)) as Awaited<ComputeOutput<K>>
  const key = inputKey(kind, input)
  const hit = cache.get(key)
  if (hit) return replay(hit) as Awaited<ComputeOutput<K>>
  let pending = inFlight.get(key)
  if (!pending) {
    pending = COMPUTE_LANES[task.lane]
      .run(kind, input, caller)
      .then(
        (value) => {
          cache.set(key, { ok: true, value })
          return value
        },
        (error: Error) => {
          if (cacheable(error)) cache.set(key, { ok: false, error })
          throw error
        },
      )
      .finally(() => inFlight.delete(key))
    inFlight.set(key, pending)
  }
  return (await pending) as Awaited<ComputeOutput<K>>
}
