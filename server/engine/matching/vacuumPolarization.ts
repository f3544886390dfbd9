/**
 * One-loop vacuum polarization of a Dirac fermion of mass m and charge Q (in units of e):
 * Π̂₂(q²) = Π₂(q²) − Π₂(0) = −(2αQ²/π) ∫₀¹ dx x(1−x) ln[m² / (m² − x(1−x) q²)], metric (+,−,−,−).
 * Its small-q² expansion gives the dimension-six operator F_{μν} □ F^{μν} (Uehling term).
 */
import { EngineInputError } from '../errors'
import { div, mul, neg, rat, type Rational } from '../exact/rational'

function factorial(n: number): bigint {
  let f = 1n
  for (let i = 2n; i <= BigInt(n); i++) f *= i
  return f
}

/**
 * Exact coefficients c_k of Π̂₂(q²) = (αQ²/π) Σ_{k≥1} c_k (q²/m²)^k, for k = 1..order.
 * @example vacuumPolarizationSeries(2) // [-1/15, -1/140]
 * Method: −ln(1 − u) = Σ u^k/k under the Feynman-parameter integral, ∫₀¹ x^n(1−x)^n dx = (n!)²/(2n+1)!,
 *   so c_k = −(2/k) ((k+1)!)² / (2k+3)!.
 * Reference: M. E. Peskin, D. V. Schroeder, An Introduction to QFT (1995), §7.5 (Π̂₂ and its expansion).
 */
export function vacuumPolarizationSeries(order: number): Rational[] {
  if (!Number.isInteger(order) || order < 1 || order > 30) {
    throw new EngineInputError('vacuumPolarizationSeries', `The order of the vacuum-polarization series must be a whole number from 1 to 30, not ${order}`)
  }
  return Array.from({ length: order }, (_, i) => {
    const k = i + 1
    const beta = rat(factorial(k + 1) ** 2n, factorial(2 * k + 3))
    return neg(mul(rat(2, k), beta))
  })
}

/**
 * Numeric Π̂₂(q²) for q² < 4m² (below the pair threshold), at coupling αQ².
 * @example vacuumPolarizationOneLoop(-0.01, 1 / 137.035999084) // ≈ +1.5469e-6 (≈ −(α/15π)(q²/m²))
 * Method: composite Simpson rule (2000 intervals) on the Feynman-parameter integral.
 * Reference: Peskin & Schroeder (1995), §7.5.
 */
export function vacuumPolarizationOneLoop(q2OverM2: number, alphaQ2: number): number {
  if (!Number.isFinite(q2OverM2) || q2OverM2 >= 4) {
    throw new EngineInputError('vacuumPolarizationOneLoop', `q²/m² must be a finite number below the pair threshold 4, but it is ${q2OverM2}`)
  }
  const f = (x: number) => x * (1 - x) * -Math.log1p(-x * (1 - x) * q2OverM2)
  const n = 2000
  let s = f(0) + f(1)
  for (let i = 1; i < n; i++) s += (i % 2 === 1 ? 4 : 2) * f(i / n)
  return ((-2 * alphaQ2) / Math.PI) * (s / (3 * n))
}

/**
 * Coefficient of F_{μν} □ F^{μν} in L_eff implied by the leading term Π̂₂ ≈ (α/π) c₁ q²/m².
 * Convention: L_eff = −¼ F_{μν} [1 − Π̂₂(−□)] F^{μν}; result in units of αQ²/(π m²).
 * @example uehlingCoefficient(rat(-1, 15)) // 1/60, i.e. L ⊃ (α/(60π m²)) F□F
 * Method: the resummed propagator −i g/(q²(1 − Π̂)) is the inverse of the quadratic action
 *   −¼ F (1 − Π̂) F; with q² → −□ the term −¼ F (−c₁ q²/m²) F becomes −(c₁/4) F □ F / m².
 * Reference: Peskin & Schroeder (1995), §7.5; E. A. Uehling, Phys. Rev. 48 (1935) 55.
 */
export function uehlingCoefficient(c1: Rational): Rational {
  return div(neg(c1), rat(4))
}
