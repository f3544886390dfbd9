/**
 * Benchmark of the Hilbert-series operator count (server/engine/counting).
 * Targets: SMEFT, three flavors, dimensions 5–8 under 0.5 s; dimensions 5–12 (one and three
 * flavors) under 5 s each, memory under 1 GiB. Returns median wall times (ms) of a few repeats,
 * the first (cold) run apart, the totals of the top dimension as a correctness stamp, and the
 * resident memory after the runs.
 */
import { findPreset } from '../shared/presets/index'
import { parseTheory } from '../server/engine/theory/parseTheory'
import { countOperators } from '../server/engine/counting/countOperators'
import { median } from './support/timing'

interface Figure {
  median_ms: number
  cold_ms: number
  repeats: number
  top_dimension_operators: number
  /** Published total of the top dimension (Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016). */
  expected_operators: number
  target_ms: number
}

function measure(maxDim: number, nf: number, repeats: number, target: number, expected: number): Figure {
  const smeft = parseTheory(findPreset('smeft')!.theory)
  const times: number[] = []
  let top = 0
  let cold = 0
  for (let i = 0; i <= repeats; i++) {
    const t0 = performance.now()
    const r = countOperators(smeft, { maxDim, nf })
    const dt = performance.now() - t0
    if (i === 0) cold = dt
    else times.push(dt)
    top = r.byDimension.at(-1)!.operators
  }
  return {
    median_ms: round(median(times)),
    cold_ms: round(cold),
    repeats,
    top_dimension_operators: top,
    expected_operators: expected,
    target_ms: target,
  }
}

function round(x: number): number {
  return Math.round(x * 10) / 10
}

export default async function countBench(): Promise<Record<string, Figure | Record<string, number>>> {
  const out: Record<string, Figure | Record<string, number>> = {}
  // expected totals: dim 8, Nf = 3: 44807; dim 12, Nf = 1: 261485 (paper title);
  // dim 12, Nf = 3: 75577476 (same paper, Nf = 3 table; value from memory)
  out['smeft nf=3 dim 5-8'] = measure(8, 3, 5, 500, 44807)
  out['smeft nf=1 dim 5-12'] = measure(12, 1, 3, 5000, 261485)
  out['smeft nf=3 dim 5-12'] = measure(12, 3, 3, 5000, 75577476)
  const mem = process.memoryUsage()
  out['memory after count runs'] = { rss_mib: round(mem.rss / 2 ** 20), heap_used_mib: round(mem.heapUsed / 2 ** 20), target_mib: 1024 }
  return out
}
