/**
 * Running of a theory's own gauge couplings at one or two loops from one scale to another,
 * through the thresholds of its tower, stopping with a physicist's message where a coupling
 * grows beyond 4π (or a Landau pole of the U(1)s is reached).
 */
import { EngineInputError } from '../../errors'
import { integrateOdeSystem } from '../odeSystem'
import { gaugeFlow, perturbativeMargins, slotLayout, type SlotLayout } from './gaugeFlow'
import { readCouplings, startState, type GaugeCouplingValues, type GaugeRunInput } from './gaugeRunInput'
import type { GaugeRunPoint, GaugeRunStop } from '../../../../shared/types/gaugeRunning'
import { runningSegments, segmentIndexAt, type RunningSegment } from './segments'

export type { GaugeRunPoint, GaugeRunStop }

export interface GaugeRunResult {
  /** Running groups (theory order) and the pairs of U(1)s whose ε is reported. */
  groups: string[]
  pairs: [string, string][]
  loops: 1 | 2
  segments: RunningSegment[]
  /** Every accepted step from muFrom towards muTo (the start first). */
  points: GaugeRunPoint[]
  /** The last point: at muTo when reached, else where the running stopped. */
  end: GaugeRunPoint
  stop?: GaugeRunStop
}

const SUP: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' }

/** A scale for a message: 3 significant digits, powers of ten far from 1. @example formatGeV(3.214e17) // '3.21·10¹⁷ GeV' */
export function formatGeV(mu: number): string {
  if (mu >= 1e-3 && mu < 1e5) return `${Number(mu.toPrecision(3))} GeV`
  const e = Math.floor(Math.log10(mu))
  const m = Number((mu / 10 ** e).toPrecision(3))
  return `${m === 1 ? '' : `${m}·`}10${String(e)
    .split('')
    .map((c) => SUP[c])
    .join('')} GeV`
}

function stopMessage(layout: SlotLayout, index: number, mu: number, up: boolean, mixing: boolean): GaugeRunStop {
  const group = layout.groups[index]!
  const where = `${up ? 'above' : 'below'} μ ≈ ${formatGeV(mu)}`
  const abelian = layout.abelianAt[index]! >= 0
  const what = abelian && mixing ? `the ${group} coupling (kinetic mixing included)` : `g_${group}`
  return { group, muGeV: mu, direction: up ? 'up' : 'down', message: `${what} grows beyond 4π ${where}: perturbation theory fails there (a Landau pole lies close by), so the running stops.` }
}

/** The thresholds (and marked scales) passed from muFrom to muTo, in running order. */
function crossings(segments: readonly RunningSegment[], from: number, to: number, marks: readonly number[]): number[] {
  const up = to >= from
  const bounds = [...new Set([...segments.slice(1).map((s) => s.lowGeV), ...marks])].sort((a, b) => a - b)
  return up ? bounds.filter((m) => m > from && m < to) : bounds.filter((m) => m < from && m > to).reverse()
}

/**
 * α⁻¹ and ε from muFrom to muTo (all accepted steps), stopping where a coupling leaves the
 * perturbative range.
 * @example runGaugeCouplings({ content: gaugeContentOf(smeft), loops: 1, muFromGeV: 91.1876, muToGeV: 1e16,
 *   alpha: { colour: 0.118, weak: 0.0338, hypercharge: 0.0102 } }).end.alphaInverse // ≈ [44.49, 45.88, 62.88] (one loop: 1/α − b ln(μ/μ0)/2π)
 * Method: adaptive RK4 in ln μ (integrateOdeSystem) on the inverse couplings, segment by segment
 *   between thresholds, continuous at each threshold (MS-bar one-loop matching at μ = m).
 * Reference: Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83; Luo & Xiao, Phys. Lett. B 555 (2003) 279.
 */
export function runGaugeCouplings(input: GaugeRunInput): GaugeRunResult {
  const segments = runningSegments(input.content)
  const layout = slotLayout(segments[0]!.coefficients)
  let y = startState(input, layout)
  const up = input.muToGeV >= input.muFromGeV
  const pairs: [string, string][] = []
  layout.abelian.forEach((k, i) =>
    layout.abelian.forEach((l, j) => {
      if (i < j) pairs.push([k, l])
    }),
  )
  const mixing = segments.some((s) => s.coefficients.mixes) || (input.mixing ?? []).some((m) => m.epsilon !== 0)
  const point = (mu: number, state: Float64Array, segment: number): GaugeRunPoint => ({ mu, segment, ...readCouplings(layout, state) })
  const points: GaugeRunPoint[] = [point(input.muFromGeV, y, segmentIndexAt(segments, input.muFromGeV, up))]
  const margins = perturbativeMargins(layout)
  const total = Math.abs(Math.log(input.muToGeV / input.muFromGeV)) || 1
  let mu = input.muFromGeV
  for (const edge of [...crossings(segments, mu, input.muToGeV, input.marks ?? []), input.muToGeV]) {
    const seg = segmentIndexAt(segments, mu, up)
    const flow = gaugeFlow(segments[seg]!.coefficients, input.loops)
    const onStep = (t: number, s: Float64Array) => points.push(point(Math.exp(t), s, seg))
    const r = integrateOdeSystem(flow, y, Math.log(mu), Math.log(edge), { margins, onStep, signal: input.signal, maxStep: 0.1 })
    if (r.stopped) {
      const end = point(Math.exp(r.stopped.t), r.y, seg)
      return { groups: layout.groups, pairs, loops: input.loops, segments, points: [...points, end], end, stop: stopMessage(layout, r.stopped.index, end.mu, up, mixing) }
    }
    y = r.y
    mu = edge
    points[points.length - 1] = point(mu, y, seg)
    input.onProgress?.(Math.abs(Math.log(mu / input.muFromGeV)) / total, `μ = ${formatGeV(mu)}`)
  }
  return { groups: layout.groups, pairs, loops: input.loops, segments, points, end: points[points.length - 1]!, stop: undefined }
}

/** Couplings at one scale, also by group name (α = g²/4π). */
export interface GaugeCouplingsAt extends GaugeCouplingValues {
  alpha: Record<string, number>
}

/**
 * The couplings at one scale, for callers that need a value (matching, tables): throws the
 * stop message as an input error when the running cannot reach muTo.
 * @example gaugeCouplingsAt({ ...input, muToGeV: 1000 }).alpha.colour // α_s(1 TeV)
 */
export function gaugeCouplingsAt(input: Omit<GaugeRunInput, 'onProgress'>): GaugeCouplingsAt {
  const r = runGaugeCouplings(input)
  if (r.stop)
    throw new EngineInputError('gaugeCouplingsAt', `${r.stop.message.replace(/, so the running stops\.$/, '')}; ${formatGeV(input.muToGeV)} cannot be reached from ${formatGeV(input.muFromGeV)}.`)
  const alpha = Object.fromEntries(r.groups.map((g, i) => [g, 1 / r.end.alphaInverse[i]!]))
  return { alphaInverse: r.end.alphaInverse, epsilon: r.end.epsilon, alpha }
}
