/**
 * LaTeX and building-block counts of heavy–light operators: (ψ†Γψ) with derivatives on the
 * legs they act on, a light Dirac pair in the usual bilinears (ē e, ē γ^0 e, ē γ^i e,
 * ē γ^iγ_5 e, …), scalars with their derivatives, colour indices when a content has several
 * colour tensors.
 */
import type { LightContent } from './lightContent'
import type { LightCombo, LightStructure } from './lightStructure'

const LABELS = 'ijklmnpqrs'
const COLOUR = 'abcdefgh'

/** ē (τ⊗Σ) ē-bilinears: e†(τ_a⊗σ_b)e = ē γ⁰(τ_a⊗σ_b) e as the usual Dirac matrices, with a sign. */
const DIRAC: Record<string, { tex: (i: string) => string; sign: number }> = {
  '0|0': { tex: () => '\\gamma^0', sign: 1 },
  '3|0': { tex: () => '', sign: 1 },
  '1|0': { tex: () => '\\gamma^0\\gamma_5', sign: 1 },
  '2|0': { tex: () => 'i\\gamma_5', sign: -1 },
  '1|1': { tex: (i) => `\\gamma^{${i}}`, sign: 1 },
  '0|1': { tex: (i) => `\\gamma^{${i}}\\gamma_5`, sign: 1 },
  '3|1': { tex: (i) => `\\Sigma^{${i}}`, sign: 1 },
  '2|1': { tex: (i) => `\\sigma^{0${i}}`, sign: -1 },
}

function labels(s: LightStructure): string[] {
  const out = new Array<string>(s.slots.length).fill('?')
  let next = 0
  if (s.eps) for (const x of s.eps) out[x] = LABELS[next++]!
  for (const [a, b] of s.pairs) {
    out[a] = LABELS[next]!
    out[b] = LABELS[next++]!
  }
  return out
}

function colourIndices(s: LightStructure, content: LightContent, nLegs: number): { up: string[]; eps: string } {
  const up = new Array<string>(nLegs).fill('')
  if (content.colours.length < 2) return { up, eps: '' }
  let next = 0
  let eps = ''
  for (const g of content.colours[s.colour]!.groups)
    for (const p of g.pairs) {
      const c = COLOUR[next++ % COLOUR.length]!
      const d = p.eps ? COLOUR[next++ % COLOUR.length]! : c
      up[p.a] += c
      up[p.b] += d
      if (p.eps) eps += `\\epsilon^{${c}${d}}`
    }
  return { up, eps }
}

/** LaTeX of one structure; the sign it carries from the Dirac table is returned separately. */
export function lightStructureLatex(s: LightStructure, content: LightContent, particle: string, names: string[]): { tex: string; sign: number } {
  const lab = labels(s)
  const nLegs = content.legs.length + 2
  const { up, eps } = colourIndices(s, content, nLegs)
  const ders = Array.from({ length: nLegs }, (_, leg) => {
    const sp = s.slots.map((x, i) => (x.kind === 'd' && x.leg === leg ? `D^{${lab[i]}}` : '')).join('')
    return `${s.time[leg] ? `D_t${s.time[leg]! > 1 ? `^{${s.time[leg]}}` : ''}` : ''}${sp}`
  })
  const col = (leg: number) => (up[leg] ? `_{${up[leg]}}` : '')
  const leg = (i: number, name: string, bar: boolean, kind: 'heavy' | 'dirac' | 'scalar') => {
    const core = kind === 'dirac' && bar ? `\\bar{${name}}` : name
    if (!ders[i]) return kind !== 'dirac' && bar ? `${core}^\\dagger${col(i)}` : `${core}${col(i)}`
    if (kind === 'dirac' && bar) return `\\overline{${ders[i]}${name}}${col(i)}`
    return bar ? `(${ders[i]}${name})^\\dagger${col(i)}` : `${ders[i]}${name}${col(i)}`
  }
  const hs = s.heavySpin ? ` \\sigma^{${lab[s.slots.findIndex((x) => x.kind === 'hs')]}}` : ''
  const parts = [`(${leg(0, particle, true, 'heavy')}${hs} ${leg(1, particle, false, 'heavy')})`]
  let sign = 1
  const bar = content.legs.findIndex((l) => l.field!.kind === 'dirac' && l.conj)
  const un = content.legs.findIndex((l) => l.field!.kind === 'dirac' && !l.conj)
  if (bar >= 0) {
    const d = DIRAC[`${s.tau}|${s.diracSpin ? 1 : 0}`]!
    sign = d.sign
    const m = d.tex(s.diracSpin ? lab[s.slots.findIndex((x) => x.kind === 'ds')]! : '')
    parts.push(`(${leg(bar + 2, names[bar]!, true, 'dirac')}${m ? ` ${m}` : ''} ${leg(un + 2, names[un]!, false, 'dirac')})`)
  }
  content.legs.forEach((l, j) => {
    if (l.field!.kind !== 'dirac') parts.push(leg(j + 2, names[j]!, l.conj, 'scalar'))
  })
  const e = s.eps ? `\\epsilon^{${s.eps.map((x) => lab[x]).join('')}}\\,` : ''
  return { tex: `${e}${eps}${parts.join(' ')}`, sign }
}

/** LaTeX of a Hermitian heavy–light operator over m^order ("+ h.c." for a non-self-conjugate content). */
export function lightComboLatex(c: LightCombo, imaginary: boolean, content: LightContent, particle: string, order: number): string {
  const names = content.legs.map((l) => l.field!.tex)
  const body = c
    .map((t, i) => {
      const { tex, sign } = lightStructureLatex(t.s, content, particle, names)
      const k = t.coef * sign
      const mag = Math.abs(k) === 1 ? '' : `${Math.abs(k)}\\,`
      return `${i === 0 ? (k < 0 ? '-' : '') : k < 0 ? ' - ' : ' + '}${mag}${tex}`
    })
    .join('')
  const hc = content.selfConjugate ? '' : ' + \\mathrm{h.c.}'
  const wrap = c.length > 1 || imaginary || hc
  return `${imaginary ? 'i' : ''}${wrap ? `\\left[${body}${hc}\\right]` : body}/m^{${order}}`
}

/** Building-block counts (heavy field, light fields, D, D_t, σ) of the first term. */
export function lightTerms(c: LightCombo, content: LightContent, particle: string): Array<Record<string, number>> {
  const s = c[0]!.s
  const out: Record<string, number> = { [particle]: 1, [`${particle}*`]: 1 }
  for (const l of content.legs) {
    const k = `${l.field!.name}${l.conj && l.field!.kind !== 'realScalar' ? '*' : ''}`
    out[k] = (out[k] ?? 0) + 1
  }
  const nD = s.slots.filter((x) => x.kind === 'd').length
  const nT = s.time.reduce((a, b) => a + b, 0)
  const nS = (s.heavySpin ? 1 : 0) + (s.diracSpin ? 1 : 0)
  if (nD) out.D = nD
  if (nT) out.D_t = nT
  if (nS) out.sigma = nS
  return [out]
}
