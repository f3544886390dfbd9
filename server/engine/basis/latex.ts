/**
 * LaTeX of a candidate operator in two-component notation: every angle bracket ⟨ij⟩ is an
 * undotted index contracted between legs i and j, every square bracket [ij] a dotted one;
 * a derivative on leg i is D_{αα̇} carrying one of each. SU(N) indices: δ contractions share
 * a letter, ε tensors are written explicitly. Conjugate fields carry a dagger.
 * Four-component (Dirac-bilinear) forms: see fourComponent.ts.
 */
import type { Species } from '../theory/model'
import type { LorentzStructure } from './lorentzStructures'
import type { SuStructure } from './gaugeStructures'

const UNDOTTED = ['\\alpha', '\\beta', '\\gamma', '\\delta', '\\epsilon', '\\zeta', '\\eta', '\\theta', '\\iota', '\\kappa', '\\lambda', '\\mu', '\\nu', '\\xi', '\\rho', '\\sigma']
const GROUP_LETTERS = [
  ['i', 'j', 'k', 'l', 'm', 'n', 'p', 'q', 'r', 's', 't', 'v'],
  ['I', 'J', 'K', 'L', 'M', 'N', 'P', 'R', 'S', 'T', 'U', 'V'],
  ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h', 'o', 'u', 'w', 'x'],
]

export function letter(list: string[], i: number): string {
  return i < list.length ? list[i]! : `${list[i % list.length]!}_{${Math.floor(i / list.length)}}`
}

export function fieldSymbol(p: Species): string {
  const base = p.kind === 'field-strength' ? `{${p.tex}_{${p.label.endsWith('_L') ? 'L' : 'R'}}}` : p.tex
  return p.conj && p.kind !== 'field-strength' ? `{${base}^{\\dagger}}` : base
}

/**
 * Two-component LaTeX of one bracket monomial times gauge contractions.
 * @example operatorLatex([H,H*,...], structure, []) // "(D_{\\alpha\\dot\\alpha}H)…"
 * Method: spinor-index bookkeeping (Dreiner, Haber & Martin, Phys. Rep. 494 (2010) 1).
 */
export function operatorLatex(legs: Species[], l: LorentzStructure, gauge: SuStructure[]): string {
  const low: string[][] = legs.map(() => [])
  const up: string[][] = legs.map(() => [])
  l.angle.forEach(([i, j], a) => {
    const x = letter(UNDOTTED, a)
    up[i]!.push(x)
    low[j]!.push(x)
  })
  l.square.forEach(([i, j], a) => {
    const x = `\\dot${letter(UNDOTTED, a)}`
    low[i]!.push(x)
    up[j]!.push(x)
  })
  const { gUp, gLow, epsText } = gaugeIndexLetters(legs.length, gauge)
  const factors = legs.map((p, i) => {
    const k = l.derivs[i]!
    const d = k === 0 ? '' : k === 1 ? 'D' : `D^{${k}}`
    const sup = [...gUp[i]!, ...up[i]!].join('')
    const sub = [...gLow[i]!, ...low[i]!].join('')
    const core = d ? `(${d}${fieldSymbol(p)})` : fieldSymbol(p)
    return `${core}${sup ? `^{${sup}}` : ''}${sub ? `_{${sub}}` : ''}`
  })
  return [...epsText, ...asPowers(factors, legs)].join('\\,')
}

/**
 * Equal neighbouring factors that carry no index written as one power (φ^5, not φφφφφ); a
 * factor with an index or a derivative stays apart, since its indices tell the copies apart.
 * @example asPowers(['\\mathrm{phi}', '\\mathrm{phi}'], legs) // ['\\mathrm{phi}^{2}']
 */
function asPowers(factors: string[], legs: Species[]): string[] {
  const out: string[] = []
  for (let i = 0; i < factors.length;) {
    let j = i + 1
    const bare = factors[i] === fieldSymbol(legs[i]!)
    while (bare && j < factors.length && factors[j] === factors[i]) j++
    // A field symbol is one letter, one \mathrm{…} or one braced group: it takes a power as it is.
    const power = /^[A-Za-z]$|^\\mathrm\{[^{}]*\}$|^\{.*\}$/.test(factors[i]!) ? factors[i]! : `{${factors[i]!}}`
    out.push(j - i > 1 ? `${power}^{${j - i}}` : factors[i]!)
    i = j
  }
  return out
}

/**
 * Gauge index letters per leg (upper, lower) and the ε tensors, for SU(N) contractions.
 * @example gaugeIndexLetters(2, [δ(fund leg 0, anti leg 1)]) // gUp [["i"],[]], gLow [[],["i"]]
 */
export function gaugeIndexLetters(nLegs: number, gauge: SuStructure[]): { gUp: string[][]; gLow: string[][]; epsText: string[] } {
  const gUp: string[][] = Array.from({ length: nLegs }, () => [])
  const gLow: string[][] = Array.from({ length: nLegs }, () => [])
  const epsText: string[] = []
  gauge.forEach((s, gi) => {
    const letters = GROUP_LETTERS[gi % GROUP_LETTERS.length]!
    let next = 0
    const slotLetter = new Map<number, string>()
    for (const [u, lo] of s.deltas) {
      const x = letter(letters, next++)
      slotLetter.set(u, x)
      slotLetter.set(lo, x)
    }
    for (const block of s.eps) {
      const xs = block.map((slot) => {
        const x = letter(letters, next++)
        slotLetter.set(slot, x)
        return x
      })
      const upperBlock = s.slots[block[0]!]!.upper
      epsText.push(`\\epsilon${upperBlock ? '_' : '^'}{${xs.join('')}}`)
    }
    s.slots.forEach((sl, si) => (sl.upper ? gUp : gLow)[sl.leg]!.push(slotLetter.get(si)!))
  })
  return { gUp, gLow, epsText }
}
