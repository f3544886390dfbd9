/**
 * Operator structures in building blocks: an ordered product of composite letters
 * D (spatial covariant derivative), T (D_t), E (ℰ = [D_t, D]), B (ℬ), optionally one spin
 * matrix s (= iσ, commutes with the letters), with all spatial indices contracted by δ's and
 * at most one ε (enough for rotation scalars: first fundamental theorem of SO(3), Weyl,
 * "The Classical Groups", 1939). Slot 0 is the spin index when present, then the indexed
 * letters in order.
 */
import { EngineConsistencyError } from '../errors'
import { addScaled, fieldElement, letterElement, levi, multiply, termKey, traceElement, type Element } from './algebra'
import type { GaugeSetup } from './symbol'

/** D, D_t, and field strengths E, B of gauge factor 0 ("E") or of factor g ("E1", "B2", …). */
export type Letter = 'D' | 'T' | 'E' | 'B' | `E${number}` | `B${number}`

export interface Structure {
  letters: Letter[]
  spin: boolean
  /** Letters [from, to) form a colour trace tr(…)·1 (non-abelian gauge factor only). */
  trace?: [number, number]
  pairs: Array<[number, number]>
  eps?: [number, number, number]
}

/** E or B for a field-strength letter, null for D and D_t. */
export function fieldKind(l: Letter): 'E' | 'B' | null {
  return l[0] === 'E' ? 'E' : l[0] === 'B' ? 'B' : null
}

/** Gauge factor of a field-strength letter (0 for plain E, B). */
export function factorOf(l: Letter): number {
  return l.length > 1 ? Number(l.slice(1)) : 0
}

/** The field-strength letter of kind E/B for factor g. */
export function fieldLetterOf(which: 'E' | 'B', g: number): Letter {
  return (g === 0 ? which : `${which}${g}`) as Letter
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
  const base = { letters: s.letters, spin: s.spin, pairs, ...(s.trace ? { trace: s.trace } : {}) }
  if (!s.eps) return { sign: 1, s: base }
  const sorted = [...s.eps].sort((x, y) => x - y) as [number, number, number]
  return { sign: permSign(s.eps), s: { ...base, eps: sorted } }
}

/** A string identifying a canonical structure. */
export function structureKey(s: Structure): string {
  const c = canonical(s).s
  const p = c.pairs.map(([a, b]) => `${a}${b}`).join('.')
  return `${c.trace ? `tr${c.trace.join('-')}` : ''}${c.spin ? 's' : ''}${c.letters.join(',')}|${p}|${c.eps ? c.eps.join('') : ''}`
}

/** The same structure with the letter order reversed (spin slot fixed). */
export function reverseStructure(s: Structure): Structure {
  const off = s.spin ? 1 : 0
  const n = slotCount(s) - off
  const map = (slot: number): number => (slot < off ? slot : off + (n - 1 - (slot - off)))
  const L = s.letters.length
  return {
    ...(s.trace ? { trace: [L - s.trace[1], L - s.trace[0]] as [number, number] } : {}),
    letters: [...s.letters].reverse(),
    spin: s.spin,
    pairs: s.pairs.map(([a, b]) => [map(a), map(b)] as [number, number]),
    eps: s.eps ? (s.eps.map(map) as [number, number, number]) : undefined,
  }
}

function theta(l: Letter): number {
  return l === 'D' || fieldKind(l) === 'B' ? -1 : 1
}

/**
 * Θ = T∘† (time reversal after Hermitian conjugation), a linear anti-automorphism:
 * letters D → −D, D_t → D_t, ℰ → ℰ, ℬ → −ℬ, s → −s, order reversed.
 */
