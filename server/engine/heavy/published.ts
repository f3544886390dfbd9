/**
 * The published operators of one order as set-aside cards: printed in the theory's own field
 * name, checked against the enumerated space, each with its exact rewrite onto the enumerated
 * basis as displayed (signs, i and numerical factors included).
 */
import type { CancelFlag } from '../finite'
import type { Rational } from '../exact/rational'
import { toString as ratString, isZero } from '../exact/rational'
import { CONVENTIONAL_OPERATORS, printedLatex, printedPerReal, type ConventionalOperator } from './conventional'
import { phasedMul, phasedReal, realPerDisplayed } from './display'
import type { HeavyOperator } from './heavyOperator'
import { orderSpace } from './orderSpace'
import { QuotientSpace } from './quotient'
import { expandCombo } from './structure'
import { structureBlocks } from './display'

export interface ConventionalCheck {
  /** The published operators span the enumerated space (they may be more than its dimension). */
  spans: boolean
  /** They are also independent (exactly a basis). */
  independent: boolean
  rank: number
  dimension: number
  /** Each published operator's real-algebra combination on the basis combinations. */
  rewrites: Array<{ id: string; coefficients: Rational[] }>
  /** For each enumerated basis operator, the published operators it involves. */
  inverse: Array<{ basis: string; conventional: string[] }>
}

/** Published operators of one order, with the rank check against the enumerated space. */
export function verifyConventional(order: number, signal?: CancelFlag, list: readonly ConventionalOperator[] = CONVENTIONAL_OPERATORS, colorN = 1): ConventionalCheck {
  const os = orderSpace(order, true, signal, colorN)
  const conv = list.filter((c) => c.order === order)
  const els = conv.map((c) => expandCombo(c.combo))
  const convSpace = new QuotientSpace(els, os.space.relations, { signal, colorN })
  const rank = convSpace.dimension
  const rewrites = conv.map((c, i) => ({ id: c.id, coefficients: os.space.rewrite(els[i]!) }))
  const spans = rank === os.space.dimension
  const independent = spans && rank === conv.length
  const inverse = independent
    ? os.space.basis.map((b, i) => {
        const co = convSpace.rewrite(os.candidates[b]!.element)
        return { basis: `m${order}.${i + 1}`, conventional: conv.filter((_, j) => co[convSpace.basis.indexOf(j)]!.num !== 0n).map((c) => c.id) }
      })
    : []
  return { spans, independent, rank, dimension: os.space.dimension, rewrites, inverse }
}

function termsOf(c: ConventionalOperator, field: string): Array<Record<string, number>> {
  const seen = new Map<string, Record<string, number>>()
  for (const t of c.combo) {
    const b = structureBlocks(t.s, field)
    seen.set(JSON.stringify(Object.entries(b).sort()), b)
  }
  return [...seen.values()]
}

/**
 * The printed operator (sign, i and numerical factor as printed, without c and 1/m^n) as an
 * exact combination of the basis operators as displayed.
 * @example kinetic D²/2m → [{ id: 'm1.1', coefficient: '1/2' }] when m1.1 prints as ψ†D^iD^iψ
 */
export function printedRewrite(c: ConventionalOperator, coefficients: readonly Rational[], basis: readonly HeavyOperator[]): Array<{ id: string; coefficient: string }> {
  const f = printedPerReal(c)
  return basis.flatMap((b, i) => {
    const r = coefficients[i]!
    if (isZero(r)) return []
    const value = phasedReal(phasedMul(phasedMul(f, { r, k: 0 }), realPerDisplayed(b.combo!, !!b.antiHermitian)))
    return [{ id: b.id, coefficient: ratString(value) }]
  })
}

/** Attach the gauge-field EOM note to basis operators that involve a published operator carrying one. */
function annotateGaugeEom(basis: HeavyOperator[], inverse: ConventionalCheck['inverse'], list: readonly ConventionalOperator[]): void {
  for (const op of basis) {
    const inv = inverse.find((x) => x.basis === op.id)
    const noted = list.filter((c) => c.gaugeEomNote && inv?.conventional.includes(c.id))
    if (noted.length > 0) op.gaugeEomNote = `involves ${noted.map((c) => c.id).join(', ')}: ${noted.map((c) => c.gaugeEomNote).join('; ')}`
  }
}

/**
 * The published cards of one order and whether they span the enumerated basis (null when the
 * literature has no list for this case). Annotates the basis with gauge-EOM notes.
 */
export function publishedOperators(
  order: number,
  field: string,
  basis: HeavyOperator[],
  list: readonly ConventionalOperator[],
  colorN: number,
  signal?: CancelFlag,
): { cards: HeavyOperator[]; spans: boolean | null; redundant: number } {
  const data = list.filter((c) => c.order === order)
  if (data.length === 0) return { cards: [], spans: null, redundant: 0 }
  const check = verifyConventional(order, signal, list, colorN)
  annotateGaugeEom(basis, check.inverse, list)
  const cards = data.map((c, i): HeavyOperator => ({
    id: c.id,
    order,
    sector: 'bilinear',
    latex: printedLatex(c.latex, field),
    terms: termsOf(c, field),
    combo: c.combo,
    coefficient: c.coefficient,
    relations: c.relations,
    gaugeEomNote: c.gaugeEomNote,
    source: c.source,
    rewrite: printedRewrite(c, check.rewrites[i]!.coefficients, basis),
  }))
  return { cards, spans: check.spans, redundant: data.length - check.rank }
}
