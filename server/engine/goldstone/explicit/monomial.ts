/**
 * Operators of a chiral Lagrangian written with the usual building blocks: products of flavor
 * traces ⟨…⟩ of letters ∇_{a}∇_{b}…X, X one of u_μ, χ_±, f_±μν (blocks of the coset), or of the
 * sources χ, χ†, F_Lμν, F_Rμν with their covariant derivatives D_μ (contact terms), and, for
 * N = 2, 3, the mixed determinant det(X_1, …, X_N) = (1/N!) ε^{i…} ε_{j…} Π (X_k)_{i_k j_k}
 * of N source letters (det χ). Lorentz labels are small integers, each used twice (η^{μν}
 * contraction) or once together with the single ε^{μνρσ} of an odd-intrinsic-parity term.
 */
import { EngineInputError } from '../../errors'

export type LetterKind = 'u' | 'chi+' | 'chi-' | 'f+' | 'f-' | 'chi' | 'chibar' | 'FL' | 'FR'

export interface Letter {
  kind: LetterKind
  /** Derivative labels, outermost first: ∇_{d0} ∇_{d1} … X. */
  d: number[]
  /** The block's own labels: one for u, two for f and F, none for scalars. */
  idx: number[]
}

export interface Factor {
  type: 'trace' | 'det'
  letters: Letter[]
}

export interface Monomial {
  factors: Factor[]
  eps?: [number, number, number, number]
}

/** Σ coef·monomial, times i^iPower (i makes a C-even combination Hermitian where needed). */
export interface Operator {
  iPower: 0 | 1
  terms: { coef: number; mono: Monomial }[]
}

export const OWN_SLOTS: Record<LetterKind, number> = { u: 1, 'chi+': 0, 'chi-': 0, 'f+': 2, 'f-': 2, chi: 0, chibar: 0, FL: 2, FR: 2 }

/** Chiral order of a letter without its derivatives. */
export const LETTER_ORDER: Record<LetterKind, number> = { u: 1, 'chi+': 2, 'chi-': 2, 'f+': 2, 'f-': 2, chi: 2, chibar: 2, FL: 2, FR: 2 }

/** Source letters (contact terms) and the groups their flavor indices belong to: [left, right]. */
export const SOURCE_SIDES: Partial<Record<LetterKind, ['L' | 'R', 'L' | 'R']>> = {
  chi: ['R', 'L'],
  chibar: ['L', 'R'],
  FL: ['L', 'L'],
  FR: ['R', 'R'],
}

/** Sign under C (which also reverses products) and under Hermitian conjugation. */
const C_SIGN: Record<LetterKind, number> = { u: 1, 'chi+': 1, 'chi-': 1, 'f+': -1, 'f-': 1, chi: 1, chibar: 1, FL: -1, FR: -1 }
const H_SIGN: Record<LetterKind, number> = { u: 1, 'chi+': 1, 'chi-': -1, 'f+': 1, 'f-': 1, chi: 1, chibar: 1, FL: 1, FR: 1 }
/** C maps a source letter to another kind (χ → χ^T keeps the kind; F_L → −F_R^T). */
const C_KIND: Partial<Record<LetterKind, LetterKind>> = { FL: 'FR', FR: 'FL' }
/** Hermitian conjugation maps χ ↔ χ†. */
const H_KIND: Partial<Record<LetterKind, LetterKind>> = { chi: 'chibar', chibar: 'chi' }

export function letterOrder(l: Letter): number {
  return LETTER_ORDER[l.kind] + l.d.length
}

export function monomialOrder(m: Monomial): number {
  return m.factors.reduce((s, f) => s + f.letters.reduce((t, l) => t + letterOrder(l), 0), 0)
}

export function letterCount(m: Monomial): number {
  return m.factors.reduce((s, f) => s + f.letters.length, 0)
}

/**
 * The image under a reversing conjugation (C or h.c.): every trace reversed, each letter
 * mapped and signed. Returns [sign, monomial].
 */
function reversedImage(m: Monomial, sign: Record<LetterKind, number>, kinds: Partial<Record<LetterKind, LetterKind>>): [number, Monomial] {
  let s = 1
  const factors = m.factors.map((f) => ({
    type: f.type,
    letters: (f.type === 'trace' ? [...f.letters].reverse() : f.letters).map((l) => {
      s *= sign[l.kind]
      return { ...l, kind: kinds[l.kind] ?? l.kind }
    }),
  }))
  return [s, { factors, ...(m.eps ? { eps: m.eps } : {}) }]
}

/** C(m) = sign · monomial. */
export function chargeConjugate(m: Monomial): [number, Monomial] {
  return reversedImage(m, C_SIGN, C_KIND)
}

/** m† = sign · monomial (complex coefficients conjugated separately). */
export function hermitianConjugate(m: Monomial): [number, Monomial] {
  return reversedImage(m, H_SIGN, H_KIND)
}

/** Check that every label is used exactly twice (ε counting once). */
export function checkLabels(m: Monomial): void {
  const count = new Map<number, number>()
  const bump = (x: number) => count.set(x, (count.get(x) ?? 0) + 1)
  for (const f of m.factors)
    for (const l of f.letters) {
      l.d.forEach(bump)
      l.idx.forEach(bump)
    }
  m.eps?.forEach(bump)
  for (const [label, c] of count) {
    if (c !== 2) throw new EngineInputError('checkLabels', `Lorentz index ${label} appears ${c} times; every index must be contracted once`)
  }
}

