/**
 * Decoupling of a heavy quark from α_s in MS-bar: α_s^(n_f−1)(μ) = ζ_g² α_s^(n_f)(μ), with
 * ζ_g² = 1 + c1(L) a + c2(L) a², a = α_s^(n_f)(μ)/π and L = ln(μ²/m_h²).
 */
import { EngineInputError } from '../errors'
import { parseRational, type Rational } from '../exact/rational'
import { rationalToNumber } from '../scales/decimal'

export type HeavyMassKind = 'msbar' | 'pole'
export type DecouplingLoops = 1 | 2

/** Coefficients of 1, L, L² in c1 and c2, exact (Chetyrkin, Kniehl, Steinhauser 1998). */
export interface DecouplingCoefficients {
  c1: readonly [Rational, Rational]
  c2: readonly [Rational, Rational, Rational]
}

const q = parseRational
const COEFFS: Record<HeavyMassKind, DecouplingCoefficients> = {
  // L = ln(μ²/m_h(μ)²), m_h the MS-bar mass at the scale μ.
  msbar: { c1: [q('0'), q('-1/6')], c2: [q('11/72'), q('-11/24'), q('1/36')] },
  // L = ln(μ²/M_h²), M_h the pole mass.
  pole: { c1: [q('0'), q('-1/6')], c2: [q('-7/24'), q('-19/24'), q('1/36')] },
}

/**
 * Exact decoupling coefficients of ζ_g² for a heavy-quark mass of the given kind.
 * Convention: α_s^(n_f−1) = ζ_g² α_s^(n_f), ζ_g² = 1 + a c1 + a² c2, a = α_s^(n_f)/π,
 * c1 = c1[0] + c1[1] L, c2 = c2[0] + c2[1] L + c2[2] L².
 * @example decouplingCoefficients('msbar').c2[0] // 11/72
 * Method: published two-loop relation.
 * Reference: K. G. Chetyrkin, B. A. Kniehl, M. Steinhauser, Nucl. Phys. B 510 (1998) 61, eqs. (20), (22)–(23) (hep-ph/9708255).
 */
export function decouplingCoefficients(kind: HeavyMassKind): DecouplingCoefficients {
  const c = COEFFS[kind]
  if (!c) throw new EngineInputError('decouplingCoefficients', `A heavy-quark mass is an MS-bar mass ("msbar") or a pole mass ("pole"), not "${kind}"`)
  return c
}

/**
 * ζ_g² at a = α_s^(n_f)/π and L = ln(μ²/m_h²), truncated after `loops` powers of a.
 * @example decouplingFactor(0.22 / Math.PI, 0, 'msbar', 2) // 1 + (11/72)(0.22/π)² ≈ 1.000749
 * Method: polynomial evaluation of the exact coefficients.
 * Reference: Chetyrkin, Kniehl, Steinhauser, Nucl. Phys. B 510 (1998) 61.
 */
export function decouplingFactor(aOverPi: number, logMu2OverM2: number, kind: HeavyMassKind, loops: DecouplingLoops): number {
  if (loops !== 1 && loops !== 2) throw new EngineInputError('decouplingFactor', `The decoupling loops must be 1 or 2, not ${loops}`)
  const { c1, c2 } = decouplingCoefficients(kind)
  const L = logMu2OverM2
  const n = rationalToNumber
  const one = n(c1[0]) + n(c1[1]) * L
  const two = n(c2[0]) + n(c2[1]) * L + n(c2[2]) * L * L
  return 1 + aOverPi * one + (loops === 2 ? aOverPi * aOverPi * two : 0)
}

/**
 * α_s^(n_f−1)(μ) from α_s^(n_f)(μ) (going down through the threshold).
 * @example alphaSBelowThreshold(0.2245, 0, 'msbar', 2) // 0.2246751 (= 0.2245 [1 + (11/72)(0.2245/π)²])
 * Method: α_low = ζ_g²(α_high) α_high.
 * Reference: Chetyrkin, Kniehl, Steinhauser, Nucl. Phys. B 510 (1998) 61.
 */
export function alphaSBelowThreshold(alphaHigh: number, logMu2OverM2: number, kind: HeavyMassKind, loops: DecouplingLoops): number {
  return alphaHigh * decouplingFactor(alphaHigh / Math.PI, logMu2OverM2, kind, loops)
}

/**
 * α_s^(n_f)(μ) from α_s^(n_f−1)(μ) (going up), the exact inverse of alphaSBelowThreshold.
 * @example alphaSAboveThreshold(alphaSBelowThreshold(0.2245, 0, 'msbar', 2), 0, 'msbar', 2) // 0.2245 (to 1e-15)
 * Method: fixed-point iteration α_high ← α_low / ζ_g²(α_high) (a contraction for α_s < 1).
 * Reference: Chetyrkin, Kniehl, Steinhauser, Nucl. Phys. B 510 (1998) 61.
 */
export function alphaSAboveThreshold(alphaLow: number, logMu2OverM2: number, kind: HeavyMassKind, loops: DecouplingLoops): number {
  let x = alphaLow
  for (let i = 0; i < 200; i++) {
    const next = alphaLow / decouplingFactor(x / Math.PI, logMu2OverM2, kind, loops)
    if (Math.abs(next - x) <= 1e-16 * Math.abs(next)) return next
    x = next
  }
  // Only a large α_s keeps the iteration from contracting: a property of the input, not a bug.
  throw new EngineInputError(
    'alphaSAboveThreshold',
    `α_s = ${alphaLow} at a heavy-quark threshold is too large to match across it (the matching is perturbative); choose a smaller α_s or start above the threshold`,
  )
}
