/**
 * Running of the strong coupling α_s(μ) in MS-bar at one to four loops, with decoupling of
 * heavy quarks at their thresholds (down or up in μ). Scales in GeV.
 */
import { EngineInputError } from '../errors'
import { integrateOde, OdeRangeError, type CancelSignal } from './odeStepper'
import { qcdBeta } from './qcdBeta'
import { alphaSBelowThreshold, alphaSAboveThreshold, type DecouplingLoops, type HeavyMassKind } from './qcdDecoupling'
import { RUNNING_CAUTION } from './caution'
import { validateRunAlphaS, type QcdThreshold, type RunAlphaSInput } from './runAlphaSInput'

export type { QcdThreshold, RunAlphaSInput }

export interface AlphaSTracePoint {
  mu: number
  alphaS: number
  nf: number
}
export interface ThresholdCrossing {
  name: string
  mass: number
  kind: HeavyMassKind
  direction: 'down' | 'up'
  nfAbove: number
  alphaAbove: number
  alphaBelow: number
}
export interface RunAlphaSResult {
  alphaS: number
  muTo: number
  nfFrom: number
  nfTo: number
  loops: number
  decouplingLoops: DecouplingLoops
  crossings: ThresholdCrossing[]
  trace: AlphaSTracePoint[]
  computed: string[]
  inputs: Record<string, number | string>
  caution: string
}

const GEV = (mu: number) => `${Number(mu.toPrecision(3))} GeV`

/** What it means for the user that α_s left (0, 4π) at t = ln μ², running from muA to muB. */
function leftRangeText(e: OdeRangeError, muA: number, muB: number, nf: number): string {
  const at = GEV(Math.exp(e.t / 2))
  const run = `running from μ = ${GEV(muA)} to ${GEV(muB)} with ${nf} active flavours`
  if (muB < muA) return `α_s grows beyond the perturbative range below μ = ${at} (${run}, towards the Landau pole); choose a higher scale, or a smaller α_s`
  return `α_s leaves the perturbative range above μ = ${at} (${run}); choose a lower scale, or a smaller α_s`
}

/** dα/d ln μ² = −α Σ_{i<loops} β_i (α/4π)^{i+1} for n_f flavours. */
function alphaSFlow(nf: number, loops: number): (alpha: number) => number {
  const beta = qcdBeta(nf).slice(0, loops)
  return (alpha: number) => {
    const a = alpha / (4 * Math.PI)
    let s = 0
    for (let i = beta.length - 1; i >= 0; i--) s = s * a + beta[i]!
    return -alpha * a * s
  }
}

function runSegment(alpha: number, muA: number, muB: number, nf: number, loops: number, trace: AlphaSTracePoint[], signal?: CancelSignal): number {
  const onStep = (t: number, y: number) => trace.push({ mu: Math.exp(t / 2), alphaS: y, nf })
  try {
    return integrateOde(alphaSFlow(nf, loops), alpha, 2 * Math.log(muA), 2 * Math.log(muB), { signal, onStep, yMax: 4 * Math.PI, maxStep: 0.05 })
  } catch (e) {
    if (e instanceof OdeRangeError) throw new EngineInputError('runAlphaS', leftRangeText(e, muA, muB, nf))
    throw e
  }
}

/**
 * α_s(muTo) from α_s(muFrom), integrating the MS-bar renormalization-group equation numerically
 * and decoupling heavy quarks at μ = m_h (a quark counts as active for μ > m_h).
 * Convention: β as in qcdBeta (a = α_s/4π); decoupling α_s^(n_f−1) = ζ_g² α_s^(n_f) at μ = m_h,
 * ζ_g² = 1 + c2 (α_s/π)², c2 = 11/72 (MS-bar mass m_h(m_h)) or −7/24 (pole mass).
 * @example runAlphaS({ alphaS: 0.118, muFrom: 91.188, muTo: 1.77693, loops: 4,
 *   thresholds: [{ name: 'b', mass: 4.183, kind: 'msbar' }, { name: 'c', mass: 1.273, kind: 'msbar' }] }).alphaS // ≈ 0.3292
 * Method: adaptive RK4 in ln μ² (tolerance 1e-13), exact inversion of the decoupling when going up.
 * Reference: van Ritbergen, Vermaseren, Larin, Phys. Lett. B 400 (1997) 379 (β3);
 *   Chetyrkin, Kniehl, Steinhauser, Nucl. Phys. B 510 (1998) 61 (decoupling).
 */
export function runAlphaS(input: RunAlphaSInput): RunAlphaSResult {
  const v = validateRunAlphaS(input)
  const trace: AlphaSTracePoint[] = [{ mu: input.muFrom, alphaS: input.alphaS, nf: v.nfFrom }]
  const crossings: ThresholdCrossing[] = []
  let alpha = input.alphaS
  let mu = input.muFrom
  let nf = v.nfFrom
  const totalLog = Math.abs(Math.log(input.muTo / input.muFrom)) || 1
  for (const th of v.crossed) {
    alpha = runSegment(alpha, mu, th.mass, nf, input.loops, trace, input.signal)
    const below = v.down ? alphaSBelowThreshold(alpha, 0, th.kind, v.decouplingLoops) : alpha
    const above = v.down ? alpha : alphaSAboveThreshold(alpha, 0, th.kind, v.decouplingLoops)
    const nfAbove = v.down ? nf : nf + 1
    crossings.push({ name: th.name, mass: th.mass, kind: th.kind, direction: v.down ? 'down' : 'up', nfAbove, alphaAbove: above, alphaBelow: below })
    alpha = v.down ? below : above
    nf = v.down ? nf - 1 : nf + 1
    mu = th.mass
    trace.push({ mu, alphaS: alpha, nf })
    input.onProgress?.(Math.abs(Math.log(mu / input.muFrom)) / totalLog, `threshold ${th.name} (n_f = ${nf})`)
  }
  alpha = runSegment(alpha, mu, input.muTo, nf, input.loops, trace, input.signal)
  input.onProgress?.(1, `μ = ${input.muTo} GeV`)
  return {
    alphaS: alpha,
    muTo: input.muTo,
    nfFrom: v.nfFrom,
    nfTo: nf,
    loops: input.loops,
    decouplingLoops: v.decouplingLoops,
    crossings,
    trace,
    computed: ['α_s(muTo) by numerical integration of the truncated β function', 'the jumps of α_s at the crossed thresholds'],
    inputs: { alphaS: input.alphaS, muFrom: input.muFrom, muTo: input.muTo, thresholds: v.crossed.map((t) => `${t.name} ${t.mass} GeV (${t.kind})`).join(', ') || 'none crossed' },
    caution: RUNNING_CAUTION,
  }
}
