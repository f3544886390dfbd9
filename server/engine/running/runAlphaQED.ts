/**
 * One-loop running of the QED coupling with step-function decoupling of charged fermions
 * (leading logarithms): below the lightest fermion α = α(0); each fermion f with m_f < μ adds
 * dα^-1/d ln μ = −(2/3π) N_c Q_f². Scales in GeV.
 */
import { EngineInputError } from '../errors'
import { mul, type Rational } from '../exact/rational'
import { ALPHA_INVERSE } from '../scales/codata2018'
import { rationalToNumber } from '../scales/decimal'
import { RUNNING_CAUTION } from './caution'
import { QED_FERMIONS, type QedFermion } from './qedFermions'

export interface RunAlphaQEDInput {
  muTo: number
  /** α^-1 below every threshold (Thomson limit); default CODATA 2018, 137.035999084. */
  alphaInverse0?: number
  /** Default: the charged leptons (CODATA 2018) and quarks (PDG 2024). */
  fermions?: readonly QedFermion[]
  /** Plot points per segment between thresholds (default 8). */
  pointsPerSegment?: number
}
export interface AlphaQEDTracePoint {
  mu: number
  alpha: number
  alphaInverse: number
  activeFermions: number
}
export interface RunAlphaQEDResult {
  alpha: number
  alphaInverse: number
  muTo: number
  trace: AlphaQEDTracePoint[]
  computed: string[]
  inputs: Record<string, number | string>
  caution: string
}

/** N_c Q² of one fermion, exact (common practice). @example chargeWeight(up quark) // 4/3 */
export function chargeWeight(f: QedFermion): Rational {
  return mul(mul(f.charge, f.charge), { num: BigInt(f.colours), den: 1n })
}

function checkFermions(fs: readonly QedFermion[]): void {
  for (const f of fs) {
    if (!Number.isFinite(f.mass) || f.mass <= 0) throw new EngineInputError('runAlphaQED', `The mass of fermion "${f.name}" must be positive, but it is ${f.mass}`)
    if (f.colours !== 1 && f.colours !== 3) throw new EngineInputError('runAlphaQED', `Fermion "${f.name}" must come in 1 or 3 colours, not ${f.colours}`)
  }
}

/**
 * α(μ) at one loop with step-function thresholds.
 * Convention: α^-1(μ) = α^-1(0) − (2/3π) Σ_{m_f<μ} N_c Q_f² ln(μ/m_f) (MS-bar-like decoupling at μ = m_f, no constants).
 * @example runAlphaQED({ muTo: 91.1876, fermions: CHARGED_LEPTONS }).alphaInverse // ≈ 132.200
 * Method: exact one-loop solution on each segment (α^-1 is linear in ln μ).
 * Reference: M. E. Peskin, D. V. Schroeder, An Introduction to QFT (1995), §7.5 (vacuum polarization)
 *   and §12.3 (evolution of couplings); common practice for the step-function thresholds.
 */
export function runAlphaQED(input: RunAlphaQEDInput): RunAlphaQEDResult {
  const inv0 = input.alphaInverse0 ?? ALPHA_INVERSE
  const fermions = [...(input.fermions ?? QED_FERMIONS)].sort((a, b) => a.mass - b.mass)
  if (!Number.isFinite(input.muTo) || input.muTo <= 0) throw new EngineInputError('runAlphaQED', `The wanted scale μ must be a positive number of GeV, but it is ${input.muTo}`)
  if (!Number.isFinite(inv0) || inv0 <= 0) throw new EngineInputError('runAlphaQED', `α(0)⁻¹ must be positive, but it is ${inv0}`)
  checkFermions(fermions)
  const inverseAt = (mu: number) => fermions.reduce((s, f) => (f.mass < mu ? s - (2 / (3 * Math.PI)) * rationalToNumber(chargeWeight(f)) * Math.log(mu / f.mass) : s), inv0)
  const active = (mu: number) => fermions.filter((f) => f.mass < mu).length
  const edges = [...fermions.map((f) => f.mass).filter((m) => m < input.muTo), input.muTo]
  const n = input.pointsPerSegment ?? 8
  const trace: AlphaQEDTracePoint[] = []
  for (let i = 0; i < edges.length; i++) {
    const lo = i === 0 ? edges[0]! / 10 : edges[i - 1]!
    for (let k = i === 0 ? 0 : 1; k <= n; k++) {
      const mu = lo * (edges[i]! / lo) ** (k / n)
      const inv = inverseAt(mu)
      trace.push({ mu, alpha: 1 / inv, alphaInverse: inv, activeFermions: active(mu) })
    }
  }
  const alphaInverse = inverseAt(input.muTo)
  if (!(alphaInverse > 0)) throw new EngineInputError('runAlphaQED', `α⁻¹ turns negative on the way to μ = ${input.muTo} GeV (Landau pole); choose a lower scale`)
  return {
    alpha: 1 / alphaInverse,
    alphaInverse,
    muTo: input.muTo,
    trace,
    computed: ['one-loop leading-logarithm running of α with step-function thresholds'],
    inputs: { alphaInverse0: inv0, fermions: fermions.map((f) => `${f.name} ${f.mass} GeV (${f.source})`).join('; ') },
    caution: `${RUNNING_CAUTION}. Light-quark thresholds are not perturbative: use alphaQedAtZ with a measured Δα_had for hadrons.`,
  }
}
