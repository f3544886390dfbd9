/**
 * Benchmark of the Goldstone-frame explicit basis: one cold build of the p⁶ basis of
 * SU(3)×SU(3)/SU(3) with the sources s, p, l_μ, r_μ (minutes on a shared machine: one run only),
 * stamped with its tally against the Hilbert series (117 = 117; 94 normal- and 23 odd-parity
 * terms: Bijnens, Colangelo, Ecker, Ann. Phys. 280 (2000) 100; Bijnens, Girlanda, Talavera,
 * Eur. Phys. J. C 23 (2002) 539); and the typed rewrite of one operator onto the 12 kept p⁴
 * terms (median of a few, the cold run apart), what the board's rewrite form waits for.
 * Run alone: npm run bench -- goldstoneBasis
 */
import { goldstoneBasis } from '../server/engine/goldstone/explicit/goldstoneBasis'
import { goldstoneTypedFingerprints } from '../server/engine/goldstone/explicit/typedGoldstone'
import { median } from './support/timing'

function typedRewriteP4(repeats: number) {
  const kept = goldstoneBasis({ N: 3, sources: true, maxOrder: 4, minOrder: 4 }).byOrder[0]!.kept.map((k) => k.text)
  const times: number[] = []
  let cold = 0
  for (let i = 0; i <= repeats; i++) {
    const t0 = performance.now()
    goldstoneTypedFingerprints({ N: 3, sources: { scalar: true, vector: true }, order: 4, evaluatedAtN: 3 }, [...kept, '⟨u_μ u^μ⟩⟨u_ν u^ν⟩'])
    const dt = performance.now() - t0
    if (i === 0) cold = dt
    else times.push(dt)
  }
  return { median_ms: Math.round(median(times)), cold_ms: Math.round(cold), repeats, kept: kept.length }
}

export default async function goldstoneBasisBench(): Promise<Record<string, unknown>> {
  const typed = typedRewriteP4(3)
  const t0 = performance.now()
  const r = goldstoneBasis({ N: 3, sources: true, maxOrder: 6, minOrder: 6 }).byOrder[0]!
  return {
    'typed rewrite SU(3) p^4': typed,
    'explicit basis SU(3) p^6': { cold_ms: Math.round(performance.now() - t0), kept: r.kept.length, hilbert: r.hilbert, tally_ok: r.tallyOk },
  }
}