export function thetaCombo(c: Combo): Combo {
  return c.map(({ coef, s }) => {
    let sign = s.spin ? -1 : 1
    for (const l of s.letters) sign *= theta(l)
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
  return s.letters.filter((l) => l === 'D' || fieldKind(l) === 'E').length % 2 === 0
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
    out = out.flatMap((x) =>
      [1, 2, 3].map((v) => {
        const values = x.values.slice()
        values[a] = v
        values[b] = v
        return { values, weight: x.weight }
      }),
    )
  }
  if (s.eps) {
    const [a, b, c] = s.eps
    out = out.flatMap((x) => {
      const r: Array<{ values: number[]; weight: number }> = []
      for (let i = 1; i <= 3; i++)
        for (let j = 1; j <= 3; j++)
          for (let k = 1; k <= 3; k++) {
            const e = levi(i, j, k)
            if (e === 0) continue
            const values = x.values.slice()
            values[a] = i
            values[b] = j
            values[c] = k
            r.push({ values, weight: x.weight * e })
          }
      return r
    })
  }
  return out
}

/**
 * The element of one letter with a concrete index. With several gauge factors, [D_t, D_i] is
 * the sum of all coupled field strengths; the factor that owns the commutator (the coupled
 * SU(N), else the first coupled U(1)) is the commutator minus the other coupled abelian
 * letters, and every other factor's E, B are direct letters (algebra.ts, fieldLetter).
 */
function letterOf(l: Letter, index: number, setup?: GaugeSetup): Element {
  const which = fieldKind(l)
  if (!which) return letterElement(l as 'D' | 'T', index)
  const g = factorOf(l)
  const factors = setup?.factors ?? [{ kind: 'u1', coupled: true }]
  const su = factors.findIndex((f) => f.coupled && f.kind === 'su')
  const commutator = su >= 0 ? su : factors.findIndex((f) => f.coupled)
  if (g !== commutator) return fieldElement(g, which, index)
  let el = letterElement(which, index)
  factors.forEach((f, h) => {
    if (h !== g && f.coupled) el = addScaled(el, fieldElement(h, which, index), -1)
  })
  return el
}

/**
 * Expand a structure into the word algebra (sum over index values).
 * @example expandStructure(parseStructure('D_i D_i').s) // D_1D_1 + D_2D_2 + D_3D_3
 * Method: explicit index sums. Reference: common practice.
 */
export function expandStructure(s: Structure, setup?: GaugeSetup): Element {
  const n = slotCount(s)
  const used = new Array<number>(n).fill(0)
  for (const [a, b] of s.pairs) {
    used[a]!++
    used[b]!++
  }
  if (s.eps) for (const a of s.eps) used[a]!++
  if (used.some((u) => u !== 1)) throw new EngineConsistencyError('expandStructure', `every index slot must be contracted once, got ${used.join(',')}`)
  const [t0, t1] = s.trace ?? [0, 0]
  let total: Element = new Map()
  for (const { values, weight } of assignments(s)) {
    let slot = s.spin ? 1 : 0
    const parts: Element[] = [new Map([[termKey(0, ''), 1]]), new Map([[termKey(0, ''), 1]]), new Map([[termKey(0, ''), 1]])]
    s.letters.forEach((l, i) => {
      const part = i < t0 ? 0 : i < t1 ? 1 : 2
      parts[part] = multiply(parts[part]!, letterOf(l, l === 'T' ? 0 : values[slot++]!, setup))
    })
    let el = s.trace ? multiply(multiply(parts[0]!, traceElement(parts[1]!)), parts[2]!) : multiply(parts[0]!, parts[2]!)
    el = new Map([...el].map(([k, c]) => [k, c * weight]))
    if (s.spin) el = multiply(letterElement('s', values[0]!), el)
    total = addScaled(total, el)
  }
  return total
}

/** Expand a combination. */
export function expandCombo(c: Combo, setup?: GaugeSetup): Element {
  let total: Element = new Map()
  for (const { coef, s } of c) total = addScaled(total, expandStructure(s, setup), coef)
  return total
}

/**
 * Parse a structure written as space-separated tokens: D_i, T, E_i, B_i (E1_i, B2_i for
 * other gauge factors), s_i, eps_ijk (each index label used exactly twice); a token "tr" puts
 * all letters in a colour trace, "tr[" … "]" only those between. Returns the ε-sorting sign and the structure.
 * @example parseStructure('s_k eps_kij D_i E_j') // spin-orbit-type σ·(D×E)
 */
export function parseStructure(text: string): { sign: number; s: Structure } {
  const letters: Letter[] = []
  const slotLabels: string[] = []
  let spin = false
  let epsLabels: string[] | undefined
  let trace: [number, number] | undefined
  let open = -1
  for (const tok of text.trim().split(/\s+/)) {
    if (tok === 'tr') {
      trace = [0, -1]
      continue
    }
    if (tok === 'tr[') {
      open = letters.length
      continue
    }
    if (tok === ']') {
      trace = [open, letters.length]
      continue
    }
    const m = /^(D|T|E\d*|B\d*|s|eps)(?:_([a-z]+))?$/.exec(tok)
    if (!m) throw new EngineConsistencyError('parseStructure', `unknown token "${tok}" in "${text}"`)
    const [, name, idx] = m
    if (name === 'eps') {
      if (!idx || idx.length !== 3 || epsLabels) throw new EngineConsistencyError('parseStructure', `bad ε token "${tok}" in "${text}"`)
      epsLabels = idx.split('')
    } else if (name === 's') {
      if (spin || !idx || idx.length !== 1) throw new EngineConsistencyError('parseStructure', `bad spin token "${tok}" in "${text}"`)
      spin = true
      slotLabels.unshift(idx)
    } else if (name === 'T') {
      letters.push('T')
    } else {
      if (!idx || idx.length !== 1) throw new EngineConsistencyError('parseStructure', `token "${tok}" needs one index in "${text}"`)
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
    else {
      pairs.push([prev, slot])
      seen.delete(lab)
    }
  })
  if (seen.size > 0) throw new EngineConsistencyError('parseStructure', `index ${[...seen.keys()].join(',')} is not contracted in "${text}"`)
  let eps: [number, number, number] | undefined
  if (epsLabels) {
    eps = epsLabels.map((lab) => {
      const slots = slotLabels.map((l, i) => (l === lab ? i : -1)).filter((i) => i >= 0)
      if (slots.length !== 1) throw new EngineConsistencyError('parseStructure', `ε index ${lab} must appear once outside ε in "${text}"`)
      return slots[0]!
    }) as [number, number, number]
  }
  if (trace && trace[1] < 0) trace = [0, letters.length]
  const can = canonical({ letters, spin, pairs, eps, ...(trace ? { trace } : {}) })
  return { sign: can.sign, s: can.s }
}

/** Build a combination from [coefficient, text] pairs. */
export function combo(terms: Array<[number, string]>): Combo {
  return terms.map(([c, t]) => {
    const p = parseStructure(t)
    return { coef: c * p.sign, s: p.s }
  })
}
