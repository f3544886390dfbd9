/**
 * Benchmarks of the running engine: median wall times (ms) of a few repeats.
 * Figures: α_s from M_Z down to 1 GeV and back at four loops with b and c thresholds,
 * one-loop QED running over all SM fermions, α(M_Z) on-shell and MS-bar, and the scale
 * ladder of a hydrogen-like atom with exact ratios.
 */
import { runAlphaS, type QcdThreshold } from '../server/engine/running/runAlphaS'
import { runAlphaQED } from '../server/engine/running/runAlphaQED'
import { alphaQedAtZ } from '../server/engine/running/alphaQedAtZ'
import { buildScaleLadder } from '../server/engine/scales/scaleLadder'
import { ALPHA_S_MZ, BOTTOM_MSBAR_MASS_GEV, CHARM_MSBAR_MASS_GEV, Z_MASS_GEV } from '../server/engine/scales/pdg2024'
import { medianTime } from './support/timing'

const BC: QcdThreshold[] = [
  { name: 'b', mass: BOTTOM_MSBAR_MASS_GEV, kind: 'msbar' },
  { name: 'c', mass: CHARM_MSBAR_MASS_GEV, kind: 'msbar' },
]

export default async function runningBench(): Promise<Record<string, number | Record<string, unknown>>> {
  let tracePoints = 0
  const alphaSRoundTrip = medianTime(15, () => {
    const down = runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: 1, loops: 4, thresholds: BC })
    const up = runAlphaS({ alphaS: down.alphaS, muFrom: 1, muTo: Z_MASS_GEV, loops: 4, thresholds: BC })
    tracePoints = down.trace.length + up.trace.length
  })
  return {
    alphaS_4loop_MZ_to_1GeV_and_back: { median_ms: alphaSRoundTrip, trace_points: tracePoints },
    alphaS_1loop_MZ_to_1GeV: medianTime(15, () => runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: 1, loops: 1, thresholds: BC })),
    alphaQED_1loop_all_fermions_to_MZ: medianTime(50, () => runAlphaQED({ muTo: Z_MASS_GEV })),
    alphaQED_at_MZ_onshell_and_msbar: medianTime(50, () => alphaQedAtZ({ deltaAlphaHad5: 0.02766 })),
    scale_ladder_hydrogen_exact: medianTime(50, () =>
      buildScaleLadder(
        {
          scales: [
            { name: 'me', value: '0.51099895000', unit: 'MeV' },
            { name: 'mp', value: '938.27208816', unit: 'MeV' },
            { name: 'mb', value: '4.18', unit: 'GeV' },
          ],
          parameters: [
            { name: 'alpha', numerator: '1', denominator: '137.035999084' },
            { name: 'r', numerator: 'me', denominator: 'mb' },
          ],
          derived: [{ name: 'Ry', from: 'me', factor: '1/2', powers: { alpha: 2 }, unit: 'eV' }],
          precisionTarget: 1e-6,
        },
        [0, 1, 2, 3, 4, 5, 6, 7, 8, { order: 'b', powers: { r: 2 } }],
      ),
    ),
  }
}
