/**
 * Issue 12 leftovers, old path against new, in this process (no database): the event-loop
 * block of the routes' engine work moved into the compute pool ("before" calls the engine on
 * the loop, as the routes did; "after" goes through compute()), and the wait of another group's
 * task behind a burst of 8 from one group in a one-thread lane ("before": first come, first
 * served, as the lane was; "after": groups take turns).
 */
import { compute } from '../server/utils/compute/computePool'
import { ComputeLane } from '../server/utils/compute/computeLane'
import { COMPUTE_TASKS } from '../server/worker/computeTasks'
import { longestStallDuring, median } from './support/timing'
import { SMALL_THEORY } from '../tests/support/fixtures'

const STEPS = [{ id: 1, name: 'Two scalars', theory: SMALL_THEORY, thresholdGeV: null }]
const RUNNING = (i: number) => ({ steps: STEPS, request: { loops: 2 as const, muFromGeV: 91.1876, alpha: { U: 0.01 + i / 1e4 }, plotFromGeV: 1, plotToGeV: 1e30 } })

/** The gauge running of a 30-decade range, on the loop and through the pool (5 different inputs each, medians). */
async function gaugeRunningBlock() {
  await compute('gaugeRunning', RUNNING(99), 'bench') // boot the running lane's thread
  const before: number[] = []
  const after: number[] = []
  for (let i = 0; i < 5; i++) {
    before.push(await longestStallDuring(async () => COMPUTE_TASKS.gaugeRunning(RUNNING(i) as never)))
    after.push(await longestStallDuring(() => compute('gaugeRunning', RUNNING(i) as never, 'bench')))
  }
  return { before_block_ms: median(before), after_block_ms: median(after) }
}

/** Another group's wait (ms) for its one task behind 8 tasks of one group, in a one-thread lane. */
async function otherGroupWait(fair: boolean) {
  const lane = new ComputeLane('computations', { threads: 1, queue: 16, perUser: 16, perGroup: 16, idleMs: 60_000 })
  await lane.run('gaugeRunning', RUNNING(50), { user: 'warm', budgetMs: 60_000, what: 'x' })
  const burst = Array.from({ length: 8 }, (_, i) => lane.run('gaugeRunning', RUNNING(i), { user: 'a', group: 'A', budgetMs: 60_000, what: 'x' }))
  const t0 = performance.now()
  // "before": the lane served in arrival order; the same order is what one owner gets now.
  await lane.run('gaugeRunning', RUNNING(20), { user: 'b', group: fair ? 'B' : 'A', budgetMs: 60_000, what: 'x' })
  const waited = performance.now() - t0
  await Promise.all(burst)
  return Math.round(waited)
}

export default async function () {
  const waits = { before: [] as number[], after: [] as number[] }
  for (let i = 0; i < 3; i++) {
    waits.before.push(await otherGroupWait(false))
    waits.after.push(await otherGroupWait(true))
  }
  return {
    gauge_running_event_loop_block: await gaugeRunningBlock(),
    other_group_wait_behind_8: { before_median_ms: median(waits.before), after_median_ms: median(waits.after), ratio: Number((median(waits.before) / median(waits.after)).toFixed(1)) },
  }
}
