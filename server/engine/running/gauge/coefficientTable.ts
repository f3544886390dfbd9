/**
 * The exact β coefficients of one running segment written out for a reader: b_i per group and
 * B_ij between groups (the usual form when U(1)s do not mix), and every term that involves
 * kinetic mixing, as rational strings.
 */
import { toString as ratText } from '../../exact/rational'
import type { GaugeBetaCoefficients } from './betaCoefficients'
import type { RunningSegment } from './segments'
import type { CoefficientTable, MixingTerm } from '../../../../shared/types/gaugeRunning'

export type { CoefficientTable, MixingTerm }

const slotName = (c: GaugeBetaCoefficients, i: number) => c.slots[i]!.groups.join(',')

function mixingTerms(c: GaugeBetaCoefficients, diagonal: number): MixingTerm[] {
  const terms: MixingTerm[] = []
  c.slots.forEach((_, t) => {
    if (t >= diagonal && c.oneLoop[t]!.num !== 0n) terms.push({ target: slotName(c, t), coupling: null, value: ratText(c.oneLoop[t]!) })
    c.twoLoop[t]!.forEach((v, j) => {
      if (v.num !== 0n && (t >= diagonal || j >= diagonal)) terms.push({ target: slotName(c, t), coupling: slotName(c, j), value: ratText(v) })
    })
  })
  return terms
}

/**
 * The segment's coefficients as strings.
 * @example coefficientTable(runningSegments(gaugeContentOf(smeft))[0]).oneLoop // ['-7', '-19/6', '41/6']
 * Method: the diagonal slots give b_i and B_ij; any slot of a pair k < l is listed as a mixing term.
 * Reference: Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83; Luo & Xiao, Phys. Lett. B 555 (2003) 279.
 */
export function coefficientTable(segment: RunningSegment): CoefficientTable {
  const c = segment.coefficients
  const diagonal = c.slots.filter((s) => s.groups.length === 1 || s.groups[0] === s.groups[1]).length
  const abelian = c.slots.slice(0, diagonal).filter((s) => s.abelian).length
  return {
    lowGeV: segment.lowGeV > 0 ? segment.lowGeV : null,
    highGeV: Number.isFinite(segment.highGeV) ? segment.highGeV : null,
    active: segment.active,
    oneLoop: c.oneLoop.slice(0, diagonal).map(ratText),
    twoLoop: c.twoLoop.slice(0, diagonal).map((row) => row.slice(0, diagonal).map(ratText)),
    mixing: abelian >= 2 ? { generated: c.mixes, terms: mixingTerms(c, diagonal) } : null,
  }
}
