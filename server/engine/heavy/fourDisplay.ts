/**
 * Display of four-fermion operators: LaTeX in the fields' own names (∂ written as the
 * covariant D, which it is at the contact vertex) and building-block counts.
 */
import type { FourCombo, FourStructure } from './fourStructure'

const LABELS = 'ijklmnpq'

function fieldTex(name: string): string {
  return name === 'psi' ? '\\psi' : name === 'chi' ? '\\chi' : name
}

/** LaTeX of one structure: (f† Γ₁ g)(h† Γ₂ k) with derivatives on the fields they act on. */
export function fourStructureLatex(s: FourStructure, particle: string, anti: string): string {
  const label = new Array<string>(s.slots.length).fill('?')
  let next = 0
  if (s.eps) for (const slot of s.eps) label[slot] = LABELS[next++]!
  for (const [a, b] of s.pairs) {
    label[a] = LABELS[next]!
    label[b] = LABELS[next++]!
  }
  const p = fieldTex(particle)
  const a = fieldTex(anti)
  const names = [`${p}^\\dagger`, p, `${a}^\\dagger`, a]
  const ders = [0, 1, 2, 3].map((leg) => s.slots.map((x, i) => (x.kind === 'd' && x.leg === leg ? `D^{${label[i]}}` : '')).join(''))
  const leg = (l: number): string => {
    if (!ders[l]) return names[l]!
    return l % 2 === 0 ? `(${ders[l]}${names[l + 1]})^\\dagger` : `${ders[l]}${names[l]}`
  }
  const sig = (k: 's1' | 's2'): string => {
    const i = s.slots.findIndex((x) => x.kind === k)
    return i < 0 ? '' : `\\sigma^{${label[i]}}`
  }
  const t = s.colour === 'octet' ? 'T^A' : ''
  const [x, y] = s.ordering === 'direct' ? [1, 3] : [3, 1]
  const eps = s.eps ? `\\epsilon^{${s.eps.map((e) => label[e]).join('')}}\\,` : ''
  const b1 = [leg(0), sig('s1'), t, leg(x)].filter(Boolean).join(' ')
  const b2 = [leg(2), sig('s2'), t, leg(y)].filter(Boolean).join(' ')
  return `${eps}(${b1})(${b2})`
}

/**
 * LaTeX of a Hermitian four-fermion operator over m^order; `antiHermitian` adds the factor i.
 * @example fourComboLatex(fourCombo([[1, 'ex']]), false, 2, 'psi', 'chi') // "(\psi^\dagger \chi)(\chi^\dagger \psi)/m^{2}"
 */
export function fourComboLatex(c: FourCombo, antiHermitian: boolean, order: number, particle: string, anti: string): string {
  const body = c
    .map((t, i) => {
      const mag = Math.abs(t.coef) === 1 ? '' : `${Math.abs(t.coef)}\\,`
      const op = i === 0 ? (t.coef < 0 ? '-' : '') : t.coef < 0 ? ' - ' : ' + '
      return `${op}${mag}${fourStructureLatex(t.s, particle, anti)}`
    })
    .join('')
  const wrap = c.length > 1 || antiHermitian
  return `${antiHermitian ? 'i' : ''}${wrap ? `\\left[${body}\\right]` : body}/m^{${order}}`
}

/** Building-block counts (ψ, ψ†, χ, χ†, D, σ) of the first term, for the counting rules. */
export function fourTerms(c: FourCombo, particle: string, anti: string): Array<Record<string, number>> {
  const s = c[0]!.s
  const out: Record<string, number> = { [particle]: 1, [`${particle}*`]: 1, [anti]: 1, [`${anti}*`]: 1 }
  const nD = s.slots.filter((x) => x.kind === 'd').length
  const nS = s.slots.length - nD
  if (nD) out.D = nD
  if (nS) out.sigma = nS
  return [out]
}
