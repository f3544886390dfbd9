import { monitorEventLoopDelay } from 'node:perf_hooks'

// Timing helpers shared by the benchmark scripts: figures are medians (the machines are shared
// and noisy, so a mean would follow the slowest outlier).

/** The median of some numbers. @example median([3, 1, 2]) // 2 */
export function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b)
  const m = s.length >> 1
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2
}

/** Median milliseconds of `repeats` calls of `fn`, after one warm-up call (3 decimals). */
export function medianTime(repeats: number, fn: () => unknown): number {
  fn()
  const ts: number[] = []
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now()
    fn()
    ts.push(performance.now() - t0)
  }
  return Number(median(ts).toFixed(3))
}

/** The event loop's longest stall (ms) while `work` runs (its failure is ignored: a refusal is a figure too). */
export async function longestStallDuring(work: () => Promise<unknown>): Promise<number> {
  const h = monitorEventLoopDelay({ resolution: 10 })
  h.enable()
  await work().catch(() => undefined)
  await new Promise((r) => setTimeout(r, 50))
  h.disable()
  return Math.round(h.max / 1e6)
}
