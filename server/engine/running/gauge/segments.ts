/**
 * The ranges of μ between the thresholds of a gauge content, each with its active multiplets
 * and exact β coefficients. A multiplet of mass m is active for μ > m (step-function
 * decoupling). In MS-bar the one-loop matching of a heavy fermion or scalar is
 * α⁻¹_below(μ) = α⁻¹_above(μ) − (Δb/2π) ln(μ/m), which vanishes at μ = m: the couplings are
 * continuous at the thresholds, as two-loop running needs (the constants of the two-loop
 * matching belong with three-loop running and are not applied).
 */
import type { GaugeContent } from './gaugeContent'
import { gaugeBetaCoefficients, type GaugeBetaCoefficients } from './betaCoefficients'

export interface RunningSegment {
  /** (lowGeV, highGeV]; lowGeV is 0 below the lightest threshold, highGeV Infinity above the heaviest. */
  lowGeV: number
  highGeV: number
  /** Names of the active multiplets. */
  active: string[]
  coefficients: GaugeBetaCoefficients
}

/**
 * Segments in increasing μ.
 * @example runningSegments(towerGaugeContent([{ theory: qedWithMuon, thresholdGeV: null }, { theory: qed, thresholdGeV: 0.1057 }]))
 *   .map(s => s.active.length) // [2, 4] (e alone below the muon mass, e and μ above)
 * Method: distinct positive masses as boundaries; gaugeBetaCoefficients on each active set.
 * Reference: S. Weinberg, Phys. Lett. B 91 (1980) 51; L. J. Hall, Nucl. Phys. B 178 (1981) 75
 *   (decoupling and one-loop matching at thresholds).
 */
export function runningSegments(content: GaugeContent): RunningSegment[] {
  const masses = [...new Set(content.multiplets.map((m) => m.massGeV).filter((m) => m > 0))].sort((a, b) => a - b)
  const bounds = [0, ...masses, Number.POSITIVE_INFINITY]
  const out: RunningSegment[] = []
  for (let i = 0; i + 1 < bounds.length; i++) {
    const low = bounds[i]!
    const active = (m: number) => m <= low
    out.push({
      lowGeV: low,
      highGeV: bounds[i + 1]!,
      active: content.multiplets.filter((m) => active(m.massGeV)).map((m) => m.name),
      coefficients: gaugeBetaCoefficients(content, active),
    })
  }
  return out
}

/** Index of the segment holding μ (a threshold belongs to the segment below it, pointing up to the one above). */
export function segmentIndexAt(segments: readonly RunningSegment[], muGeV: number, upward: boolean): number {
  const i = segments.findIndex((s) => (upward ? muGeV >= s.lowGeV && muGeV < s.highGeV : muGeV > s.lowGeV && muGeV <= s.highGeV))
  return i < 0 ? segments.length - 1 : i
}
