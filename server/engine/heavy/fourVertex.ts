/**
 * The tree-level contact vertex of a four-fermion operator, evaluated over F_p (p ≡ 1 mod 4,
 * so that i = √−1 and σ_y exist): external two-component spinors u_L, colour wave-functions
 * c_L and ∂-eigenvalues k_L of the four legs (0 = ψ†, 1 = ψ, 2 = χ†, 3 = χ).
 *
 * Integration by parts is built in: k_0 + k_1 + k_2 + k_3 = 0 (a total derivative has a
 * vanishing vertex). The heavy-field EOM at leading order, iD_t ψ = 0, puts every leg's energy
 * on shell at zero, so time derivatives never appear (operators with D_t are dropped).
 * Gauge fields are absent at this vertex: operators that differ by a field strength
 * ([D_i, D_j] = −igε_ijk B_k) are identified — they belong to the four-fermion-plus-gauge-field
 * sector, which is not enumerated here.
 */
import type { PrimeField, SeededRandom } from '../finite'
import { levi } from './algebra'
import type { FourCombo, FourStructure } from './fourStructure'

export interface FourPoint {
  /** Spinors of the legs (for ψ†, χ† the conjugate spinor, as a plain vector). */
  u: number[][]
  /** ∂-eigenvalues (x, y, z) of the legs, summing to zero. */
  k: number[][]
  /** Colour wave-functions of the legs (length N). */
  c: number[][]
}

/**
 * Draw a random point; `restFrame` sets the incoming pair (ψ, χ†) and the outgoing pair
 * (ψ†, χ) at rest: k_1 + k_2 = 0 = k_0 + k_3.
 */
export function randomFourPoint(F: PrimeField, rng: SeededRandom, colorN: number, restFrame = false): FourPoint {
  const vec = (n: number): number[] => Array.from({ length: n }, () => rng.nonZero(F.p))
  const neg = (v: number[]): number[] => v.map((x) => F.neg(x))
  const k0 = vec(3)
  const k1 = vec(3)
  const k2 = restFrame ? neg(k1) : vec(3)
  const k3 = restFrame ? neg(k0) : neg(k0.map((x, i) => F.add(F.add(x, k1[i]!), k2[i]!)))
  return { u: [vec(2), vec(2), vec(2), vec(2)], k: [k0, k1, k2, k3], c: [vec(colorN), vec(colorN), vec(colorN), vec(colorN)] }
}

/**
 * The charge-conjugate point: C(O) evaluated at X equals O evaluated at this point.
 * C: ψ → iσ₂χ*, χ → −iσ₂ψ* (Dirac field Ψ → iγ²Ψ*, Bjorken–Drell / Peskin & Schroeder §3.6),
 * which maps leg L to leg 3 − L, each spinor u to iσ₂u, and keeps the Grassmann sign (+).
 */
export function conjugatePoint(F: PrimeField, pt: FourPoint): FourPoint {
  const flip = (u: number[]): number[] => [u[1]!, F.neg(u[0]!)]
  return { u: [3, 2, 1, 0].map((l) => flip(pt.u[l]!)), k: [3, 2, 1, 0].map((l) => pt.k[l]!), c: [3, 2, 1, 0].map((l) => pt.c[l]!) }
}

/** Pauli matrices over F_p: index 0 = unit, 1..3 = σ_x, σ_y, σ_z (row-major 2×2). */
const PAULI = new Map<number, number[][]>()
function pauli(F: PrimeField): number[][] {
  const hit = PAULI.get(F.p)
  if (hit) return hit
  const i = F.sqrtMinusOne()
  const m = [
    [1, 0, 0, 1],
    [0, 1, 1, 0],
    [0, F.neg(i), i, 0],
    [1, 0, 0, F.p - 1],
  ]
  PAULI.set(F.p, m)
  return m
}

const BILINEAR_LEGS: Record<FourStructure['ordering'], [[number, number], [number, number]]> = {
  direct: [
    [0, 1],
    [2, 3],
  ],
  exchanged: [
    [0, 3],
    [2, 1],
  ],
}

function dot(F: PrimeField, a: number[], b: number[]): number {
  let s = 0
  for (let i = 0; i < a.length; i++) s = F.add(s, F.mul(a[i]!, b[i]!))
  return s
}

