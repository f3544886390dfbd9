/**
 * Tensor products and symmetric / alternating powers of SU(n) irreps.
 */
import { EngineInputError } from '../errors'
import type { Dynkin } from './types'
import { addSigned, reflectToDominant } from './decompose'
import { checkDynkin } from './labels'
import { plethysm, type PlethysmOptions } from './plethysm'
import { suDimension, suWeights } from './weights'

/**
 * Irreps in a ⊗ b (Dynkin key -> multiplicity).
 * @example tensorProduct(3, [1, 0], [0, 1]) // Map { "1,1" => 1, "0,0" => 1 } (3 ⊗ 3̄ = 8 + 1)
 * Method: Racah–Speiser: for every weight μ of the smaller irrep, reflect μ + b + ρ into the
 * dominant chamber and add the sign to the irrep reached (walls contribute nothing).
 * Reference: Fulton & Harris, Representation Theory, exercise 25.33 (Brauer / Klimyk).
 */
export function tensorProduct(n: number, a: Dynkin, b: Dynkin): Map<string, number> {
  checkDynkin('tensorProduct', n, a)
  checkDynkin('tensorProduct', n, b)
  let small = a
  let big = b
  if (suDimension(n, a) > suDimension(n, b)) [small, big] = [b, a]
  const out = new Map<string, number>()
  for (const [key, m] of suWeights(n, small)) {
    const mu = key.split(',').map(Number)
    const r = reflectToDominant(mu, big)
    if (!r) continue
    addSigned(out, r.dynkin.join(','), r.sign * m)
  }
  return out
}

function checkPower(fn: string, k: number): void {
  if (!Number.isSafeInteger(k) || k < 0) throw new EngineInputError(fn, `The power must be a whole number, 0 or more, not ${k}`)
}

/**
 * Irreps in Sym^k(V_a). Sym^0 is the singlet.
 * @example symmetricPower(2, [1], 3) // Map { "3" => 1 }
 * Reference: Fulton & Harris, §6.1 (Sym^k = S_{(k)}).
 */
export function symmetricPower(n: number, a: Dynkin, k: number, opts?: PlethysmOptions): Map<string, number> {
  checkDynkin('symmetricPower', n, a)
  checkPower('symmetricPower', k)
  if (k === 0) return new Map([[new Array<number>(n - 1).fill(0).join(','), 1]])
  return plethysm(n, a, [k], opts)
}

/**
 * Irreps in Λ^k(V_a) (empty when k > dim V_a). Λ^0 is the singlet.
 * @example alternatingPower(4, [1, 0, 0], 2) // Map { "0,1,0" => 1 } (the 6 of SU(4))
 * Reference: Fulton & Harris, §6.1 (Λ^k = S_{(1^k)}).
 */
export function alternatingPower(n: number, a: Dynkin, k: number, opts?: PlethysmOptions): Map<string, number> {
  checkDynkin('alternatingPower', n, a)
  checkPower('alternatingPower', k)
  if (k === 0) return new Map([[new Array<number>(n - 1).fill(0).join(','), 1]])
  return plethysm(n, a, new Array<number>(k).fill(1), opts)
}
