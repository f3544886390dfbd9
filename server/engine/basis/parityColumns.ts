/**
 * P-eigen columns for a class mapped to itself by parity: every candidate (or Hermitian
 * combination) column c is replaced by c + P(c) and c − P(c), the same trick as the
 * Hermitian combinations (classBasis.ts). The span is unchanged, so the greedy choice
 * returns operators of definite parity; since P commutes with conjugation, a Hermitian
 * combination stays Hermitian. Image terms follow parity.ts (signed brackets).
 */
import type { PrimeField } from '../finite/primeField'
import { PrimeSet } from '../finite/primeSet'
import type { Column } from './classBasisTypes'
import { parityLorentz, paritySu } from './parity'
import { formatLorentz } from './inputSyntax'
import { combinationText } from './combinationText'

/**
 * Columns c ± P(c) (image terms appended after the terms of c) for Hermitian combinations
 * (text "((X) ± h.c.) ± P") and, in classes with at most one gauge contraction, for single
 * candidates (text in input syntax, "X ± Y" with Y the image monomial); other columns
 * (user-kept ones, candidates of classes with several gauge contractions) are left alone,
 * so every kept text stays input syntax or names "h.c.".
 * @example parityColumns([col ⟨12⟩⟨34⟩[12][34]], [1,0,3,2], true).length // 2
 * Method: projection onto the ±1 eigenspaces of the involution P (common practice).
 */
export function parityColumns(cols: Column[], pi: number[], oneGauge: boolean): Column[] {
  const primes = PrimeSet.working()
  // Share structure objects (the evaluation de-duplicates by identity, see pairRows).
  const shared = new Map<string, unknown>()
  const share = <T>(x: T): T => {
    const k = JSON.stringify(x)
    if (!shared.has(k)) shared.set(k, x)
    return shared.get(k) as T
  }
  for (const c of cols)
    for (const t of c.terms) {
      share(t.lorentz)
      share(t.gauge)
    }
  const images = new Map<object, { lorentz: Column['terms'][number]['lorentz']; sign: number }>()
  const gaugeImages = new Map<object, Column['terms'][number]['gauge']>()
  const image = (t: Column['terms'][number]): Column['terms'][number] => {
    if (!images.has(t.lorentz)) {
      const r = parityLorentz(t.lorentz, pi)
      images.set(t.lorentz, { lorentz: share(r.lorentz), sign: r.sign })
    }
    if (!gaugeImages.has(t.gauge)) gaugeImages.set(t.gauge, share(t.gauge.map((s) => paritySu(s, pi))))
    const { lorentz, sign } = images.get(t.lorentz)!
    return { lorentz, gauge: gaugeImages.get(t.gauge)!, coeff: sign === 1 ? t.coeff : primes.negated(t.coeff) }
  }
  return cols.flatMap((c) => {
    if (c.source === 'kept' || (c.source === 'candidate' && !(oneGauge && c.terms.length === 1))) return [c]
    const img = c.terms.map(image)
    return ([1, -1] as const).map((sg) => {
      const terms = [...c.terms, ...img.map((t) => (sg === 1 ? t : { ...t, coeff: primes.negated(t.coeff) }))]
      const text = c.source === 'hermitian' ? combinationText(c.text, 'P', sg) : explicitText(terms)
      return { ...c, text, paritySign: sg, parityEigen: sg, parityBase: c.text, terms }
    })
  })
}

/** "X + Y" / "X - Y" in input syntax for a candidate and its signed image (one gauge contraction). */
function explicitText(terms: Column['terms']): string {
  const [a, b] = terms as [Column['terms'][number], Column['terms'][number]]
  return `${formatLorentz(a.lorentz, null)} ${b.coeff[0] === 1 ? '+' : '-'} ${formatLorentz(b.lorentz, null)}`
}

/**
 * A chosen parity column whose partner vanishes is a multiple of a simpler operator:
 * c ± P(c) with c ∓ P(c) = 0 equals 2c (c has definite parity itself: keep c), and if
 * moreover both (O ∓ h.c.) ± P vanish, O itself is Hermitian: keep O.
 * Returns the column and the number of halvings of its values (0, 1 or 2).
 * @example reduceParityColumn(cols, j, zero) // { column: c itself, halvings: 1 } when c − P(c) = 0
 */
export function reduceParityColumn(columns: Column[], j: number, zero: boolean[]): { column: Column; halvings: number } {
  const c = columns[j]!
  const n = c.terms.length / 2
  const pZero = zero[c.paritySign === 1 ? j + 1 : j - 1] === true
  const hPartner = c.source === 'hermitian' ? j + (c.conjSign === 1 ? 2 : -2) : -1
  const hZero = hPartner >= 0 && zero[hPartner] === true
  if (pZero) {
    const base: Column = { ...c, terms: c.terms.slice(0, n), text: c.parityBase!, paritySign: undefined, selfParity: true }
    // Both Hermitian partners (O ∓ h.c.) ± P vanish: O ∓ h.c. = 0, so O itself is Hermitian.
    const hBoth = hZero && zero[hPartner + (c.paritySign === 1 ? 1 : -1)] === true
    if (c.source === 'hermitian' && hBoth) return { column: { ...base, terms: [c.terms[0]!], text: c.hermitianBase!, selfHermitian: true }, halvings: 2 }
    return { column: { ...base, selfHermitian: c.source === 'hermitian' ? false : undefined }, halvings: 1 }
  }
  // Only hZero (O ∓ h.c.) ± P = 0: the column is 2(O ± P(O)), kept whole so that its text
  // still names "h.c." (texts without it must be input syntax).
  return { column: { ...c, selfHermitian: c.source === 'hermitian' ? false : undefined }, halvings: 0 }
}

/**
 * Scale kept rows by 1/2^halvings per kept column.
 * @example scaleRows(new PrimeField(7), [[2, 4]], [1, 0]) // [[1, 4]]
 */
export function scaleRows(F: PrimeField, rows: number[][], halvings: number[]): number[][] {
  const f = halvings.map((h) => F.inv(2 ** h))
  return rows.map((row) => row.map((v, i) => (halvings[i] ? F.mul(v, f[i]!) : v)))
}
