/**
 * Structures of heavy four-fermion contact operators ψ†…ψ χ†…χ (convention of Bodwin,
 * Braaten, Lepage, Phys. Rev. D 51 (1995) 1125: ψ annihilates the particle, χ creates the
 * antiparticle, both two-component and in the same colour representation).
 *
 * Legs (fields): 0 = ψ†, 1 = ψ, 2 = χ†, 3 = χ. Orderings: 'direct' (ψ†Γ₁ψ)(χ†Γ₂χ) and
 * 'exchanged' (ψ†Γ₁χ)(χ†Γ₂ψ) (the annihilation form). Colour: 'singlet' (1 ⊗ 1) or
 * 'octet' (T^A ⊗ T^A) in the two bilinears. A structure is an ordered list of index slots —
 * σ in bilinear 1 ('s1'), σ in bilinear 2 ('s2'), a spatial derivative ∂ acting on one leg
 * ('d', leg) — contracted by δ's and at most one ε (SO(3) invariants: Weyl, "The Classical
 * Groups", 1939). Coefficients are real; the physical operator is the structure itself
 * (no hidden factors of i).
 */
import { EngineConsistencyError } from '../errors'
import { contractions } from './candidates'

export type Ordering = 'direct' | 'exchanged'
export type Colour = 'singlet' | 'octet'
export type FourSlot = { kind: 's1' } | { kind: 's2' } | { kind: 'd'; leg: number }

export interface FourStructure {
  ordering: Ordering
  colour: Colour
  slots: FourSlot[]
  pairs: Array<[number, number]>
  eps?: [number, number, number]
}

/** A real linear combination of four-fermion structures. */
export type FourCombo = Array<{ coef: number; s: FourStructure }>

/** Number of Pauli matrices in a structure. */
export function sigmaCount(s: FourStructure): number {
  return s.slots.filter((x) => x.kind !== 'd').length
}

/** Number of derivatives in a structure. */
export function derivativeCount(s: FourStructure): number {
  return s.slots.filter((x) => x.kind === 'd').length
}

/** Legs exchanged by Hermitian conjugation: ψ† ↔ ψ, χ† ↔ χ. */
const DAGGER_LEG = [1, 0, 3, 2]

/**
 * Hermitian conjugate of a structure (real coefficient): ∂ and σ are Hermitian, so only the
 * legs swap (ψ† ↔ ψ, χ† ↔ χ); in the exchanged ordering the two bilinears also trade their
 * Pauli matrices, (ψ†Γ₁χ)(χ†Γ₂ψ)† = (ψ†Γ₂χ)(χ†Γ₁ψ).
 * @example daggerFour(parseFour('ex d1_i d1_i')).slots // [{kind:'d',leg:0},{kind:'d',leg:0}]
 * Method: (AB)† = B†A† on bosonic bilinears. Reference: common practice.
 */
export function daggerFour(s: FourStructure): FourStructure {
  const slots: FourSlot[] = s.slots.map((x) => {
    if (x.kind === 'd') return { kind: 'd', leg: DAGGER_LEG[x.leg]! }
    if (s.ordering === 'direct') return x
    return { kind: x.kind === 's1' ? 's2' : 's1' }
  })
  return { ...s, slots }
}

/** Hermitian conjugate of a combination (real coefficients). */
export function daggerFourCombo(c: FourCombo): FourCombo {
  return c.map(({ coef, s }) => ({ coef, s: daggerFour(s) }))
}

/** All unordered leg multisets of size n (legs ascending), e.g. n = 2 gives 10. */
function legMultisets(n: number, from = 0): number[][] {
  if (n === 0) return [[]]
  const out: number[][] = []
  for (let l = from; l < 4; l++) for (const rest of legMultisets(n - 1, l)) out.push([l, ...rest])
  return out
}

const SPIN_CHOICES: FourSlot[][] = [[], [{ kind: 's1' }, { kind: 's2' }], [{ kind: 's1' }], [{ kind: 's2' }]]

/**
 * Every contracted structure with `nDeriv` spatial derivatives, for the given orderings
 * and colour structures, parity even (nDeriv even), ordered: annihilation (exchanged)
 * ordering first, singlet before octet, no σ, σ⊗σ, then one σ.
 * @example fourCandidates(0, ['singlet']).length // 4: ψ†χχ†ψ, ψ†σχ·χ†σψ, ψ†ψχ†χ, ψ†σψ·χ†σχ
 * Method: enumerate slot lists and their δ/ε contractions (candidates.ts). Reference: common practice.
 */
