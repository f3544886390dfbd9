/**
 * Candidate operators of a given chiral order for the explicit basis, each C-even, P-even and
 * Hermitian (with its real coefficient understood):
 * - coset candidates: every monomial of the blocks u_μ, χ_±, f_±μν with ∇'s (one ε^{μνρσ} exactly
 *   when the intrinsic parity of the letters is odd), symmetrized as O + C(O), times i when that
 *   is anti-Hermitian (an odd number of χ_− and f_+ letters);
 * - contact candidates: monomials of the sources χ, χ†, F_L, F_R with D's (and det χ for N = 2,
 *   3), averaged over {1, C, P, CP} and made Hermitian.
 * (With `ibp`, only letter lists with one letter free of derivatives are enumerated: smaller, but it
 * loses the forms ⟨∇A ∇B⟩ of two letters; off by default. The tally against the Hilbert series
 * checks that the candidates span.)
 */
import { chargeConjugate, hermitianConjugate, LETTER_ORDER, type LetterKind, type Monomial, type Operator } from './monomial'
import { canonicalCode } from './canonical'
import { enumerateMonomials, type LetterSpec } from './enumerate'
import type { SourceSwitch } from '../blocks'

export interface Candidate {
  op: Operator
  /** Number of letters (the filtration degree). */
  letters: number
  /** Class of the Hilbert series ("{u,χ−,f−}^2 χ+"), or "contact". */
  classKey: string
  /** Intrinsic parity: 'odd' for the ε-terms. */
  parity: 'even' | 'odd'
  contact: boolean
  /** Sort key: simpler operators first. */
  score: number[]
  key: string
}

const COSET_KINDS: readonly LetterKind[] = ['u', 'chi+', 'chi-', 'f+', 'f-']
const NEEDS: Partial<Record<LetterKind, keyof SourceSwitch>> = { 'chi+': 'scalar', 'chi-': 'scalar', 'f+': 'vector', 'f-': 'vector', chi: 'scalar', chibar: 'scalar', FL: 'vector', FR: 'vector' }
const SYMBOL: Partial<Record<LetterKind, string>> = { u: 'u', 'chi-': 'χ−', 'f-': 'f−' }

function present(kinds: readonly LetterKind[], s: SourceSwitch): LetterKind[] {
  return kinds.filter((k) => NEEDS[k] === undefined || s[NEEDS[k]!])
}
const ODD: ReadonlySet<LetterKind> = new Set(['u', 'chi-', 'f-'])
const TRACELESS: ReadonlySet<LetterKind> = new Set(['u', 'f+', 'f-', 'FL', 'FR'])

/** Letter contents: counts per kind with lowest order ≤ order, and the leftover derivatives. */
function contents(kinds: readonly LetterKind[], order: number): { counts: number[]; derivs: number }[] {
  const out: { counts: number[]; derivs: number }[] = []
  const rec = (i: number, counts: number[], w: number) => {
    if (i === kinds.length) {
      if (counts.some((c) => c > 0)) out.push({ counts: counts.slice(), derivs: order - w })
      return
    }
    const o = LETTER_ORDER[kinds[i]!]
    for (let n = 0; w + n * o <= order; n++) {
      counts.push(n)
      rec(i + 1, counts, w + n * o)
      counts.pop()
    }
  }
  rec(0, [], 0)
  return out
}

/** Derivative distributions over the letters, identical letters taking non-increasing numbers. */
function distributions(kinds: readonly LetterKind[], counts: readonly number[], derivs: number, ibp: boolean): LetterSpec[][] {
  const groups = kinds.map((k, i) => ({ k, n: counts[i]! })).filter((g) => g.n > 0)
  const out: LetterSpec[][] = []
  const rec = (g: number, left: number, acc: LetterSpec[]) => {
    if (g === groups.length) {
      if (left !== 0) return
      if (ibp && derivs > 0 && !acc.some((s) => s.derivs === 0)) return
      out.push(acc.slice())
      return
    }
    const { k, n } = groups[g]!
    const parts = (m: number, slots: number, max: number): number[][] => {
      if (slots === 0) return m === 0 ? [[]] : []
      const r: number[][] = []
      for (let x = Math.min(m, max); x >= 0; x--) for (const rest of parts(m - x, slots - 1, x)) r.push([x, ...rest])
      return r
    }
    for (let used = 0; used <= left; used++) {
      for (const p of parts(used, n, used)) rec(g + 1, left - used, [...acc, ...p.map((d) => ({ kind: k, derivs: d }))])
    }
  }
  rec(0, derivs, [])
  return out
}

/** Class key as the count names it: the odd letters of the theory together, then χ+ and f+. */
function classKeyOf(specs: readonly LetterSpec[], kinds: readonly LetterKind[]): string {
  const odd = specs.filter((s) => ODD.has(s.kind)).length
  const power = (s: string, n: number) => (n === 1 ? s : `${s}^${n}`)
  const oddNames = kinds.filter((k) => ODD.has(k)).map((k) => SYMBOL[k]!)
  const parts: string[] = []
  if (odd > 0) parts.push(power(oddNames.length === 1 ? oddNames[0]! : `{${oddNames.join(',')}}`, odd))
  const cp = specs.filter((s) => s.kind === 'chi+').length
  const fp = specs.filter((s) => s.kind === 'f+').length
  if (cp) parts.push(power('χ+', cp))
  if (fp) parts.push(power('f+', fp))
  return parts.join(' ')
}

