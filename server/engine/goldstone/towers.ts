/**
 * Lorentz content of the building blocks of a Goldstone-frame Lagrangian, derivative by
 * derivative ("towers"), as characters of the Euclidean Lorentz group O(4).
 *
 * q counts chiral order (a derivative and l_μ, r_μ count p¹; χ_± and f_±μν count p²).
 * SO(4) = SU(2)_l × SU(2)_r; a weight is (m_l, m_r) = (2 j_z^l, 2 j_z^r), so the vector
 * (1/2, 1/2) has the weights (±1, ±1). The three towers (single-letter modules):
 *   goldstone  Σ_{k≥1} q^k (k/2, k/2)        u_μ and its symmetrized derivatives; traces removed
 *                                             by the equation of motion, antisymmetric parts are f_−
 *                                             (Maurer–Cartan) and commutators of ∇ are curvature.
 *              = (1 − q²) P − 1
 *   source     q² P                           χ_± off shell: every symmetrized derivative.
 *   strength   P (q² Λ²V − q³ Λ³V + q⁴ Λ⁴V)   f_±μν off shell, Bianchi identities removed.
 * P = 1/det(1 − q g) on the vector (the momentum generating function). The exterior-power form
 * of the strength tower is the polynomial de Rham complex (closed 2-forms = field strengths).
 *
 * For the parity-odd component O(4)⁻ an element T has the eigenvalues {z, 1/z, 1, −1} on the
 * vector; traces of T on each tower follow from the same formulas with det(1 − qT) =
 * (1 − q²)(1 − qz)(1 − q/z) and the elementary symmetric functions e2 = 0, e3 = −(z + 1/z),
 * e4 = −1 of those eigenvalues (these are traces of honest O(4) tensors, so ε^{μνρσ} counts −1).
 * Reference: Henning, Lu, Melia, Murayama, "Operator bases, S-matrices, and their partition
 * functions", JHEP 10 (2017) 199, sect. 2–3 and 5 (parity through O(4)); Graf, Henning, Lu,
 * Melia, Murayama, JHEP 01 (2021) 142 (the chiral Lagrangian's building blocks).
 */
import { EngineInputError } from '../errors'

export type TowerKind = 'goldstone' | 'source' | 'strength'

export const TOWER_KINDS: readonly TowerKind[] = ['goldstone', 'source', 'strength']

/** Lowest chiral order of one letter of the tower. */
export const TOWER_ORDER: Record<TowerKind, number> = { goldstone: 1, source: 2, strength: 2 }

/** A term c · q^d x^{ml} y^{mr} of an SO(4) character. */
export interface WeightTerm {
  d: number
  ml: number
  mr: number
  c: number
}

/** A term c · q^d z^m of a character on O(4)⁻. */
export interface TwistedTerm {
  d: number
  m: number
  c: number
}

/** Highest chiral order the towers are expanded to. */
export const MAX_TOWER_ORDER = 24

const untwistedCache = new Map<string, WeightTerm[]>()
const twistedCache = new Map<string, TwistedTerm[]>()

function checkOrder(fn: string, K: number): void {
  if (!Number.isInteger(K) || K < 0 || K > MAX_TOWER_ORDER) {
    throw new EngineInputError(fn, `the highest chiral order must be an integer from 0 to ${MAX_TOWER_ORDER}, got ${K}`)
  }
}

/** Dense (d, ml, mr) array with |ml|, |mr| <= d, used only to expand the towers once. */
class Dense3 {
  readonly w: number
  readonly data: Float64Array
  constructor(readonly K: number) {
    this.w = K + 2
    const side = 2 * this.w + 1
    this.data = new Float64Array((K + 1) * side * side)
  }
  at(d: number, ml: number, mr: number): number {
    const side = 2 * this.w + 1
    return (d * side + ml + this.w) * side + mr + this.w
  }
  add(d: number, ml: number, mr: number, v: number): void {
    if (d > this.K || Math.abs(ml) > this.w || Math.abs(mr) > this.w) return
    this.data[this.at(d, ml, mr)]! += v
  }
  terms(): WeightTerm[] {
    const out: WeightTerm[] = []
    for (let d = 0; d <= this.K; d++) {
      for (let ml = -this.w; ml <= this.w; ml++) {
        for (let mr = -this.w; mr <= this.w; mr++) {
          const c = this.data[this.at(d, ml, mr)]!
          if (c !== 0) out.push({ d, ml, mr, c })
        }
      }
    }
    return out
  }
}

const VECTOR: readonly (readonly [number, number])[] = [
  [1, 1],
  [1, -1],
  [-1, 1],
  [-1, -1],
]

/** Weight terms of P = Π_vector 1/(1 − q x^{ml} y^{mr}) up to q^K. */
function momentumSeries(K: number): WeightTerm[] {
  let terms: WeightTerm[] = [{ d: 0, ml: 0, mr: 0, c: 1 }]
  for (const [a, b] of VECTOR) {
    const out = new Dense3(K)
    for (const t of terms) for (let k = 0; t.d + k <= K; k++) out.add(t.d + k, t.ml + k * a, t.mr + k * b, t.c)
    terms = out.terms()
  }
  return terms
}

