/**
 * Exact Lorentz invariants of the electromagnetic field from E and B (rational components).
 * Conventions: metric diag(+1,−1,−1,−1); A^μ = (φ, A), E = −∇φ − ∂_t A, B = ∇×A;
 * F^{μν} = ∂^μA^ν − ∂^νA^μ, so F^{0i} = −E^i and F^{ij} = −ε^{ijk} B^k;
 * F̃^{μν} = ½ ε^{μνρσ} F_{ρσ} with ε^{0123} = +1. Then F_{μν}F^{μν} = 2(B² − E²) and
 * F_{μν}F̃^{μν} = −4 E·B (with ε^{0123} = −1, as in Peskin & Schroeder, the sign of F F̃ flips).
 */
import { add, mul, neg, rat, sub, ZERO, type Rational } from '../exact/rational'

export type Vec3 = readonly [Rational, Rational, Rational]
export type Tensor4 = Rational[][]

const METRIC = [1, -1, -1, -1]

/** ε^{ijk} (indices 0..2) and ε^{μνρσ} (0..3) by permutation parity; 0 on repeats. @example levi(1, 0, 2, 3) // -1 */
export function levi(...idx: number[]): number {
  if (new Set(idx).size !== idx.length) return 0
  let sign = 1
  for (let i = 0; i < idx.length; i++) for (let j = i + 1; j < idx.length; j++) if (idx[i]! > idx[j]!) sign = -sign
  return sign
}

/** Euclidean dot product of 3-vectors. @example dot([1,2,3], [4,5,6]) // 32 (as rationals) */
export function dot(a: Vec3, b: Vec3): Rational {
  return add(add(mul(a[0], b[0]), mul(a[1], b[1])), mul(a[2], b[2]))
}

/** F^{μν} (upper indices) from E and B, in the conventions of this file. @example fieldStrengthUpper(E, B)[0][1] // −E_x */
export function fieldStrengthUpper(E: Vec3, B: Vec3): Tensor4 {
  const F: Tensor4 = Array.from({ length: 4 }, () => Array.from({ length: 4 }, () => ZERO))
  for (let i = 0; i < 3; i++) {
    F[0]![i + 1] = neg(E[i]!)
    F[i + 1]![0] = E[i]!
    for (let j = 0; j < 3; j++) {
      let s = ZERO
      for (let k = 0; k < 3; k++) s = sub(s, mul(rat(levi(i, j, k)), B[k]!))
      F[i + 1]![j + 1] = s
    }
  }
  return F
}

/** Lower both indices with the metric diag(+1,−1,−1,−1). @example lowerBoth(F)[0][1] // −F^{01} = E_x */
export function lowerBoth(F: Tensor4): Tensor4 {
  return F.map((row, m) => row.map((x, n) => mul(x, rat(METRIC[m]! * METRIC[n]!))))
}

/** F̃^{μν} = ½ ε^{μνρσ} F_{ρσ} with ε^{0123} = +1. @example dualUpper(F)[0][1] // −B_x (F̃ swaps E → B, B → −E) */
export function dualUpper(F: Tensor4): Tensor4 {
  const Fl = lowerBoth(F)
  return F.map((_, m) =>
    F.map((__, n) => {
      let s = ZERO
      for (let r = 0; r < 4; r++)
        for (let t = 0; t < 4; t++) {
          const e = levi(m, n, r, t)
          if (e !== 0) s = add(s, mul(rat(e, 2), Fl[r]![t]!))
        }
      return s
    }),
  )
}

/** Full contraction X_{μν} Y^{μν} of two upper-index tensors (X lowered with the metric). @example contract(F, F) // 2(B² − E²) */
export function contract(X: Tensor4, Y: Tensor4): Rational {
  const Xl = lowerBoth(X)
  let s = ZERO
  for (let m = 0; m < 4; m++) for (let n = 0; n < 4; n++) s = add(s, mul(Xl[m]![n]!, Y[m]![n]!))
  return s
}

/** The invariants used by the matching library, all computed exactly. */
export interface FieldInvariants {
  E2minusB2: Rational
  EdotB: Rational
  FF: Rational
  FFdual: Rational
}
export type InvariantKey = keyof FieldInvariants

/**
 * E² − B², E·B, F_{μν}F^{μν} and F_{μν}F̃^{μν} at given E, B; FF and FF̃ by explicit tensor contraction.
 * @example fieldInvariants([1,0,0], [0,1,0]) // FF = 0, FFdual = 0 (as rationals)
 * Method: build F^{μν}, lower indices, contract with itself and with its dual.
 * Reference: J. D. Jackson, Classical Electrodynamics, 3rd ed. (1999), §11.9 (field-strength tensor and dual).
 */
export function fieldInvariants(E: Vec3, B: Vec3): FieldInvariants {
  const F = fieldStrengthUpper(E, B)
  return { E2minusB2: sub(dot(E, E), dot(B, B)), EdotB: dot(E, B), FF: contract(F, F), FFdual: contract(F, dualUpper(F)) }
}