export function fourCandidates(nDeriv: number, colours: readonly Colour[]): FourStructure[] {
  if (!Number.isInteger(nDeriv) || nDeriv < 0 || nDeriv % 2 !== 0 || nDeriv > 4) {
    throw new EngineConsistencyError('fourCandidates', `the number of derivatives must be 0, 2 or 4 (parity even), got ${nDeriv}`)
  }
  const out: FourStructure[] = []
  for (const ordering of ['exchanged', 'direct'] as const) {
    for (const colour of colours) {
      for (const spin of SPIN_CHOICES) {
        for (const legs of legMultisets(nDeriv)) {
          const slots: FourSlot[] = [...spin, ...legs.map((leg): FourSlot => ({ kind: 'd', leg }))]
          for (const c of contractions(slots.length)) out.push({ ordering, colour, slots, pairs: c.pairs, eps: c.eps })
        }
      }
    }
  }
  return out
}

/**
 * Parse a structure: tokens "ex" (exchanged ordering; default direct), "oct" (octet colour),
 * s1_i, s2_i (σ in bilinear 1 or 2), d0_i … d3_i (∂ on leg 0 = ψ†, 1 = ψ, 2 = χ†, 3 = χ),
 * eps_ijk; each index label appears twice (ε labels once elsewhere).
 * @example parseFour('ex s1_i s2_j d1_i d1_j') // (ψ†σ^iχ)(χ†σ^j ∂^i∂^jψ)
 */
export function parseFour(text: string): FourStructure {
  let ordering: Ordering = 'direct'
  let colour: Colour = 'singlet'
  const slots: FourSlot[] = []
  const labels: string[] = []
  let epsLabels: string[] | undefined
  for (const tok of text.trim().split(/\s+/).filter(Boolean)) {
    if (tok === 'ex') {
      ordering = 'exchanged'
      continue
    }
    if (tok === 'oct') {
      colour = 'octet'
      continue
    }
    const m = /^(s1|s2|d[0-3]|eps)_([a-z]+)$/.exec(tok)
    if (!m) throw new EngineConsistencyError('parseFour', `unknown token "${tok}" in "${text}"`)
    if (m[1] === 'eps') {
      if (m[2]!.length !== 3 || epsLabels) throw new EngineConsistencyError('parseFour', `bad ε token "${tok}" in "${text}"`)
      epsLabels = m[2]!.split('')
      continue
    }
    if (m[2]!.length !== 1) throw new EngineConsistencyError('parseFour', `token "${tok}" needs one index in "${text}"`)
    const k = m[1]!
    if ((k === 's1' || k === 's2') && slots.some((x) => x.kind === k)) throw new EngineConsistencyError('parseFour', `two σ in one bilinear ("${tok}") in "${text}"`)
    slots.push(k === 's1' || k === 's2' ? { kind: k } : { kind: 'd', leg: Number(k[1]) })
    labels.push(m[2]!)
  }
  return { ordering, colour, slots, ...contractionOf(labels, epsLabels, text) }
}

function contractionOf(labels: string[], epsLabels: string[] | undefined, text: string): { pairs: Array<[number, number]>; eps?: [number, number, number] } {
  const pairs: Array<[number, number]> = []
  const open = new Map<string, number>()
  labels.forEach((lab, slot) => {
    if (epsLabels?.includes(lab)) return
    const prev = open.get(lab)
    if (prev === undefined) open.set(lab, slot)
    else {
      pairs.push([prev, slot])
      open.delete(lab)
    }
  })
  if (open.size > 0) throw new EngineConsistencyError('parseFour', `index ${[...open.keys()].join(',')} is not contracted in "${text}"`)
  if (!epsLabels) return { pairs }
  const eps = epsLabels.map((lab) => {
    const at = labels.flatMap((l, i) => (l === lab ? [i] : []))
    if (at.length !== 1) throw new EngineConsistencyError('parseFour', `ε index ${lab} must appear once outside ε in "${text}"`)
    return at[0]!
  }) as [number, number, number]
  return { pairs, eps }
}

/** Build a combination from [coefficient, text] pairs. */
export function fourCombo(terms: Array<[number, string]>): FourCombo {
  return terms.map(([coef, t]) => ({ coef, s: parseFour(t) }))
}

const KIND_RANK = (x: FourSlot): number => (x.kind === 's1' ? 0 : x.kind === 's2' ? 1 : 2 + x.leg)

function permutationsWithin(groups: number[][]): number[][] {
  if (groups.length === 0) return [[]]
  const [g, ...rest] = groups
  const perms = (a: number[]): number[][] => (a.length <= 1 ? [a] : a.flatMap((x, i) => perms([...a.slice(0, i), ...a.slice(i + 1)]).map((p) => [x, ...p])))
  return perms(g!).flatMap((p) => permutationsWithin(rest).map((r) => [...p, ...r]))
}

