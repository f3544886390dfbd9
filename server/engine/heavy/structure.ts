/**
 * Operator structures in building blocks: an ordered product of composite letters
 * D (spatial covariant derivative), T (D_t), E (ℰ = [D_t, D]), B (ℬ), optionally one spin
 * matrix s (= iσ, commutes with the letters), with all spatial indices contracted by δ's and
 * at most one ε (enough for rotation scalars: first fundamental theorem of SO(3), Weyl,
 * "The Classical Groups", 1939). Slot 0 is the spin index when present, then the indexed
 * letters in order.
 */
import { EngineInputError } from '../errors'
import { addScaled, letterElement, levi, multiply, termKey, traceElement, type Element } from './algebra'

export type Letter = 'D' | 'T' | 'E' | 'B'

export interface Structure {
  letters: Letter[]
  spin: boolean
  /** The letters form a colour trace tr(…) (non-abelian gauge groups only). */
  traced?: boolean
  pairs: Array<[number, number]>
  eps?: [number, number, number]
}

/** A signed linear combination of structures (integer coefficients). */
export type Combo = Array<{ coef: number; s: Structure }>

/** Number of index slots of a structure. */
export function slotCount(s: Structure): number {
  return (s.spin ? 1 : 0) + s.letters.filter((l) => l !== 'T').length
}

function permSign(a: number[]): number {
  let sign = 1
  const b = a.slice()
  for (let i = 0; i < b.length; i++) for (let j = i + 1; j < b.length; j++) if (b[i]! > b[j]!) sign = -sign
  return sign
}

/** Canonical form (pairs sorted, ε slots ascending) and the sign picked up by sorting ε. */
export function canonical(s: Structure): { sign: number; s: Structure } {
  const pairs = s.pairs.map(([a, b]) => (a < b ? [a, b] : [b, a]) as [number, number]).sort((x, y) => x[0] - y[0])
  const base = { letters: s.letters, spin: s.spin, pairs, ...(s.traced ? { traced: true } : {}) }
  if (!s.eps) return { sign: 1, s: base }
  const sorted = [...s.eps].sort((x, y) => x - y) as [number, number, number]
  return { sign: permSign(s.eps), s: { ...base, eps: sorted } }
}

/** A string identifying a canonical structure. */
export function structureKey(s: Structure): string {
  const c = canonical(s).s
  const p = c.pairs.map(([a, b]) => `${a}${b}`).join('.')
  return `${c.traced ? 'tr' : ''}${c.spin ? 's' : ''}${c.letters.join('')}|${p}|${c.eps ? c.eps.join('') : ''}`
}

/** The same structure with the letter order reversed (spin slot fixed). */
export function reverseStructure(s: Structure): Structure {
  const off = s.spin ? 1 : 0
  const n = slotCount(s) - off
  const map = (slot: number): number => (slot < off ? slot : off + (n - 1 - (slot - off)))
  return {
    ...(s.traced ? { traced: true } : {}),
    letters: [...s.letters].reverse(),
    spin: s.spin,
    pairs: s.pairs.map(([a, b]) => [map(a), map(b)] as [number, number]),
    eps: s.eps ? (s.eps.map(map) as [number, number, number]) : undefined,
  }
}

const THETA: Record<Letter, number> = { D: -1, T: 1, E: 1, B: -1 }

/**
 * Θ = T∘† (time reversal after Hermitian conjugation), a linear anti-automorphism:
 * letters D → −D, D_t → D_t, ℰ → ℰ, ℬ → −ℬ, s → −s, order reversed.
 */
export function thetaCombo(c: Combo): Combo {
  return c.map(({ coef, s }) => {
    let sign = s.spin ? -1 : 1
    for (const l of s.letters) sign *= THETA[l]
    return { coef: coef * sign, s: reverseStructure(s) }
  })
}

/** Hermitian conjugation in the real algebra: every letter and s is anti-Hermitian. */
export function daggerCombo(c: Combo): Combo {
  return c.map(({ coef, s }) => {
    const n = s.letters.length + (s.spin ? 1 : 0)
    return { coef: n % 2 === 0 ? coef : -coef, s: reverseStructure(s) }
  })
}

/** Parity: D and E are odd, D_t, B and σ even. */
export function isParityEven(s: Structure): boolean {
  return s.letters.filter((l) => l === 'D' || l === 'E').length % 2 === 0
}

/** Merge equal structures and drop zero coefficients. */
export function simplifyCombo(c: Combo): Combo {
  const m = new Map<string, { coef: number; s: Structure }>()
  for (const { coef, s } of c) {
    const can = canonical(s)
    const k = structureKey(can.s)
    const e = m.get(k)
    if (e) e.coef += coef * can.sign
    else m.set(k, { coef: coef * can.sign, s: can.s })
  }
  return [...m.values()].filter((t) => t.coef !== 0)
}

