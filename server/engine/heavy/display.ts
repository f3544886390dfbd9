/**
 * Display of heavy-frame operators in physical notation (σ, D, D_t, E, B; coupling g absorbed)
 * and their building-block counts for the counting rules.
 * Dictionary from the real algebra: ℰ = igE, ℬ = −igB, s = iσ; a combination that is
 * anti-Hermitian in the real algebra is multiplied by i to give a Hermitian operator.
 */
import type { Combo, Structure } from './structure'

const LABELS = 'ijklmnpqr'

/** LaTeX of one structure with indices named i, j, k, … */
export function structureLatex(s: Structure): string {
  const n = (s.spin ? 1 : 0) + s.letters.filter((l) => l !== 'T').length
  const label = new Array<string>(n).fill('?')
  let next = 0
  if (s.eps) for (const slot of s.eps) label[slot] = LABELS[next++]!
  for (const [a, b] of s.pairs) { label[a] = LABELS[next]!; label[b] = LABELS[next++]! }
  const parts: string[] = []
  if (s.eps) parts.push(`\\epsilon^{${s.eps.map((x) => label[x]).join('')}}`)
  let slot = 0
  if (s.spin) parts.push(`\\sigma^{${label[slot++]}}`)
  const letters: string[] = []
  for (const l of s.letters) {
    if (l === 'T') letters.push('D_t')
    else letters.push(`${l}^{${label[slot++]}}`)
  }
  if (s.traced) parts.push(`\\mathrm{tr}\\left(${letters.join(' ')}\\right)`)
  else parts.push(...letters)
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
  const nE = s.letters.filter((l) => l === 'E').length
  const nB = s.letters.filter((l) => l === 'B').length
  return (((nE - nB + (s.spin ? 1 : 0)) % 4) + 4) % 4
}

/**
 * LaTeX of a Hermitian operator ψ† (…) ψ from a combination of uniform letter content.
 * `antiHermitian` marks a combination that is anti-Hermitian in the real algebra.
 * @example comboLatex([{coef:1,s:kinetic}], false, 'psi') // "\psi^\dagger D^{i} D^{i} \psi"
 */
export function comboLatex(c: Combo, antiHermitian: boolean, field: string): string {
  if (c.length === 0) return '0'
  const g = c.reduce((acc, t) => gcd(acc, t.coef), 0)
  const e = (physicalPhase(c[0]!.s) + (antiHermitian ? 1 : 0)) % 4
  const lead = Math.sign(c[0]!.coef)
  const sign = (e === 2 || e === 3 ? -1 : 1) * lead
  const body = c
    .map((t, i) => {
      const k = (t.coef * lead) / g
      const mag = Math.abs(k) === 1 ? '' : `${Math.abs(k)}\\,`
      const op = i === 0 ? (k < 0 ? '-' : '') : k < 0 ? ' - ' : ' + '
      return `${op}${mag}${structureLatex(t.s)}`
    })
    .join('')
  const pre = `${sign < 0 ? '-' : ''}${e % 2 === 1 ? 'i' : ''}`
  const f = field === 'psi' ? '\\psi' : field === 'chi' ? '\\chi' : field
  const wrap = c.length > 1 || pre.endsWith('i')
  return `${f}^\\dagger\\, ${pre}${wrap ? `\\left(${body}\\right)` : body}\\, ${f}`
}

/** Building-block counts of a structure for a heavy field named `field`. */
export function structureBlocks(s: Structure, field: string): Record<string, number> {
  const b: Record<string, number> = { [field]: 1, [`${field}*`]: 1 }
  const bump = (k: string): void => { b[k] = (b[k] ?? 0) + 1 }
  for (const l of s.letters) bump(l === 'T' ? 'D_t' : l)
  if (s.spin) bump('sigma')
  return b
}