/** Colour factor: 1⊗1 or Σ_A T^A⊗T^A = ½(δ_il δ_kj − δ_ij δ_kl / N) on the two bilinears. */
function colourFactor(F: PrimeField, s: FourStructure, c: number[][]): number {
  const [[a, b], [x, y]] = BILINEAR_LEGS[s.ordering]
  const same = F.mul(dot(F, c[a]!, c[b]!), dot(F, c[x]!, c[y]!))
  if (s.colour === 'singlet') return same
  const crossed = F.mul(dot(F, c[a]!, c[y]!), dot(F, c[x]!, c[b]!))
  const n = c[0]!.length
  return F.mul(F.inv(2), F.sub(crossed, F.div(same, n)))
}

/** Per-point cache: bilinear values u_out^T Γ u_in for Γ ∈ {1, σ_x, σ_y, σ_z}. */
export interface PointTables {
  spin: Record<FourStructure['ordering'], number[][]>
}

export function pointTables(F: PrimeField, pt: FourPoint): PointTables {
  const sig = pauli(F)
  const bil = (o: number, i: number): number[] =>
    sig.map((m) => {
      const [a, b] = pt.u[o]!
      const [c, d] = pt.u[i]!
      return F.add(F.mul(a!, F.add(F.mul(m[0]!, c!), F.mul(m[1]!, d!))), F.mul(b!, F.add(F.mul(m[2]!, c!), F.mul(m[3]!, d!))))
    })
  const spin = {} as PointTables['spin']
  for (const o of ['direct', 'exchanged'] as const) spin[o] = BILINEAR_LEGS[o].map(([x, y]) => bil(x, y))
  return { spin }
}

/** Index assignments of the slots: [values (1..3), weight ±1]. */
function assignments(s: FourStructure): Array<[number[], number]> {
  let out: Array<[number[], number]> = [[new Array<number>(s.slots.length).fill(0), 1]]
  for (const [a, b] of s.pairs) {
    out = out.flatMap(([v, w]) =>
      [1, 2, 3].map((i): [number[], number] => {
        const x = v.slice()
        x[a] = i
        x[b] = i
        return [x, w]
      }),
    )
  }
  if (s.eps) {
    const [a, b, c] = s.eps
    out = out.flatMap(([v, w]) => {
      const r: Array<[number[], number]> = []
      for (const p of [
        [1, 2, 3],
        [2, 3, 1],
        [3, 1, 2],
        [2, 1, 3],
        [1, 3, 2],
        [3, 2, 1],
      ]) {
        const x = v.slice()
        x[a] = p[0]!
        x[b] = p[1]!
        x[c] = p[2]!
        r.push([x, w * levi(p[0]!, p[1]!, p[2]!)])
      }
      return r
    })
  }
  return out
}

/**
 * Vertex of one structure at a point (times −1 for the exchanged ordering: moving the
 * Grassmann fields ψ†χχ†ψ into the order ψ†ψχ†χ is an odd permutation).
 * @example evalFour(F, parseFour('s1_i s2_i'), pt, tables) // Σ_i (u0ᵀσ_i u1)(u2ᵀσ_i u3)·(c0·c1)(c2·c3)
 * Method: explicit index sums. Reference: common practice (Feynman rules of contact operators).
 */
export function evalFour(F: PrimeField, s: FourStructure, pt: FourPoint, tables: PointTables): number {
  const spin = tables.spin[s.ordering]
  let total = 0
  for (const [v, w] of assignments(s)) {
    let g1 = 0
    let g2 = 0
    let mom = 1
    s.slots.forEach((slot, i) => {
      if (slot.kind === 's1') g1 = v[i]!
      else if (slot.kind === 's2') g2 = v[i]!
      else mom = F.mul(mom, pt.k[slot.leg]![v[i]! - 1]!)
    })
    const term = F.mul(F.mul(spin[0]![g1]!, spin[1]![g2]!), mom)
    total = w > 0 ? F.add(total, term) : F.sub(total, term)
  }
  const sign = s.ordering === 'exchanged' ? F.p - 1 : 1
  return F.mul(F.mul(total, colourFactor(F, s, pt.c)), sign)
}

/** Vertex of a combination at a point. */
export function evalFourCombo(F: PrimeField, c: FourCombo, pt: FourPoint, tables: PointTables): number {
  let total = 0
  for (const { coef, s } of c) total = F.add(total, F.mul(F.from(coef), evalFour(F, s, pt, tables)))
  return total
}
