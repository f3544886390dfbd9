/**
 * The Lorentz group through its complexified algebra: SU(2)_l × SU(2)_r. An irrep (j_l, j_r)
 * is written by its SU(2) Dynkin labels [2 j_l] and [2 j_r]; a left-handed Weyl fermion is
 * (1/2, 0) = [1];[0], a right-handed one (0, 1/2), F_L = (1, 0), F_R = (0, 1), a vector
 * (1/2, 1/2). Weight keys of Lorentz characters are "2m_l;2m_r" (see productGroup.ts).
 * Complex conjugation swaps the two factors: (j_l, j_r)* = (j_r, j_l).
 * Reference: Weinberg, The Quantum Theory of Fields I (CUP 1995), §5.6.
 */
import { EngineInputError } from '../errors'
import type { Character } from './types'
import { type Rational, parseRational, rat, mul, isInteger } from '../exact/rational'
import { decomposeProduct, productCharacter, productSingletCount } from './productGroup'
import { tensorProduct } from './products'
import { suWeights } from './weights'

/** A Lorentz irrep as [2 j_l, 2 j_r]. */
export type LorentzIrrep = readonly [number, number]

/** Standard Lorentz irreps of the species (theory/model.ts: scalar, Weyl fermions) and field-strength halves. */
export const LORENTZ_IRREPS = {
  S: [0, 0],
  L: [1, 0],
  R: [0, 1],
  FL: [2, 0],
  FR: [0, 2],
  V: [1, 1],
} as const satisfies Record<string, LorentzIrrep>

/** Largest 2j accepted for either SU(2) factor (spin 20). */
export const MAX_TWO_SPIN = 40

function checkIrrep(fn: string, irrep: LorentzIrrep): void {
  const ok = Array.isArray(irrep) && irrep.length === 2 && irrep.every((x) => Number.isSafeInteger(x) && x >= 0 && x <= MAX_TWO_SPIN)
  if (!ok) throw new EngineInputError(fn, `A Lorentz representation is written [2j_L, 2j_R] with whole numbers from 0 to ${MAX_TWO_SPIN}, but it is ${JSON.stringify(irrep)}`)
}

function twoSpin(fn: string, j: string | number): number {
  const r: Rational = typeof j === 'number' ? (Number.isSafeInteger(2 * j) ? rat(2 * j, 2) : rat(-1)) : parseRational(String(j))
  const two = mul(r, rat(2))
  if (!isInteger(two) || two.num < 0n || two.num > BigInt(MAX_TWO_SPIN)) {
    throw new EngineInputError(fn, `A spin must be a multiple of 1/2 from 0 to ${MAX_TWO_SPIN / 2}, but it is ${j}`)
  }
  return Number(two.num)
}

/**
 * Lorentz irrep from spins: lorentzIrrep("1/2", 0) -> [1, 0].
 * @example lorentzIrrep('1/2', '1/2') // [1, 1] (the vector)
 */
export function lorentzIrrep(jl: string | number, jr: string | number): LorentzIrrep {
  return [twoSpin('lorentzIrrep', jl), twoSpin('lorentzIrrep', jr)]
}

/** Dimension (2j_l + 1)(2j_r + 1). @example lorentzDimension([1, 1]) // 4 */
export function lorentzDimension(irrep: LorentzIrrep): number {
  checkIrrep('lorentzDimension', irrep)
  return (irrep[0] + 1) * (irrep[1] + 1)
}

/** Complex conjugate (j_r, j_l). @example lorentzConjugate([1, 0]) // [0, 1] */
export function lorentzConjugate(irrep: LorentzIrrep): LorentzIrrep {
  checkIrrep('lorentzConjugate', irrep)
  return [irrep[1], irrep[0]]
}

/**
 * Character of a Lorentz irrep, keys "2m_l;2m_r".
 * @example lorentzWeights([1, 0]) // Map { "1;0" => 1, "-1;0" => 1 }
 */
export function lorentzWeights(irrep: LorentzIrrep): Character {
  checkIrrep('lorentzWeights', irrep)
  return productCharacter([suWeights(2, [irrep[0]]), suWeights(2, [irrep[1]])])
}

/**
 * Lorentz irreps in a ⊗ b, keys "2j_l;2j_r" (Clebsch–Gordan in each factor).
 * @example lorentzTensorProduct([1, 0], [0, 1]) // Map { "1;1" => 1 }
 */
export function lorentzTensorProduct(a: LorentzIrrep, b: LorentzIrrep): Map<string, number> {
  checkIrrep('lorentzTensorProduct', a)
  checkIrrep('lorentzTensorProduct', b)
  const out = new Map<string, number>()
  for (const [kl, ml] of tensorProduct(2, [a[0]], [b[0]])) {
    for (const [kr, mr] of tensorProduct(2, [a[1]], [b[1]])) out.set(`${kl};${kr}`, ml * mr)
  }
  return out
}

/** Lorentz irreps of a Lorentz character ("2m_l;2m_r" keys), keys "2j_l;2j_r". */
export function lorentzDecompose(ch: Character): Map<string, number> {
  return decomposeProduct([2, 2], ch)
}

/** Number of Lorentz scalars in a Lorentz character. */
export function lorentzSingletCount(ch: Character): number {
  return productSingletCount([2, 2], ch)
}