function assignments(s: Structure): Array<{ values: number[]; weight: number }> {
  const n = slotCount(s)
  let out: Array<{ values: number[]; weight: number }> = [{ values: new Array<number>(n).fill(0), weight: 1 }]
  for (const [a, b] of s.pairs) {
    out = out.flatMap((x) => [1, 2, 3].map((v) => {
      const values = x.values.slice(); values[a] = v; values[b] = v
      return { values, weight: x.weight }
    }))
  }
  if (s.eps) {
    const [a, b, c] = s.eps
    out = out.flatMap((x) => {
      const r: Array<{ values: number[]; weight: number }> = []
      for (let i = 1; i <= 3; i++) for (let j = 1; j <= 3; j++) for (let k = 1; k <= 3; k++) {
        const e = levi(i, j, k)
        if (e === 0) continue
        const values = x.values.slice(); values[a] = i; values[b] = j; values[c] = k
        r.push({ values, weight: x.weight * e })
      }
      return r
    })
  }
  return out
}

/**
 * Expand a structure into the word algebra (sum over index values).
 * @example expandStructure(parseStructure('D_i D_i').s) // D_1D_1 + D_2D_2 + D_3D_3
 * Method: explicit index sums. Reference: common practice.
 */
export function expandStructure(s: Structure): Element {
  const n = slotCount(s)
  const used = new Array<number>(n).fill(0)
  for (const [a, b] of s.pairs) { used[a]!++; used[b]!++ }
  if (s.eps) for (const a of s.eps) used[a]!++
  if (used.some((u) => u !== 1)) throw new EngineInputError('expandStructure', `every index slot must be contracted once, got ${used.join(',')}`)
  let total: Element = new Map()
  for (const { values, weight } of assignments(s)) {
    let slot = s.spin ? 1 : 0
    let el: Element = new Map([[termKey(0, ''), weight]])
    for (const l of s.letters) el = multiply(el, letterElement(l, l === 'T' ? 0 : values[slot++]!))
    if (s.traced) el = traceElement(el)
    if (s.spin) el = multiply(letterElement('s', values[0]!), el)
    total = addScaled(total, el)
  }
  return total
}

/** Expand a combination. */
export function expandCombo(c: Combo): Element {
  let total: Element = new Map()
  for (const { coef, s } of c) total = addScaled(total, expandStructure(s), coef)
  return total
}

/**
 * Parse a structure written as space-separated tokens: D_i, T, E_i, B_i, s_i, eps_ijk
 * (each index label used exactly twice); a token "tr" puts the letters in a colour trace. Returns the ε-sorting sign and the structure.
 * @example parseStructure('s_k eps_kij D_i E_j') // spin-orbit-type σ·(D×E)
 */
export function parseStructure(text: string): { sign: number; s: Structure } {
  const letters: Letter[] = []
  const slotLabels: string[] = []
  let spin = false
  let epsLabels: string[] | undefined
  let traced = false
  for (const tok of text.trim().split(/\s+/)) {
    if (tok === 'tr') { traced = true; continue }
    const m = /^(D|T|E|B|s|eps)(?:_([a-z]+))?$/.exec(tok)
    if (!m) throw new EngineInputError('parseStructure', `unknown token "${tok}" in "${text}"`)
    const [, name, idx] = m
    if (name === 'eps') {
      if (!idx || idx.length !== 3 || epsLabels) throw new EngineInputError('parseStructure', `bad ε token "${tok}" in "${text}"`)
      epsLabels = idx.split('')
    } else if (name === 's') {
      if (spin || !idx || idx.length !== 1) throw new EngineInputError('parseStructure', `bad spin token "${tok}" in "${text}"`)
      spin = true
      slotLabels.unshift(idx)
    } else if (name === 'T') {
      letters.push('T')
    } else {
      if (!idx || idx.length !== 1) throw new EngineInputError('parseStructure', `token "${tok}" needs one index in "${text}"`)
      letters.push(name as Letter)
      slotLabels.push(idx)
    }
  }
  const pairs: Array<[number, number]> = []
  const seen = new Map<string, number>()
  slotLabels.forEach((lab, slot) => {
    if (epsLabels?.includes(lab)) return
    const prev = seen.get(lab)
    if (prev === undefined) seen.set(lab, slot)
    else { pairs.push([prev, slot]); seen.delete(lab) }
  })
  if (seen.size > 0) throw new EngineInputError('parseStructure', `index ${[...seen.keys()].join(',')} is not contracted in "${text}"`)
  let eps: [number, number, number] | undefined
  if (epsLabels) {
    eps = epsLabels.map((lab) => {
      const slots = slotLabels.map((l, i) => (l === lab ? i : -1)).filter((i) => i >= 0)
      if (slots.length !== 1) throw new EngineInputError('parseStructure', `ε index ${lab} must appear once outside ε in "${text}"`)
      return slots[0]!
    }) as [number, number, number]
  }
  const can = canonical({ letters, spin, pairs, eps, ...(traced ? { traced: true } : {}) })
  return { sign: can.sign, s: can.s }
}

/** Build a combination from [coefficient, text] pairs. */
export function combo(terms: Array<[number, string]>): Combo {
  return terms.map(([c, t]) => {
    const p = parseStructure(t)
    return { coef: c * p.sign, s: p.s }
  })
}