const GREEK = ['μ', 'ν', 'ρ', 'σ', 'α', 'β', 'γ', 'δ', 'κ', 'λ', 'τ', 'ω']
const TEX_GREEK = ['\\mu', '\\nu', '\\rho', '\\sigma', '\\alpha', '\\beta', '\\gamma', '\\delta', '\\kappa', '\\lambda', '\\tau', '\\omega']

const TEXT_KIND: Record<LetterKind, string> = { u: 'u', 'chi+': 'χ+', 'chi-': 'χ−', 'f+': 'f+', 'f-': 'f−', chi: 'χ', chibar: 'χ†', FL: 'F_L', FR: 'F_R' }
const TEX_KIND: Record<LetterKind, string> = { u: 'u', 'chi+': '\\chi_+', 'chi-': '\\chi_-', 'f+': 'f_+', 'f-': 'f_-', chi: '\\chi', chibar: '\\chi^\\dagger', FL: 'F_L', FR: 'F_R' }

/** Label names in order of first appearance. */
function labelNames(m: Monomial, names: string[]): Map<number, string> {
  const out = new Map<number, string>()
  const see = (x: number) => {
    if (!out.has(x)) out.set(x, names[out.size % names.length]!)
  }
  for (const f of m.factors)
    for (const l of f.letters) {
      l.d.forEach(see)
      l.idx.forEach(see)
    }
  m.eps?.forEach(see)
  return out
}

function isSource(l: Letter): boolean {
  return SOURCE_SIDES[l.kind] !== undefined
}

/** Plain text, e.g. "⟨∇_μ u_ν ∇^μ u^ν⟩⟨χ+⟩" (a label's second appearance is raised). */
export function monomialText(m: Monomial): string {
  const names = labelNames(m, GREEK)
  const seen = new Set<number>()
  const name = (x: number) => {
    const up = seen.has(x)
    seen.add(x)
    return { n: names.get(x)!, up }
  }
  const eps = m.eps ? `ε^{${m.eps.map((x) => name(x).n).join('')}} ` : ''
  const letter = (l: Letter) => {
    const d = l.d
      .map((x) => {
        const { n, up } = name(x)
        return `${isSource(l) ? 'D' : '∇'}${up ? '^' : '_'}${n} `
      })
      .join('')
    const idx = l.idx.map((x) => name(x))
    const sub = idx.length === 0 ? '' : `${idx[0]!.up ? '^' : '_'}${idx.map((i) => i.n).join('')}`
    return `${d}${TEXT_KIND[l.kind]}${sub}`
  }
  const body = m.factors.map((f) => (f.type === 'trace' ? `⟨${f.letters.map(letter).join(' ')}⟩` : `det(${f.letters.map(letter).join(', ')})`)).join('')
  return `${eps}${body}`
}

/** LaTeX with the same conventions. */
export function monomialLatex(m: Monomial): string {
  const names = labelNames(m, TEX_GREEK)
  const seen = new Set<number>()
  const name = (x: number) => {
    const up = seen.has(x)
    seen.add(x)
    return { n: names.get(x)!, up }
  }
  const eps = m.eps ? `\\varepsilon^{${m.eps.map((x) => name(x).n).join('')}}` : ''
  const letter = (l: Letter) => {
    const d = l.d
      .map((x) => {
        const { n, up } = name(x)
        return `${isSource(l) ? 'D' : '\\nabla'}${up ? '^' : '_'}{${n}}`
      })
      .join('')
    const idx = l.idx.map((x) => name(x))
    const kind = TEX_KIND[l.kind]
    if (idx.length === 0) return `${d}${kind}`
    const sub = `{${idx.map((i) => i.n).join('')}}`
    const script = idx[0]!.up ? `^${sub}` : `_${sub}`
    return `${d}${kind.includes('_') || kind.includes('^') ? `{${kind}}` : kind}${script}`
  }
  const body = m.factors.map((f) => (f.type === 'trace' ? `\\langle ${f.letters.map(letter).join(' ')} \\rangle` : `\\det(${f.letters.map(letter).join(', ')})`)).join('')
  return `${eps}${body}`
}

function coefText(c: number, first: boolean): string {
  const sign = c < 0 ? '−' : first ? '' : '+'
  const a = Math.abs(c)
  return `${first ? sign : ` ${sign} `}${a === 1 ? '' : `${a} `}`
}

/** Text of an operator, e.g. "i(⟨f+_μν u^μ u^ν⟩)" or "⟨χ+ χ+⟩ + ⟨χ− χ−⟩". */
export function operatorText(op: Operator, latex = false): string {
  const body = op.terms.map((t, i) => `${coefText(t.coef, i === 0)}${latex ? monomialLatex(t.mono) : monomialText(t.mono)}`).join('')
  if (op.iPower === 0) return body
  return op.terms.length === 1 && op.terms[0]!.coef === 1 ? `i${body}` : `i(${body})`
}