/**
 * Canonical form of a structure (slots sorted σ₁, σ₂, ∂ by leg; equal slots tried in every
 * order, lexicographically least key kept) and the sign from sorting the ε indices.
 */
export function canonicalFour(s: FourStructure): { sign: number; s: FourStructure; key: string } {
  const order = s.slots.map((x, i) => ({ r: KIND_RANK(x), i })).sort((a, b) => a.r - b.r || a.i - b.i)
  const groups: number[][] = []
  order.forEach((o, j) => {
    if (j > 0 && order[j - 1]!.r === o.r) groups[groups.length - 1]!.push(o.i)
    else groups.push([o.i])
  })
  let best: { sign: number; s: FourStructure; key: string } | undefined
  for (const perm of permutationsWithin(groups)) {
    const pos = new Array<number>(perm.length)
    perm.forEach((old, j) => {
      pos[old] = j
    })
    const pairs = s.pairs.map(([a, b]) => [Math.min(pos[a]!, pos[b]!), Math.max(pos[a]!, pos[b]!)] as [number, number]).sort((x, y) => x[0] - y[0])
    let sign = 1
    let eps: [number, number, number] | undefined
    if (s.eps) {
      const e = s.eps.map((x) => pos[x]!)
      for (let i = 0; i < 3; i++) for (let j = i + 1; j < 3; j++) if (e[i]! > e[j]!) sign = -sign
      eps = [...e].sort((x, y) => x - y) as [number, number, number]
    }
    const slots = perm.map((old) => s.slots[old]!)
    const key = `${s.ordering}|${s.colour}|${slots.map(KIND_RANK).join('')}|${pairs.map((p) => p.join('')).join('.')}|${eps?.join('') ?? ''}`
    if (!best || key < best.key) best = { sign, key, s: { ordering: s.ordering, colour: s.colour, slots, pairs, ...(eps ? { eps } : {}) } }
  }
  return best!
}

/** Merge equal structures of a combination and drop zero coefficients. */
export function simplifyFour(c: FourCombo): FourCombo {
  const m = new Map<string, { coef: number; s: FourStructure }>()
  for (const { coef, s } of c) {
    const can = canonicalFour(s)
    const e = m.get(can.key)
    if (e) e.coef += coef * can.sign
    else m.set(can.key, { coef: coef * can.sign, s: can.s })
  }
  return [...m.values()].filter((t) => t.coef !== 0)
}

/**
 * Expand relative derivatives written as L_i (D⃡ in ψ†…χ: ∂ on χ minus ∂ on ψ†) and R_i
 * (D⃡ in χ†…ψ: ∂ on ψ minus ∂ on χ†) into single-leg derivatives; other tokens unchanged.
 * @example expandArrows('ex L_i R_i').length // 4
 */
export function expandArrows(text: string): Array<[number, string]> {
  let out: Array<[number, string[]]> = [[1, []]]
  for (const tok of text.trim().split(/\s+/)) {
    const m = /^([LR])_([a-z])$/.exec(tok)
    if (!m) {
      out = out.map(([c, t]) => [c, [...t, tok]])
      continue
    }
    const [plus, minus] = m[1] === 'L' ? ['d3', 'd0'] : ['d1', 'd2']
    out = out.flatMap(([c, t]): Array<[number, string[]]> => [
      [c, [...t, `${plus}_${m[2]}`]],
      [-c, [...t, `${minus}_${m[2]}`]],
    ])
  }
  return out.map(([c, t]) => [c, t.join(' ')])
}

/**
 * Charge conjugate of a structure: C maps leg L to leg 3 − L (ψ ↔ χ†, ψ† ↔ χ), each Pauli
 * matrix to −σ (σ₂σ_kσ₂ = −σ_kᵀ), and in the direct ordering moves σ between the ψ- and
 * χ-bilinears; the colour structures 1⊗1 and T^A⊗T^A are invariant.
 * @example conjugateFour(parseFour('d1_i d1_i')).slots // ∂∂ on leg 2 (χ†)
 * Method: Ψ → iγ²Ψ* on the Dirac field Ψ = (ψ, χ) (Peskin & Schroeder §3.6).
 */
export function conjugateFourCombo(c: FourCombo): FourCombo {
  return c.map(({ coef, s }) => {
    const slots: FourSlot[] = s.slots.map((x) => {
      if (x.kind === 'd') return { kind: 'd', leg: 3 - x.leg }
      if (s.ordering === 'exchanged') return x
      return { kind: x.kind === 's1' ? 's2' : 's1' }
    })
    return { coef: sigmaCount(s) % 2 === 0 ? coef : -coef, s: { ...s, slots } }
  })
}
