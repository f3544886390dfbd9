/**
 * Display of heavy-frame operators in physical notation (σ, D, D_t, E, B; coupling g absorbed)
 * and their building-block counts for the counting rules.
 * Dictionary from the real algebra: ℰ = igE, ℬ = −igB, s = iσ; a combination that is
 * anti-Hermitian in the real algebra is multiplied by i to give a Hermitian operator.
 */
import { factorOf, fieldKind, type Combo, type Structure } from './structure'
import { EngineConsistencyError } from '../errors'
import { isZero, mul, neg, rat, toString, type Rational } from '../exact/rational'
import { fieldTex } from './fieldTex'

const LABELS = 'ijklmnpqr'

/** LaTeX of one structure with indices named i, j, k, …; `names` label each gauge factor's E and B. */
export function structureLatex(s: Structure, names?: readonly string[]): string {
  const n = (s.spin ? 1 : 0) + s.letters.filter((l) => l !== 'T').length
  const label = new Array<string>(n).fill('?')
  let next = 0
  if (s.eps) for (const slot of s.eps) label[slot] = LABELS[next++]!
  for (const [a, b] of s.pairs) {
    label[a] = LABELS[next]!
    label[b] = LABELS[next++]!
  }
  const parts: string[] = []
  if (s.eps) parts.push(`\\epsilon^{${s.eps.map((x) => label[x]).join('')}}`)
  let slot = 0
  if (s.spin) parts.push(`\\sigma^{${label[slot++]}}`)
  const letters: string[] = []
  for (const l of s.letters) {
    const kind = fieldKind(l)
    if (l === 'T') letters.push('D_t')
    else if (kind && names) letters.push(`${kind}_{\\mathrm{${names[factorOf(l)]}}}^{${label[slot++]}}`)
    else letters.push(`${kind ?? l}^{${label[slot++]}}`)
  }
  if (s.trace) {
    const [a, b] = s.trace
    parts.push(...letters.slice(0, a), `\\mathrm{tr}\\left(${letters.slice(a, b).join(' ')}\\right)`, ...letters.slice(b))
  } else parts.push(...letters)
  return parts.join(' ')
}

function gcd(a: number, b: number): number {
  let x = Math.abs(a)
  let y = Math.abs(b)
  while (y) [x, y] = [y, x % y]
  return x
}

/** Power of i relating a real-algebra structure to its physical letters. */
export function physicalPhase(s: Structure): number {
  const nE = s.letters.filter((l) => fieldKind(l) === 'E').length
  const nB = s.letters.filter((l) => fieldKind(l) === 'B').length
  return (((nE - nB + (s.spin ? 1 : 0)) % 4) + 4) % 4
}

/** A number r·i^k (k = 0..3): the phase bookkeeping between the real algebra and printed forms. */
export interface Phased {
  r: Rational
  k: number
}

/** Product of phased numbers. */
export function phasedMul(a: Phased, b: Phased): Phased {
  const k = (a.k + b.k) % 4
  return { r: mul(a.r, b.r), k }
}

/** The real number a phased number stands for; throws when it is imaginary (a phase bug). */
export function phasedReal(a: Phased): Rational {
  if (isZero(a.r) || a.k % 2 === 0) return a.k === 2 ? neg(a.r) : a.r
  throw new EngineConsistencyError('phasedReal', `expected a real factor, got an imaginary one (${toString(a.r)}·i)`)
}

interface Display {
  sign: number
  imaginary: boolean
  g: number
  lead: number
}

function displayOf(c: Combo, antiHermitian: boolean): Display {
  const g = c.reduce((acc, t) => gcd(acc, t.coef), 0)
  const e = (physicalPhase(c[0]!.s) + (antiHermitian ? 1 : 0)) % 4
  const lead = Math.sign(c[0]!.coef)
  return { sign: (e === 2 || e === 3 ? -1 : 1) * lead, imaginary: e % 2 === 1, g, lead }
}

/**
 * The factor f with (real-algebra combination) = f · (operator as comboLatex prints it),
 * couplings absorbed: the printed body is the combination divided by gcd·lead and by
 * i^physicalPhase, times the printed sign and i.
 * @example realPerDisplayed(combo([[1, 'D_i D_i']]), false) // { r: 1, k: 0 }
 */
export function realPerDisplayed(c: Combo, antiHermitian: boolean): Phased {
  const d = displayOf(c, antiHermitian)
  // real = i^pp · g · lead · body and displayed = sign · i^imag · body
  const k = (((physicalPhase(c[0]!.s) - (d.imaginary ? 1 : 0)) % 4) + 4) % 4
  return { r: rat(d.g * d.lead * d.sign), k }
}

/**
 * LaTeX of a Hermitian operator ψ† (…) ψ from a combination of uniform letter content.
 * `antiHermitian` marks a combination that is anti-Hermitian in the real algebra.
 * @example comboLatex([{coef:1,s:kinetic}], false, 'psi') // "\psi^\dagger D^{i} D^{i} \psi"
 */
export function comboLatex(c: Combo, antiHermitian: boolean, field: string, names?: readonly string[]): string {
  if (c.length === 0) return '0'
  const d = displayOf(c, antiHermitian)
  const body = c
    .map((t, i) => {
      const k = (t.coef * d.lead) / d.g
      const mag = Math.abs(k) === 1 ? '' : `${Math.abs(k)}\\,`
      const op = i === 0 ? (k < 0 ? '-' : '') : k < 0 ? ' - ' : ' + '
      return `${op}${mag}${structureLatex(t.s, names)}`
    })
    .join('')
  const pre = `${d.sign < 0 ? '-' : ''}${d.imaginary ? 'i' : ''}`
  const f = fieldTex(field)
  const wrap = c.length > 1 || pre.endsWith('i')
  return `${f}^\\dagger\\, ${pre}${wrap ? `\\left(${body}\\right)` : body}\\, ${f}`
}

/** Building-block counts of a structure for a heavy field named `field`. */
export function structureBlocks(s: Structure, field: string): Record<string, number> {
  const b: Record<string, number> = { [field]: 1, [`${field}*`]: 1 }
  const bump = (k: string): void => {
    b[k] = (b[k] ?? 0) + 1
  }
  for (const l of s.letters) bump(l === 'T' ? 'D_t' : (fieldKind(l) ?? l))
  if (s.spin) bump('sigma')
  return b
}
