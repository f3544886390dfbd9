/**
 * Benchmark of the Goldstone-frame counts (server/engine/goldstone): the Hilbert series of
 * SU(3)×SU(3)/SU(3) with the sources s, p, l_μ, r_μ to p¹² (median of a few repeats, the cold
 * run apart). Correctness stamp: 45171 terms at p¹⁰ (Graf, Henning, Lu, Melia, Murayama,
 * JHEP 01 (2021) 142). Run alone: npm run bench -- goldstoneCount
 */
import { countGoldstone } from '../server/engine/goldstone/countGoldstone'
import { median } from './support/timing'

function countsToP12(repeats: number) {
  const times: number[] = []
  let cold = 0
  let stamp: number[] = []
  for (let i = 0; i <= repeats; i++) {
    const t0 = performance.now()
    const r = countGoldstone({ coset: 'chiral', N: 3, sources: true, maxOrder: 12 })
    const dt = performance.now() - t0
    if (i === 0) cold = dt
    else times.push(dt)
    stamp = r.byOrder.map((o) => o.operators)
  }
  return { median_ms: Math.round(median(times)), cold_ms: Math.round(cold), repeats, operators_by_order: stamp, expected_p10: 45171 }
}

export default async function goldstoneCountBench(): Promise<Record<string, unknown>> {
  return { 'counts SU(3) with sources to p^12': countsToP12(3) }
}
