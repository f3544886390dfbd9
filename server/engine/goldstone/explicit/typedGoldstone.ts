/**
 * Typed rewrites in the Goldstone frame: the fingerprints of operators a user writes (or of the
 * board's kept operators, by their texts) at the same configurations as a stored basis of one
 * chiral order, so that the board can write a typed operator exactly in terms of what the group
 * keeps. The configurations depend only on (order, N, sources) (goldstoneBasis.ts, selectOrder),
 * and separate any kept set of the order, not only the run's own choice: they make the leading
 * values of the order's whole span injective, and exact values are block-triangular in the
 * number of letters (selection.ts).
 */
import { EngineInputError } from '../../errors'
import type { Fingerprint } from '../../board/fingerprints'
import type { SourceSwitch } from '../blocks'
import { exactFingerprints, selectOrder } from './goldstoneBasis'
import { monomialOrder, type Operator } from './monomial'
import { parseGoldstoneOperator } from './parseGoldstone'

export interface GoldstoneTypedInput {
  N: number | 'general'
  sources: SourceSwitch
  /** The chiral order of the board's class ("p^4" → 4). */
  order: number
  /** The N the stored basis was evaluated at (its classes' evaluatedAtN). */
  evaluatedAtN: number
  signal?: { aborted: boolean }
}

/** Highest order a typed rewrite reaches: recomputing the p⁶ configurations takes minutes for N = 3. */
export const MAX_TYPED_ORDER = 4

/** The operators of texts, each checked to be of the class's chiral order. */
function parsedAt(texts: readonly string[], order: number): Operator[] {
  return texts.map((text) => {
    const op = parseGoldstoneOperator(text)
    const wrong = op.terms.map((t) => monomialOrder(t.mono)).find((k) => k !== order)
    if (wrong !== undefined)
      throw new EngineInputError('goldstoneTypedFingerprints', `"${text}" has a term of chiral order p^${wrong}, but this class is p^${order}; a derivative and u count p¹, χ± and f± count p²`)
    return op
  })
}

/**
 * Fingerprints of the texts at the stored configurations of the order (both primes), in order.
 * @example goldstoneTypedFingerprints({ N: 3, sources: { scalar: true, vector: true }, order: 4, evaluatedAtN: 3 }, ['⟨u_μ u^μ⟩⟨u_ν u^ν⟩']).length // 1
 * Method: each term is evaluated on the classical solution at the configurations (exactValue.ts) and the terms summed
 * mod p, so a sum whose terms hold different numbers of letters is valued exactly too.
 */
export function goldstoneTypedFingerprints(o: GoldstoneTypedInput, texts: readonly string[]): Fingerprint[] {
  if (o.order > MAX_TYPED_ORDER) {
    throw new EngineInputError(
      'goldstoneTypedFingerprints',
      `typed operators are rewritten up to p^${MAX_TYPED_ORDER} in the Goldstone frame; for p^${o.order}, the set-aside operators carry their rewrites`,
    )
  }
  const ops = parsedAt(texts, o.order)
  const sel = selectOrder(o.order, o.evaluatedAtN, { N: o.N, sources: o.sources, maxOrder: o.order, signal: o.signal }, () => {})
  const pieces = ops.flatMap((op, i) => op.terms.map((t) => ({ i, op: { iPower: op.iPower, terms: [t] } as Operator })))
  const prints = exactFingerprints(
    pieces.map((p) => p.op),
    sel.fields,
    sel.configs,
    sel.patterns,
    o.evaluatedAtN,
    o.order,
    o.signal,
    () => {},
    pieces,
  )
  return ops.map((_, i) => {
    const mine = pieces.filter((p) => p.i === i).map((p) => prints.get(p)!)
    return {
      primes: sel.fields.map((F) => F.p),
      values: sel.fields.map((F, fi) => mine[0]!.values[fi]!.map((_, k) => mine.reduce((s, fp) => F.add(s, fp.values[fi]![k]!), 0))),
    }
  })
}
