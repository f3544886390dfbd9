/**
 * Arithmetic on characters (finite weight multisets, weight key -> integer multiplicity).
 * Weights add under tensor product; Adams operations scale weights. Multiplicities may be
 * negative (virtual characters); zero entries are dropped.
 */
import { EngineInputError } from '../errors'
import type { Character } from './types'
import { checkN, formatWeightKey, keySeparators, parseWeightKey } from './labels'
import { fixedPackedProduct } from './packed'

function addTo(fn: string, out: Character, key: string, m: number): void {
  const v = (out.get(key) ?? 0) + m
  if (!Number.isSafeInteger(v))
    throw new EngineInputError(fn, `A weight multiplicity grows beyond 2^53 (at weight ${key}), past exact arithmetic; lower the maximum dimension or the number of flavors`)
  if (v === 0) out.delete(key)
  else out.set(key, v)
}

/**
 * Character of a tensor product: weights add, multiplicities multiply.
 * @example characterProduct(suWeights(2,[1]), suWeights(2,[1])) // { "2":1, "0":2, "-2":1 }
 * Method: convolution of weight multisets, on packed integer keys when the weights fit
 * (packed.ts), else on string keys. Reference: Fulton & Harris, §2.1 (χ_{V⊗W} = χ_V χ_W).
 */
export function characterProduct(a: Character, b: Character): Character {
  const fast = fixedPackedProduct(a, b)
  if (fast) return fast
  const out: Character = new Map()
  if (a.size > b.size) [a, b] = [b, a]
  const bs = [...b].map(([k, m]) => [parseWeightKey('characterProduct', k), m, keySeparators(k), k] as const)
  for (const [ka, ma] of a) {
    const wa = parseWeightKey('characterProduct', ka)
    const sa = keySeparators(ka)
    const sum = new Array<number>(wa.length)
    for (const [wb, mb, sb, kb] of bs) {
      if (sb !== sa) {
        throw new EngineInputError('characterProduct', `Characters of different groups cannot be multiplied (weights "${ka}" and "${kb}")`)
      }
      for (let i = 0; i < wa.length; i++) sum[i] = wa[i]! + wb[i]!
      addTo('characterProduct', out, formatWeightKey(sum, sa), ma * mb)
    }
  }
  return out
}

/**
 * Adams operation ψ^r: every weight multiplied by r (r >= 1), multiplicities kept.
 * ψ^r χ(g) = χ(g^r); it is the building block of the cycle-index (plethystic) formulas.
 * @example characterPower(2, suWeights(2,[1]), 2) // { "2":1, "-2":1 }
 * Reference: Macdonald, Symmetric Functions, I.2 (power sums) and Adams, Ann. Math. 75 (1962).
 */
export function characterPower(n: number, ch: Character, r: number): Character {
  checkN('characterPower', n)
  for (const k of ch.keys()) {
    if (parseWeightKey('characterPower', k).length !== n - 1 || k.includes(';')) {
      throw new EngineInputError('characterPower', `The weight "${k}" does not have the ${n - 1} labels of an SU(${n}) weight`)
    }
  }
  return characterAdams(ch, r)
}

/**
 * Adams operation ψ^r on any character, including product-group keys "a,b;c".
 * @example characterAdams(lorentzWeights([1, 0]), 3) // { "3;0":1, "-3;0":1 }
 */
export function characterAdams(ch: Character, r: number): Character {
  if (!Number.isSafeInteger(r) || r < 1) {
    throw new EngineInputError('characterPower', `The Adams power must be a positive whole number, not ${r}`)
  }
  const out: Character = new Map()
  for (const [k, m] of ch) {
    const w = parseWeightKey('characterPower', k)
    const scaled = new Array<number>(w.length)
    for (let i = 0; i < w.length; i++) scaled[i] = w[i]! * r
    addTo('characterPower', out, formatWeightKey(scaled, keySeparators(k)), m)
  }
  return out
}

/** Sum c_1 χ_1 + c_2 χ_2 + ... of characters with integer coefficients. */
export function characterSum(terms: ReadonlyArray<readonly [number, Character]>): Character {
  const out: Character = new Map()
  for (const [c, ch] of terms) {
    for (const [k, m] of ch) addTo('characterSum', out, k, c * m)
  }
  return out
}

/** Dimension of a character (sum of multiplicities). */
export function characterDimension(ch: Character): number {
  let s = 0
  for (const m of ch.values()) s += m
  return s
}

/** Trivial character of SU(n): the zero weight once. */
export function trivialCharacter(n: number): Character {
  checkN('trivialCharacter', n)
  return new Map([[new Array<number>(n - 1).fill(0).join(','), 1]])
}
