/**
 * Weights of SU(n) irreps in the Dynkin basis, and the Weyl dimension formula.
 */
import { EngineInputError } from '../errors'
import type { Character, Dynkin } from './types'
import { checkDynkin, dynkinKey, dynkinToPartition, epsilonToDynkin } from './labels'
import { dominatedPartitions, kostka } from './kostka'
import { weylDimension } from '../../../shared/physics/suIrrep'

/** Largest irrep whose weights we enumerate (dimension), to keep memory bounded. */
export const MAX_WEIGHT_DIMENSION = 5_000_000

const cache = new Map<string, Character>()
/** Total number of cached weight entries; the cache is emptied beyond MAX_CACHED_ENTRIES. */
let cachedEntries = 0
const MAX_CACHED_ENTRIES = 4_000_000

/**
 * Weyl dimension formula for the SU(n) irrep with Dynkin labels a (exact, bigint inside).
 * dim = Π_{1<=i<j<=n} (λ_i - λ_j + j - i)/(j - i), λ the partition of a.
 * @example suDimension(3, [1, 1]) // 8
 * Throws EngineInputError for bad labels or when the dimension is not a safe integer.
 * Reference: Fulton & Harris, Representation Theory (Springer 1991), Thm 6.3 / eq. (15.17).
 */
export function suDimension(n: number, dynkin: Dynkin): number {
  checkDynkin('suDimension', n, dynkin)
  const d = weylDimension(n, dynkin)
  if (d > BigInt(Number.MAX_SAFE_INTEGER)) {
    throw new EngineInputError('suDimension', `The SU(${n}) representation [${dynkinKey(dynkin)}] has dimension ${d}, beyond 2^53; choose a smaller representation`)
  }
  return Number(d)
}

/**
 * All weights of the SU(n) irrep `dynkin`, in the Dynkin basis, with multiplicities.
 * The returned Map is cached and shared: do not mutate it.
 * @example suWeights(2, [2]) // Map { "2" => 1, "0" => 1, "-2" => 1 }
 * Method: the multiplicity of the ε-weight μ in the GL(n) irrep λ is the Kostka number
 * K_{λ,sort(μ)} (semistandard tableaux); we enumerate the dominant μ ⊴ λ and all their
 * distinct permutations, then map ε-vectors to Dynkin labels a_i = μ_i - μ_{i+1}.
 * Reference: Fulton & Harris, Representation Theory, §15.3 and Fulton, Young Tableaux, §8.
 */
export function suWeights(n: number, dynkin: Dynkin): Character {
  checkDynkin('suWeights', n, dynkin)
  const key = `${n}:${dynkinKey(dynkin)}`
  const hit = cache.get(key)
  if (hit) return hit
  const dim = suDimension(n, dynkin)
  if (dim > MAX_WEIGHT_DIMENSION) {
    throw new EngineInputError(
      'suWeights',
      `The SU(${n}) representation [${dynkinKey(dynkin)}] has dimension ${dim}, above the limit of ${MAX_WEIGHT_DIMENSION} weights; choose a smaller representation`,
    )
  }
  const lambda = dynkinToPartition(dynkin)
  const ch: Character = new Map()
  for (const mu of dominatedPartitions(lambda, n)) {
    const k = kostka(lambda, mu)
    if (k === 0) continue
    forEachDistinctPermutation(mu, (perm) => ch.set(dynkinKey(epsilonToDynkin(perm)), k))
  }
  if (cachedEntries + ch.size > MAX_CACHED_ENTRIES) {
    cache.clear()
    cachedEntries = 0
  }
  cache.set(key, ch)
  cachedEntries += ch.size
  return ch
}

/** Call f on every distinct permutation of the multiset `items` (given sorted descending). */
function forEachDistinctPermutation(items: readonly number[], f: (p: number[]) => void): void {
  const values: number[] = []
  const counts: number[] = []
  for (const x of items) {
    if (values.length > 0 && values[values.length - 1] === x) counts[counts.length - 1]!++
    else {
      values.push(x)
      counts.push(1)
    }
  }
  const cur = new Array<number>(items.length)
  const rec = (i: number): void => {
    if (i === items.length) {
      f(cur)
      return
    }
    for (let v = 0; v < values.length; v++) {
      if (counts[v] === 0) continue
      counts[v]!--
      cur[i] = values[v]!
      rec(i + 1)
      counts[v]!++
    }
  }
  rec(0)
}
