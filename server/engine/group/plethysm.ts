/**
 * Schur functors (plethysms) of SU(n) characters by the cycle index of S_k.
 */
import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../errors'
import type { Character, Dynkin, PlethysmOptions } from './types'
import { characterPower, characterProduct, trivialCharacter } from './character'
import { schurFunctorIrreps } from './brauer'
import { checkDynkin, checkN, fmt, parseWeightKey } from './labels'
import { classSize, factorial, partitionsOf, symmetricCharacter } from './symmetricGroup'
import { suWeights } from './weights'

export type { PlethysmOptions }

/** Largest k = |partition| accepted (p(12) = 77 cycle types). */
export const MAX_PLETHYSM_DEGREE = 12

function checkPartition(fn: string, partition: readonly number[]): number {
  const ok = Array.isArray(partition) && partition.length > 0 && partition.every((p, i) => Number.isSafeInteger(p) && p >= 1 && (i === 0 || p <= partition[i - 1]!))
  if (!ok) throw new EngineInputError(fn, `A partition must be a non-increasing list of positive whole numbers, but it is ${fmt(partition)}`)
  const k = partition.reduce((a, b) => a + b, 0)
  if (k > MAX_PLETHYSM_DEGREE) {
    throw new EngineInputError(fn, `The partition ${fmt(partition)} has size ${k}, above the limit ${MAX_PLETHYSM_DEGREE} (at most ${MAX_PLETHYSM_DEGREE} copies of one field are symmetrised)`)
  }
  return k
}

/**
 * Character of the Schur functor S_λ applied to a (possibly reducible) character χ of SU(n).
 * S_λ(χ) = Σ_{μ ⊢ k} χ^λ(μ)/z_μ Π_i ψ^{μ_i}(χ); λ = [k] is Sym^k, λ = [1,...,1] is Λ^k.
 * @example schurFunctorCharacter(2, suWeights(2, [1]), [2]) // weights of the triplet: {"2":1,"0":1,"-2":1}
 * Method: cycle index of S_k with Murnaghan–Nakayama characters; accumulated as k! S_λ(χ)
 * in bigint and divided exactly (a non-integer quotient throws EngineConsistencyError).
 * Reference: Macdonald, Symmetric Functions, I.7 and I.8 (plethysm); Fulton & Harris, §6.1.
 */
export function schurFunctorCharacter(n: number, ch: Character, partition: readonly number[], opts: PlethysmOptions = {}): Character {
  checkN('schurFunctorCharacter', n)
  const k = checkPartition('schurFunctorCharacter', partition)
  for (const key of ch.keys()) {
    if (parseWeightKey('schurFunctorCharacter', key).length !== n - 1 || key.includes(';')) {
      throw new EngineInputError('schurFunctorCharacter', `The weight "${key}" does not have the ${n - 1} labels of an SU(${n}) weight`)
    }
  }
  const acc = accumulateCycleIndex(n, ch, partition, k, opts)
  const kf = factorial(k)
  const out: Character = new Map()
  for (const [w, m] of acc) {
    if (m % kf !== 0n) throw new EngineConsistencyError('schurFunctorCharacter', `k! does not divide ${m} at weight ${w}`)
    const q = m / kf
    if (q !== 0n) out.set(w, toSafe(q, w))
  }
  return out
}

/** Σ_μ χ^λ(μ) |C_μ| Π_i ψ^{μ_i}(χ) (= k! S_λ(χ)), weight key -> bigint. */
function accumulateCycleIndex(n: number, ch: Character, partition: readonly number[], k: number, opts: PlethysmOptions): Map<string, bigint> {
  const acc = new Map<string, bigint>()
  const prefixCache = new Map<string, Character>()
  const classes = partitionsOf(k)
  classes.forEach((mu, idx) => {
    if (opts.signal?.aborted) throw new EngineCancelledError('plethysm')
    const chi = symmetricCharacter(partition, mu)
    if (chi !== 0) {
      const coeff = BigInt(chi) * classSize(mu)
      for (const [w, m] of adamsProduct(n, ch, mu, prefixCache)) acc.set(w, (acc.get(w) ?? 0n) + coeff * BigInt(m))
    }
    opts.onProgress?.((idx + 1) / classes.length, `cycle type ${mu.join(',')}`)
  })
  return acc
}

function toSafe(q: bigint, w: string): number {
  if (q > BigInt(Number.MAX_SAFE_INTEGER) || q < -BigInt(Number.MAX_SAFE_INTEGER)) {
    throw new EngineInputError('schurFunctorCharacter', `A multiplicity (${q} at weight ${w}) grows beyond 2^53, past exact arithmetic; lower the maximum dimension or the number of flavors`)
  }
  return Number(q)
}

/** Π_i ψ^{μ_i}(χ), sharing prefixes between cycle types of the same call. */
function adamsProduct(n: number, ch: Character, mu: readonly number[], cache: Map<string, Character>): Character {
  let cur = trivialCharacter(n)
  let key = ''
  for (const r of mu) {
    key += `${r},`
    const hit = cache.get(key)
    if (hit) cur = hit
    else {
      cur = characterProduct(cur, characterPower(n, ch, r))
      cache.set(key, cur)
    }
  }
  return cur
}

/**
 * Plethysm: irreps in the Schur functor S_partition(V_a) of the SU(n) irrep a.
 * @example plethysm(3, [1, 0], [2, 1]) // Map { "1,1" => 1 } (the mixed-symmetry part of 3⊗3⊗3 is 8)
 * Method: cycle index of S_k, each cycle-type product decomposed on the fly by Brauer's formula
 * (schurFunctorIrreps), so no large weight system is ever listed.
 * Reference: Macdonald, Symmetric Functions, I.8; Fulton & Harris, Representation Theory (1991), §6.
 */
export function plethysm(n: number, a: Dynkin, partition: number[], opts: PlethysmOptions = {}): Map<string, number> {
  checkDynkin('plethysm', n, a)
  const k = checkPartition('plethysm', partition)
  return schurFunctorIrreps(n, suWeights(n, a), partition, k, opts)
}
