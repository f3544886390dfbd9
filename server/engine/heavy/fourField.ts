/**
 * Particle–antiparticle four-fermion operators with one field strength at 1/m⁴:
 * (ψ†Γ₁ψ)(χ†Γ₂χ) times B (no derivative is left at this order).
 *
 * Why only B, and why no relations: with E = [D_t, D]/ig on one leg, D_t can be moved by
 * parts onto the other legs, where the heavy-field EOM removes it, so every E-operator is
 * pushed to higher order; and a total derivative ∂_i of a one-derivative operator, written
 * with covariant derivatives, gives a field strength only through a reordered pair D_iD_j
 * on one leg — its symmetric part has a vanishing four-leg vertex exactly when the
 * one-derivative operator itself vanishes — so no combination of B-operators is a total
 * derivative (hand derivation, common practice). The B-operators are therefore counted by
 * the rank of their five-leg vertex with a static field B (any vector, colour matrix
 * B^a T^a between two legs), Hermitian, P-even (B is), T-even (B is T-odd) and C-even
 * (C: B → −Bᵀ) as imposed.
 */
import type { CancelFlag, PrimeField, SeededRandom } from '../finite'
import { contactRank } from './contactSpace'
import { contractions } from './candidates'
import { pointTables, randomFourPoint, conjugatePoint, type FourPoint } from './fourVertex'
import { levi } from './algebra'
import { fieldTex } from './fieldTex'
import type { HeavyOperator } from './heavyOperator'

type Slot = 's1' | 's2' | 'b'
export interface FieldStructure {
  ordering: 'direct' | 'exchanged'
  /** The bilinear whose colour chain carries B^aT^a (1 or 2). */
  chain: 1 | 2
  slots: Slot[]
  pairs: Array<[number, number]>
  eps?: [number, number, number]
}
/** A term: coefficient, structure, and whether it is read at the charge-conjugate point. */
export type FieldCombo = Array<{ coef: number; s: FieldStructure; conj: boolean }>

export interface FieldPoint {
  pt: FourPoint
  b: number[]
  m: number[]
}

const LEGS = {
  direct: [
    [0, 1],
    [2, 3],
  ],
  exchanged: [
    [0, 3],
    [2, 1],
  ],
} as const

function randomMatrix(F: PrimeField, rng: SeededRandom, N: number): number[] {
  if (N === 1) return [1]
  const m = Array.from({ length: N * N }, () => rng.below(F.p))
  let tr = 0
  for (let i = 0; i < N - 1; i++) tr = F.add(tr, m[i * N + i]!)
  m[N * N - 1] = F.neg(tr)
  return m
}

/** A random point: the four legs (fourVertex.ts), a static B vector and its colour matrix. */
export function sampleFieldPoint(F: PrimeField, rng: SeededRandom, N: number): FieldPoint {
  return { pt: randomFourPoint(F, rng, N), b: [1, 2, 3].map(() => rng.nonZero(F.p)), m: randomMatrix(F, rng, N) }
}

/** The charge-conjugate point: legs L → 3 − L with iσ₂ spinors (fourVertex.ts), B → −Bᵀ. */
function conjugate(F: PrimeField, x: FieldPoint): FieldPoint {
  const N = Math.round(Math.sqrt(x.m.length))
  const mt = x.m.map((_, k) => x.m[(k % N) * N + Math.floor(k / N)]!)
  return { pt: conjugatePoint(F, x.pt), b: x.b.map((v) => F.neg(v)), m: mt }
}

function colour(F: PrimeField, s: FieldStructure, x: FieldPoint): number {
  const c = x.pt.c
  const N = c[0]!.length
  const [[a, b], [p, q]] = LEGS[s.ordering]
  const dot = (u: number[], v: number[]) => u.reduce((t, y, i) => F.add(t, F.mul(y, v[i]!)), 0)
  const sand = (u: number[], v: number[]) => {
    let t = 0
    for (let i = 0; i < N; i++) for (let j = 0; j < N; j++) t = F.add(t, F.mul(F.mul(u[i]!, x.m[i * N + j]!), v[j]!))
    return t
  }
  return s.chain === 1 ? F.mul(sand(c[a]!, c[b]!), dot(c[p]!, c[q]!)) : F.mul(dot(c[a]!, c[b]!), sand(c[p]!, c[q]!))
}

function value(F: PrimeField, s: FieldStructure, x: FieldPoint): number {
  const spin = pointTables(F, x.pt).spin[s.ordering]
  let total = 0
  const n = s.slots.length
  for (let code = 0; code < 3 ** n; code++) {
    const idx: number[] = []
    let r = code
    for (let j = 0; j < n; j++) {
      idx.push((r % 3) + 1)
      r = Math.floor(r / 3)
    }
    if (s.pairs.some(([a, b]) => idx[a] !== idx[b])) continue
    const w = s.eps ? levi(idx[s.eps[0]]!, idx[s.eps[1]]!, idx[s.eps[2]]!) : 1
    if (w === 0) continue
    const at = (k: Slot) => {
      const j = s.slots.indexOf(k)
      return j < 0 ? 0 : idx[j]!
    }
    const term = F.mul(F.mul(spin[0]![at('s1')]!, spin[1]![at('s2')]!), x.b[at('b') - 1]!)
    total = w > 0 ? F.add(total, term) : F.sub(total, term)
  }
  const sign = s.ordering === 'exchanged' ? F.p - 1 : 1
  return F.mul(F.mul(total, colour(F, s, x)), sign)
}

