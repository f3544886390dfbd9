/**
 * Invariants of SU(n) irreps: conjugate, reality, Casimir, Dynkin index, cubic anomaly.
 * Normalisations (physics): C2(fund) = (n^2-1)/(2n), T(fund) = 1/2, A(fund) = 1.
 */
import type { Dynkin } from './types'
import { checkDynkin, dynkinToPartition } from './labels'
import { suDimension, suWeights } from './weights'
import { type Rational, ZERO, div, mul, rat, sub } from '../exact/rational'
import { irrepReality } from '../../../shared/physics/suIrrep'

/**
 * Conjugate irrep: the Dynkin labels reversed.
 * @example suConjugate(3, [1, 0]) // [0, 1]
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, §4 (conjugation = Dynkin diagram reflection).
 */
export function suConjugate(n: number, dynkin: Dynkin): number[] {
  checkDynkin('suConjugate', n, dynkin)
  return [...dynkin].reverse()
}

/**
 * Reality of an SU(n) irrep: 'complex' unless self-conjugate (palindromic labels); a
 * self-conjugate irrep is pseudoreal iff the Frobenius–Schur exponent Σ_i i(n-i) a_i is odd,
 * i.e. iff n ≡ 2 (mod 4) and the middle label a_{n/2} is odd.
 * @example suReality(2, [1]) // 'pseudoreal'
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, §4 and Table 11; Bourbaki, Lie VIII §7 ex. 5.
 */
export function suReality(n: number, dynkin: Dynkin): 'real' | 'pseudoreal' | 'complex' {
  checkDynkin('suReality', n, dynkin)
  return irrepReality(n, dynkin)
}

/**
 * Quadratic Casimir C2(R) = (λ, λ + 2ρ)/2 in the normalisation C2(fund) = (n^2-1)/(2n).
 * In partition form: C2 = ½ [Σ_i λ_i(λ_i - 2i + n + 1) - |λ|^2/n].
 * @example suCasimir(3, [1, 1]) // 3 (the adjoint: C2 = n)
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, eq. (4.14) (index = dim·C2/dim G).
 */
export function suCasimir(n: number, dynkin: Dynkin): Rational {
  checkDynkin('suCasimir', n, dynkin)
  const lambda = dynkinToPartition(dynkin)
  let s = 0n
  let size = 0n
  lambda.forEach((l, i) => {
    const li = BigInt(l)
    s += li * (li - 2n * BigInt(i + 1) + BigInt(n) + 1n)
    size += li
  })
  return div(sub(rat(s), rat(size * size, n)), rat(2))
}

/**
 * Dynkin index T(R) = dim(R) C2(R) / (n^2 - 1), with T(fund) = 1/2 (T(adj) = n).
 * @example suIndex(5, [0, 1, 0, 0]) // 3/2
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, eq. (4.14) and Table 30 (there l = 2T).
 */
export function suIndex(n: number, dynkin: Dynkin): Rational {
  checkDynkin('suIndex', n, dynkin)
  return div(mul(rat(suDimension(n, dynkin)), suCasimir(n, dynkin)), rat(n * n - 1))
}

/**
 * Cubic anomaly coefficient A(R), defined by tr_R(X^3) = A(R) tr_fund(X^3); A(fund) = 1,
 * A(conjugate) = -A, real irreps 0, and A = 0 for every irrep of SU(2).
 * @example suCubicAnomaly(5, [0, 1, 0, 0]) // 1 (the 10 of SU(5): n - 4)
 * Method: evaluate tr_R(H^3) over the weights for H = diag(1, 1, -2, 0, ...) (tr_fund H^3 = -6).
 * Reference: Banks & Georgi, Phys. Rev. D 14 (1976) 1159; Okubo, Phys. Rev. D 16 (1977) 3528.
 */
export function suCubicAnomaly(n: number, dynkin: Dynkin): Rational {
  checkDynkin('suCubicAnomaly', n, dynkin)
  if (n === 2) return ZERO
  let total = 0n
  for (const [key, m] of suWeights(n, dynkin)) {
    const a = key.split(',').map(Number)
    // ε-coordinates e_i = a_i + ... + a_{n-1}; H·e = e_1 + e_2 - 2 e_3 (shift-invariant).
    const e3 = a.slice(2).reduce((x, y) => x + y, 0)
    const e2 = e3 + a[1]!
    const e1 = e2 + a[0]!
    const h = BigInt(e1 + e2 - 2 * e3)
    total += BigInt(m) * h * h * h
  }
  return rat(total, -6)
}
