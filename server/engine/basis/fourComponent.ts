/**
 * Four-component (Dirac-bilinear) LaTeX of a bracket monomial, where its fermion legs pair
 * into bilinears:
 *   S  ⟨ab⟩ or [ab] between two fermions            → (Ψ̄_a Ψ_b)
 *   V  ⟨a x⟩[b x], x a scalar with one derivative    → (Ψ̄_a γ^μ Ψ_b)(D_μ x)
 *   VV ⟨a c⟩[b d] between two opposite-type pairs     → (Ψ̄_a γ^μ Ψ_b)(Ψ̄_c γ_μ Ψ_d)
 *   T  ⟨a x⟩⟨b x⟩, x a field strength F_L (or [][] F_R) → (Ψ̄_a σ^{μν} Ψ_b) F_{μν}
 * A barred field is a conjugate leg; two unbarred (or two barred) legs pair through the
 * charge conjugate Ψ^c. Each form is proportional, with a real factor, to the monomial
 * (Dreiner, Haber & Martin, Phys. Rep. 494 (2010) 1, §2: σ^μ_{αα̇}σ̄_μ^{β̇β} = 2δ_α^βδ_α̇^β̇,
 * and the Fierz identities there), so it names the same basis element. Returns null when
 * the monomial does not pair up this way (derivatives on fermions, bosonic spinor
 * structures left over, or no fermions).
 */
import type { Species } from '../theory/model'
import type { LorentzStructure } from './lorentzStructures'
import type { SuStructure } from './gaugeStructures'
import { gaugeIndexLetters } from './latex'

type Bil = { a: number; b: number; kind: 'S' | 'V' | 'VV' | 'T'; x?: number; c?: number; d?: number }

const GREEK = ['\\mu', '\\nu', '\\rho', '\\sigma', '\\kappa', '\\lambda', '\\tau', '\\omega']

function partners(l: LorentzStructure, n: number): { angle: number[][]; square: number[][] } {
  const angle: number[][] = Array.from({ length: n }, () => [])
  const square: number[][] = Array.from({ length: n }, () => [])
  for (const [i, j] of l.angle) {
    angle[i]!.push(j)
    angle[j]!.push(i)
  }
  for (const [i, j] of l.square) {
    square[i]!.push(j)
    square[j]!.push(i)
  }
  return { angle, square }
}

function classify(legs: Species[], l: LorentzStructure, f: number, g: number, left: Set<number>): Bil | null {
  const { angle, square } = partners(l, legs.length)
  const other = (i: number): number => (angle[i]!.length ? angle[i]![0]! : square[i]![0]!)
  const isAngle = (i: number): boolean => angle[i]!.length === 1
  const [x, y] = [other(f), other(g)]
  if (x === g) return { a: f, b: g, kind: 'S' }
  if (isAngle(f) !== isAngle(g)) {
    const p = legs[x]!
    if (x === y && p.kind === 'scalar' && l.derivs[x] === 1 && angle[x]!.length === 1 && square[x]!.length === 1) return { a: f, b: g, kind: 'V', x }
    if (x !== y && legs[x]!.fermion && legs[y]!.fermion && left.has(x) && left.has(y) && isAngle(x) !== isAngle(y)) return { a: f, b: g, kind: 'VV', c: x, d: y }
    return null
  }
  const p = legs[x]!
  const wanted = isAngle(f) ? angle[x]! : square[x]!
  if (x === y && p.kind === 'field-strength' && l.derivs[x] === 0 && wanted.length === 2 && angle[x]!.length + square[x]!.length === 2) return { a: f, b: g, kind: 'T', x }
  return null
}