function scoreOf(m: Monomial): number[] {
  const letters = m.factors.flatMap((f) => f.letters)
  const maxD = Math.max(...letters.map((l) => l.d.length))
  return [m.factors.length, maxD, letters.filter((l) => l.d.length > 0).length]
}

/**
 * Coset candidates of one chiral order (sources: whether χ_± and f_± exist).
 * @example cosetCandidates(4, { scalar: false, vector: false }).length // 4 structures ⟨u…u⟩ of SU(N) at p⁴ (all C-even)
 */
export function cosetCandidates(order: number, sources: SourceSwitch, ibp = false): Candidate[] {
  const kinds = present(COSET_KINDS, sources)
  const out = new Map<string, Candidate>()
  for (const { counts, derivs } of contents(kinds, order)) {
    const oddCount = kinds.reduce((s, k, i) => s + (ODD.has(k) ? counts[i]! : 0), 0)
    for (const specs of distributions(kinds, counts, derivs, ibp)) {
      const eps = oddCount % 2 === 1 ? ('one' as const) : ('none' as const)
      for (const mono of enumerateMonomials(specs, { traceless: TRACELESS, eps })) {
        const [sign, image] = chargeConjugate(mono)
        const codes = [canonicalCode(mono), canonicalCode(image)].sort()
        const key = codes.join(' + ')
        if (out.has(key)) continue
        const oddH = specs.filter((s) => s.kind === 'chi-' || s.kind === 'f+').length % 2
        // when C(O) has the shape of O, O + C(O) is 2O or 0: decided numerically (selection.ts)
        const op: Operator = {
          iPower: oddH as 0 | 1,
          terms: [
            { coef: 1, mono },
            { coef: sign, mono: image },
          ],
        }
        out.set(key, { op, letters: specs.length, classKey: classKeyOf(specs, kinds), parity: oddCount % 2 ? 'odd' : 'even', contact: false, score: scoreOf(mono), key })
      }
    }
  }
  return [...out.values()]
}

const SOURCE_KINDS: readonly LetterKind[] = ['chi', 'chibar', 'FL', 'FR']
const P_KIND: Partial<Record<LetterKind, LetterKind>> = { chi: 'chibar', chibar: 'chi', FL: 'FR', FR: 'FL' }

/** P on a source monomial: χ ↔ χ†, F_L ↔ F_R, no reversal; −1 for ε. */
function parityImage(m: Monomial): [number, Monomial] {
  return [m.eps ? -1 : 1, { ...m, factors: m.factors.map((f) => ({ type: f.type, letters: f.letters.map((l) => ({ ...l, kind: P_KIND[l.kind] ?? l.kind })) })) }]
}

/**
 * Contact candidates (sources only) of one chiral order; N selects the determinant (2, 3) or none.
 * @example contactCandidates(4, 3, { scalar: true, vector: true }).map(c => c.classKey) // ['contact', 'contact']: ⟨χχ†⟩-type and ⟨F_L F_L + F_R F_R⟩-type
 */
export function contactCandidates(order: number, N: number | 'general', sources: SourceSwitch): Candidate[] {
  const out = new Map<string, Candidate>()
  const detSize = N === 2 || N === 3 ? N : undefined
  const kinds = present(SOURCE_KINDS, sources)
  if (kinds.length === 0) return []
  for (const { counts, derivs } of contents(kinds, order)) {
    for (const specs of distributions(kinds, counts, derivs, false)) {
      for (const mono of enumerateMonomials(specs, { traceless: TRACELESS, eps: 'any', detSize })) {
        for (const op of symmetrized(mono)) {
          const key = `${op.iPower}|${op.terms
            .map((t) => `${t.coef}${canonicalCode(t.mono)}`)
            .sort()
            .join(' + ')}`
          if (out.has(key)) continue
          out.set(key, { op, letters: specs.length, classKey: 'contact', parity: mono.eps ? 'odd' : 'even', contact: true, score: scoreOf(mono), key })
        }
      }
    }
  }
  return [...out.values()]
}

/**
 * O = Σ_{g ∈ {1, C, P, CP}} g(m); returns O + O† and i(O − O†) (the one that vanishes is dropped
 * later, numerically). Terms are merged only when identical as written.
 */
function symmetrized(m: Monomial): Operator[] {
  const images: [number, Monomial][] = [[1, m]]
  const [sc, c] = chargeConjugate(m)
  images.push([sc, c])
  for (const [s, x] of [
    [1, m],
    [sc, c],
  ] as [number, Monomial][]) {
    const [sp, p] = parityImage(x)
    images.push([s * sp, p])
  }
  const build = (h: number): { coef: number; mono: Monomial }[] => {
    const merged = new Map<string, { coef: number; mono: Monomial }>()
    for (const [s, x] of images) {
      const [sh, y] = hermitianConjugate(x)
      for (const [t, z] of [
        [s, x],
        [h * s * sh, y],
      ] as [number, Monomial][]) {
        const k = JSON.stringify(z)
        const prev = merged.get(k)
        if (prev) prev.coef += t
        else merged.set(k, { coef: t, mono: z })
      }
    }
    return [...merged.values()].filter((t) => t.coef !== 0)
  }
  const even = build(1)
  const odd = build(-1)
  return [...(even.length ? [{ iPower: 0 as const, terms: even }] : []), ...(odd.length ? [{ iPower: 1 as const, terms: odd }] : [])]
}
