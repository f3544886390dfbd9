/**
 * Decomposition of SU(n) characters into irreps (Brauer–Klimyk / Racah–Speiser).
 *
 * For a weight μ (Dynkin basis) take its ε-coordinates e_i = μ_i + ... + μ_{n-1} (e_n = 0) and
 * add ρ = (n-1, ..., 1, 0). The Weyl group S_n permutes coordinates: if two coordinates of
 * e + ρ coincide, μ contributes nothing; otherwise sorting e + ρ decreasingly by a
 * permutation w gives v, and μ contributes sign(w) to the irrep with Dynkin labels
 * a_i = v_i - v_{i+1} - 1. Summing over all weights gives the (signed) multiplicities.
 * Reference: Fulton & Harris, Representation Theory, §24.1 (Weyl character formula) and
 * exercise 24.9 (Brauer's formula); Klimyk, Amer. Math. Soc. Transl. 76 (1968) 63.
 */
import { EngineInputError } from '../errors'
import type { Character } from './types'
import { checkN, parseWeightKey } from './labels'

export interface Reflected {
  sign: number
  dynkin: number[]
}

/**
 * Reflect μ + ρ (μ given in Dynkin labels, plus an optional highest weight `shift`) into the
 * dominant chamber: null if it lies on a wall, else the sign and the irrep label.
 * @example reflectToDominant([-2], null) // { sign: -1, dynkin: [0] } (SU(2))
 */
export function reflectToDominant(mu: ArrayLike<number>, shift: ArrayLike<number> | null): Reflected | null {
  const n = mu.length + 1
  const v = new Array<number>(n)
  v[n - 1] = 0
  for (let i = n - 2; i >= 0; i--) v[i] = v[i + 1]! + mu[i]! + (shift ? shift[i]! : 0) + 1
  let sign = 1
  for (let i = 1; i < n; i++) {
    const x = v[i]!
    let j = i - 1
    while (j >= 0 && v[j]! < x) {
      v[j + 1] = v[j]!
      j--
      sign = -sign
    }
    if (j >= 0 && v[j] === x) return null
    v[j + 1] = x
  }
  const dynkin = new Array<number>(n - 1)
  for (let i = 0; i < n - 1; i++) dynkin[i] = v[i]! - v[i + 1]! - 1
  return { sign, dynkin }
}

function checkedWeight(fn: string, n: number, key: string): Int32Array {
  const w = parseWeightKey(fn, key)
  if (w.length !== n - 1 || key.includes(';')) throw new EngineInputError(fn, `The weight "${key}" does not have the ${n - 1} labels of an SU(${n}) weight`)
  return w
}

/**
 * Irrep multiplicities of a character: Dynkin key -> multiplicity (non-zero entries only;
 * negative for virtual characters).
 * @example decomposeCharacter(2, characterProduct(suWeights(2,[1]), suWeights(2,[1]))) // {"2":1,"0":1}
 */
export function decomposeCharacter(n: number, ch: Character): Map<string, number> {
  checkN('decomposeCharacter', n)
  const out = new Map<string, number>()
  for (const [key, m] of ch) {
    const r = reflectToDominant(checkedWeight('decomposeCharacter', n, key), null)
    if (!r) continue
    addSigned(out, r.dynkin.join(','), r.sign * m)
  }
  return out
}

/** Add `delta` to the multiplicity of `key`, dropping entries that cancel to zero. */
export function addSigned(out: Map<string, number>, key: string, delta: number) {
  const v = (out.get(key) ?? 0) + delta
  if (v === 0) out.delete(key)
  else out.set(key, v)
}

/** Per-n caches (index n) of the singlet sign of each weight key. */
const singletSign: Array<Map<string, number>> = []

/**
 * Sign with which the SU(n) weight `key` contributes to the singlet count: ±1 or 0
 * (ε(w) if key + ρ = w(ρ), else 0). Cached per (n, key).
 * @example singletContribution(2, "-2") // -1
 */
export function singletContribution(n: number, key: string): number {
  const cache = (singletSign[n] ??= new Map<string, number>())
  const hit = cache.get(key)
  if (hit !== undefined) return hit
  const r = reflectToDominant(checkedWeight('singletCount', n, key), null)
  const s = r && r.dynkin.every((a) => a === 0) ? r.sign : 0
  if (cache.size > 2_000_000) cache.clear()
  cache.set(key, s)
  return s
}

/**
 * Number of singlets in a character (signed for virtual characters): Σ_μ m(μ) ε(w) over the
 * weights μ with μ + ρ = w(ρ). Cost: one cached lookup per weight, no full decomposition.
 * @example singletCount(3, characterProduct(suWeights(3,[1,1]), suWeights(3,[1,1]))) // 1
 */
export function singletCount(n: number, ch: Character): number {
  checkN('singletCount', n)
  let s = 0
  for (const [key, m] of ch) {
    const c = singletContribution(n, key)
    if (c !== 0) s += c * m
  }
  if (!Number.isSafeInteger(s)) {
    throw new EngineInputError('singletCount', `The number of singlets (${s}) is beyond exact arithmetic (a whole number below 2^53); lower the maximum dimension or the number of flavors`)
  }
  return s
}