function match(legs: Species[], l: LorentzStructure, left: Set<number>): Bil[] | null {
  if (left.size === 0) return []
  const f = Math.min(...left)
  const rest = [...left].filter((g) => g !== f)
  // barred–unbarred pairs first (Ψ̄Ψ), then charge-conjugate pairs
  rest.sort((g, h) => Number(legs[g]!.conj === legs[f]!.conj) - Number(legs[h]!.conj === legs[f]!.conj))
  for (const g of rest) {
    const inner = new Set(rest.filter((h) => h !== g))
    const bil = classify(legs, l, f, g, inner)
    if (!bil) continue
    if (bil.kind === 'VV') {
      inner.delete(bil.c!)
      inner.delete(bil.d!)
    }
    const more = match(legs, l, inner)
    if (more) return [bil, ...more]
  }
  return null
}

/**
 * Four-component LaTeX, or null (see the file header).
 * @example fourComponentLatex([Q, u*, H], ⟨12⟩, gauge) // "(\\bar{u}_{i}Q^{iI})\\,H^{J}…" style
 */
export function fourComponentLatex(legs: Species[], l: LorentzStructure, gauge: SuStructure[]): string | null {
  const fermions = legs.map((p, i) => (p.fermion ? i : -1)).filter((i) => i >= 0)
  if (fermions.length === 0 || fermions.some((i) => l.derivs[i] !== 0)) return null
  const bils = match(legs, l, new Set(fermions))
  if (!bils) return null
  const used = new Set<number>(fermions)
  for (const b of bils) if (b.x !== undefined) used.add(b.x)
  const { angle, square } = partners(l, legs.length)
  if (legs.some((_, i) => !used.has(i) && (angle[i]!.length + square[i]!.length > 0 || l.derivs[i] !== 0))) return null
  const { gUp, gLow, epsText } = gaugeIndexLetters(legs.length, gauge)
  const idx = (i: number): string => `${gUp[i]!.length ? `^{${gUp[i]!.join('')}}` : ''}${gLow[i]!.length ? `_{${gLow[i]!.join('')}}` : ''}`
  const psi = (i: number, bar: boolean): string => {
    const p = legs[i]!
    const cc = p.conj !== bar // unbarred slot holding a conjugate leg, or barred slot holding a field
    const core = bar ? (cc ? `\\overline{${p.tex}^{c}}` : `\\bar{${p.tex}}`) : cc ? `${p.tex}^{c}` : p.tex
    return `{${core}}${idx(i)}`
  }
  const strength = (i: number, lorentzIdx: string): string => {
    const up = gUp[i]!.join('')
    return `{${legs[i]!.tex}}${up ? `^{${up}}{}` : ''}_{${gLow[i]!.join('')}${lorentzIdx}}`
  }
  let g = 0
  const parts: string[] = [...epsText]
  const bilinear = (a: number, b: number, gamma: string): string => {
    const [bar, unbar] = legs[a]!.conj || !legs[b]!.conj ? [a, b] : [b, a]
    return `(${psi(bar, true)}${gamma}${psi(unbar, false)})`
  }
  for (const b of bils) {
    if (b.kind === 'S') parts.push(bilinear(b.a, b.b, ''))
    else if (b.kind === 'V') {
      const m = GREEK[g++ % GREEK.length]!
      parts.push(bilinear(b.a, b.b, `\\gamma^{${m}}`), `(D_{${m}}${legs[b.x!]!.conj ? `{${legs[b.x!]!.tex}^{\\dagger}}` : legs[b.x!]!.tex})${idx(b.x!)}`)
    } else if (b.kind === 'VV') {
      const m = GREEK[g++ % GREEK.length]!
      parts.push(bilinear(b.a, b.b, `\\gamma^{${m}}`), bilinear(b.c!, b.d!, `\\gamma_{${m}}`))
    } else {
      const [m, n] = [GREEK[g++ % GREEK.length]!, GREEK[g++ % GREEK.length]!]
      parts.push(bilinear(b.a, b.b, `\\sigma^{${m}${n}}`), strength(b.x!, `${m}${n}`))
    }
  }
  legs.forEach((p, i) => {
    if (!used.has(i)) parts.push(`${p.conj ? `{${p.tex}^{\\dagger}}` : p.tex}${idx(i)}`)
  })
  return parts.join('\\,')
}