function multiplyTerms(K: number, a: readonly WeightTerm[], b: readonly WeightTerm[]): WeightTerm[] {
  const out = new Dense3(K)
  for (const s of a) for (const t of b) out.add(s.d + t.d, s.ml + t.ml, s.mr + t.mr, s.c * t.c)
  return out.terms()
}

/** Weight terms of Λ²V, Λ³V = V, Λ⁴V = 1 at q^2, q^3, q^4 with the signs of the de Rham complex. */
const STRENGTH_NUMERATOR: readonly WeightTerm[] = [
  { d: 2, ml: 2, mr: 0, c: 1 },
  { d: 2, ml: 0, mr: 0, c: 2 },
  { d: 2, ml: -2, mr: 0, c: 1 },
  { d: 2, ml: 0, mr: 2, c: 1 },
  { d: 2, ml: 0, mr: -2, c: 1 },
  ...VECTOR.map(([ml, mr]) => ({ d: 3, ml, mr, c: -1 })),
  { d: 4, ml: 0, mr: 0, c: 1 },
]

/**
 * SO(4) character of a tower up to chiral order K, as weight terms.
 * @example towerCharacter('goldstone', 1) // the vector: four terms q x^{±1} y^{±1}
 */
export function towerCharacter(kind: TowerKind, K: number): readonly WeightTerm[] {
  checkOrder('towerCharacter', K)
  const key = `${kind}|${K}`
  const hit = untwistedCache.get(key)
  if (hit) return hit
  const P = momentumSeries(K)
  let terms: WeightTerm[]
  if (kind === 'source') terms = P.filter((t) => t.d + 2 <= K).map((t) => ({ ...t, d: t.d + 2 }))
  else if (kind === 'strength') terms = multiplyTerms(K, P, STRENGTH_NUMERATOR)
  else {
    const out = new Dense3(K)
    for (const t of P) {
      if (t.d >= 1) out.add(t.d, t.ml, t.mr, t.c)
      out.add(t.d + 2, t.ml, t.mr, -t.c)
    }
    terms = out.terms()
  }
  untwistedCache.set(key, terms)
  return terms
}

/** Dense (d, m) array for the one-variable characters of O(4)⁻. */
class Dense2 {
  readonly w: number
  readonly data: Float64Array
  constructor(readonly K: number) {
    this.w = K + 2
    this.data = new Float64Array((K + 1) * (2 * this.w + 1))
  }
  add(d: number, m: number, v: number): void {
    if (d > this.K || Math.abs(m) > this.w) return
    this.data[d * (2 * this.w + 1) + m + this.w]! += v
  }
  terms(): TwistedTerm[] {
    const out: TwistedTerm[] = []
    const side = 2 * this.w + 1
    for (let d = 0; d <= this.K; d++) {
      for (let m = -this.w; m <= this.w; m++) {
        const c = this.data[d * side + m + this.w]!
        if (c !== 0) out.push({ d, m, c })
      }
    }
    return out
  }
}

/** 1/((1 − qz)(1 − q/z)) = Σ_k q^k χ_{k/2}(z) up to q^K. */
function su2Series(K: number): TwistedTerm[] {
  const out: TwistedTerm[] = []
  for (let k = 0; k <= K; k++) for (let m = -k; m <= k; m += 2) out.push({ d: k, m, c: 1 })
  return out
}

function multiplyTwisted(K: number, a: readonly TwistedTerm[], b: readonly TwistedTerm[]): TwistedTerm[] {
  const out = new Dense2(K)
  for (const s of a) for (const t of b) out.add(s.d + t.d, s.m + t.m, s.c * t.c)
  return out.terms()
}

/**
 * Trace of the parity-odd element T (eigenvalues z, 1/z, 1, −1 on the vector) on a tower, up to q^K.
 * @example twistedTowerCharacter('strength', 3) // q³(z + 1/z): only the divergence ∂^μ F_μν (a vector) is fixed
 */
export function twistedTowerCharacter(kind: TowerKind, K: number): readonly TwistedTerm[] {
  checkOrder('twistedTowerCharacter', K)
  const key = `${kind}|${K}`
  const hit = twistedCache.get(key)
  if (hit) return hit
  const rotation = su2Series(K)
  const evenPowers: TwistedTerm[] = []
  for (let k = 0; 2 * k <= K; k++) evenPowers.push({ d: 2 * k, m: 0, c: 1 })
  const Ptw = multiplyTwisted(K, rotation, evenPowers)
  let terms: TwistedTerm[]
  if (kind === 'goldstone') terms = rotation.filter((t) => t.d >= 1)
  else if (kind === 'source') terms = Ptw.filter((t) => t.d + 2 <= K).map((t) => ({ ...t, d: t.d + 2 }))
  else
    terms = multiplyTwisted(K, Ptw, [
      { d: 3, m: 1, c: 1 },
      { d: 3, m: -1, c: 1 },
      { d: 4, m: 0, c: -1 },
    ])
  twistedCache.set(key, terms)
  return terms
}
