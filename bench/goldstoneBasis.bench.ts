/**
 * Benchmark of the Goldstone-frame explicit basis: one cold build of the p⁶ basis of
 * SU(3)×SU(3)/SU(3) with the sources s, p, l_μ, r_μ (minutes on a shared machine: one run only),
 * stamped with its tally against the Hilbert series (117 = 117; 94 normal- and 23 odd-parity
 * terms: Bijnens, Colangelo, Ecker, Ann. Phys. 280 (2000) 100; Bijnens, Girlanda, Talavera,
 * Eur. Phys. J. C 23 (2002) 539). Run alone: npm run bench -- goldstoneBasis
 */
import { goldstoneBasis } from '../server/engine/goldstone/explicit/goldstoneBasis'

export default async function goldstoneBasisBench(): Promise<Record<string, unknown>> {
  const t0 = performance.now()
  const r = goldstoneBasis({ N: 3, sources: true, maxOrder: 6, minOrder: 6 }).byOrder[0]!
  return { 'explicit basis SU(3) p^6': { cold_ms: Math.round(performance.now() - t0), kept: r.kept.length, hilbert: r.hilbert, tally_ok: r.tallyOk } }
}