/** Vertex of a combination at a point (terms marked conj are read at the charge-conjugate point). */
export function fieldComboValue(F: PrimeField, c: FieldCombo, x: FieldPoint): number {
  let total = 0
  for (const t of c) total = F.add(total, F.mul(F.from(t.coef), value(F, t.s, t.conj ? conjugate(F, x) : x)))
  return total
}

/** Every structure: σ's in either bilinear, the B index, δ/ε contractions, B's colour chain. */
export function fieldStructures(colorN: number): FieldStructure[] {
  const out: FieldStructure[] = []
  for (const ordering of ['exchanged', 'direct'] as const)
    for (const chain of colorN === 1 ? [1 as const] : [1 as const, 2 as const]) {
      for (const spin of [['s1'], ['s2'], ['s1', 's2']] as Slot[][]) {
        const slots: Slot[] = [...spin, 'b']
        for (const c of contractions(slots.length)) out.push({ ordering, chain, slots, pairs: c.pairs, eps: c.eps })
      }
    }
  return out
}

/** Hermitian conjugate: direct structures are Hermitian; exchanged ones swap their two bilinears' σ and chain. */
export function daggerField(s: FieldStructure): FieldStructure {
  if (s.ordering === 'direct') return s
  const swap = (k: Slot): Slot => (k === 's1' ? 's2' : k === 's2' ? 's1' : k)
  return { ...s, chain: s.chain === 1 ? 2 : 1, slots: s.slots.map(swap) }
}

/**
 * Hermitian, T-even (B and each σ are T-odd) and, when imposed, C-even candidates, each with
 * the factor i it carries. Real coefficients throughout.
 */
export function fieldCandidates(colorN: number, timeReversal: boolean, chargeConjugation: boolean): Array<{ combo: FieldCombo; imaginary: boolean }> {
  const out: Array<{ combo: FieldCombo; imaginary: boolean }> = []
  for (const s of fieldStructures(colorN)) {
    const tSign = s.slots.length % 2 === 0 ? 1 : -1 // σ's and B, each T-odd
    for (const imaginary of [false, true]) {
      if (timeReversal && imaginary !== tSign < 0) continue
      const herm: FieldCombo = [
        { coef: 1, s, conj: false },
        { coef: imaginary ? -1 : 1, s: daggerField(s), conj: false },
      ]
      const combo = chargeConjugation ? [...herm, ...herm.map((t) => ({ ...t, conj: true }))] : herm
      out.push({ combo, imaginary })
    }
  }
  return out
}

function latexOf(s: FieldStructure, p: string, a: string, colorN: number): string {
  const lab = new Array<string>(s.slots.length).fill('?')
  let next = 0
  const L = 'ijk'
  if (s.eps) for (const x of s.eps) lab[x] = L[next++]!
  for (const [x, y] of s.pairs) {
    lab[x] = L[next]!
    lab[y] = L[next++]!
  }
  const at = (k: Slot) => {
    const j = s.slots.indexOf(k)
    return j < 0 ? '' : ` \\sigma^{${lab[j]}}`
  }
  const B = ` B^{${lab[s.slots.indexOf('b')]}}`
  const [P, A] = [fieldTex(p), fieldTex(a)]
  const legs =
    s.ordering === 'direct'
      ? [
          [`${P}^\\dagger`, P],
          [`${A}^\\dagger`, A],
        ]
      : [
          [`${P}^\\dagger`, A],
          [`${A}^\\dagger`, P],
        ]
  const bil = (i: 0 | 1) => `(${legs[i]![0]}${at(i === 0 ? 's1' : 's2')}${s.chain === i + 1 || (colorN === 1 && i === 0) ? B : ''} ${legs[i]![1]})`
  return `${s.eps ? `\\epsilon^{${s.eps.map((x) => lab[x]).join('')}}\\,` : ''}${bil(0)}${bil(1)}`
}

/**
 * The four-fermion operators with one field strength at 1/m⁴, as a basis.
 * @example enumerateFourField(1, 'psi', 'chi').basis.length // 1: (ψ†σ·Bχ)(χ†ψ) + h.c. in QED
 */
export function enumerateFourField(
  colorN: number,
  particle: string,
  anti: string,
  opts: { timeReversal?: boolean; chargeConjugation?: boolean; signal?: CancelFlag } = {},
): { basis: HeavyOperator[]; combos: FieldCombo[] } {
  const cands = fieldCandidates(colorN, opts.timeReversal !== false, opts.chargeConjugation !== false)
  const { basis } = contactRank(
    {
      size: cands.length,
      sample: (F, rng) => sampleFieldPoint(F, rng, colorN),
      values: (F, x) => cands.map((c) => fieldComboValue(F, c.combo, x)),
    },
    { signal: opts.signal, label: 'four-fermion operators with a field strength' },
  )
  return {
    combos: basis.map((b) => cands[b]!.combo),
    basis: basis.map((b, i): HeavyOperator => {
      const c = cands[b]!
      const main = latexOf(c.combo[0]!.s, particle, anti, colorN)
      return {
        id: `ffB4.${i + 1}`,
        order: 4,
        sector: 'fourFermion',
        latex: `${c.imaginary ? 'i' : ''}\\left[${main} + \\mathrm{h.c.}${opts.chargeConjugation !== false ? ' + \\mathrm{C}' : ''}\\right]/m^{4}`,
        terms: [{ [particle]: 1, [`${particle}*`]: 1, [anti]: 1, [`${anti}*`]: 1, B: 1, ...(c.combo[0]!.s.slots.length > 1 ? { sigma: c.combo[0]!.s.slots.length - 1 } : {}) }],
        antiHermitian: c.imaginary,
        relations: [],
      }
    }),
  }
}
