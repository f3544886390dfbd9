/**
 * Characters of products of SU(n) factors, e.g. SU(3) × SU(2) or the Lorentz group
 * SU(2)_l × SU(2)_r. A product weight key joins the factor weight keys with ';':
 * "1,0;-1" is weight [1,0] of SU(3) and [-1] of SU(2).
 */
import { EngineInputError } from '../errors'
import type { Character } from './types'
import { checkN } from './labels'
import { decomposeCharacter, singletContribution, singletCount } from './decompose'

/**
 * Outer (external) product of characters of the factors: χ_1 × χ_2 × ...
 * @example productCharacter([suWeights(2,[1]), suWeights(2,[0])]) // {"1;0":1, "-1;0":1}
 * Reference: Fulton & Harris, §2.2 (irreps of a product group are outer products).
 */
export function productCharacter(factors: readonly Character[]): Character {
  if (factors.length === 0) throw new EngineInputError('productCharacter', 'A product group needs at least one factor')
  let out: Character = new Map(factors[0])
  for (const f of factors.slice(1)) {
    const next: Character = new Map()
    for (const [ka, ma] of out) {
      for (const [kb, mb] of f) next.set(`${ka};${kb}`, ma * mb)
    }
    out = next
  }
  return out
}

function splitKey(fn: string, key: string, count: number): string[] {
  const parts = key.split(';')
  if (parts.length !== count) {
    throw new EngineInputError(fn, `The weight "${key}" does not have one part per factor of the ${count}-factor product group`)
  }
  return parts
}

/**
 * Irreps of a product-group character: key "a;b;..." of factor Dynkin labels -> multiplicity.
 * @example decomposeProduct([2, 2], productCharacter([suWeights(2,[1]), suWeights(2,[1])])) // {"1;1":1}
 * Method: factor by factor Brauer–Klimyk (the Weyl group of a product is the product).
 */
export function decomposeProduct(ns: readonly number[], ch: Character): Map<string, number> {
  ns.forEach((n) => checkN('decomposeProduct', n))
  let current = new Map<string, number>()
  for (const [k, m] of ch) current.set(splitKey('decomposeProduct', k, ns.length).join(';'), m)
  for (let f = 0; f < ns.length; f++) {
    const groups = new Map<string, Character>()
    for (const [k, m] of current) {
      const parts = k.split(';')
      const rest = [...parts.slice(0, f), '#', ...parts.slice(f + 1)].join(';')
      const g = groups.get(rest) ?? new Map<string, number>()
      g.set(parts[f]!, (g.get(parts[f]!) ?? 0) + m)
      groups.set(rest, g)
    }
    const next = new Map<string, number>()
    for (const [rest, g] of groups) {
      for (const [irrep, m] of decomposeCharacter(ns[f]!, g)) next.set(rest.replace('#', irrep), m)
    }
    current = next
  }
  return current
}

/**
 * Number of singlets of a product-group character (signed for virtual characters).
 * @example productSingletCount([2, 2], productCharacter([suWeights(2,[1]), suWeights(2,[1])])) // 0
 */
export function productSingletCount(ns: readonly number[], ch: Character): number {
  ns.forEach((n) => checkN('productSingletCount', n))
  if (ns.length === 0) throw new EngineInputError('productSingletCount', 'A product group needs at least one factor')
  if (ns.length === 1) {
    for (const k of ch.keys()) splitKey('productSingletCount', k, 1)
    return singletCount(ns[0]!, ch)
  }
  const nLast = ns[ns.length - 1]!
  const partial: Character = new Map()
  for (const [k, m] of ch) {
    const parts = splitKey('productSingletCount', k, ns.length)
    const c = singletContribution(nLast, parts.pop()!)
    if (c === 0) continue
    const rest = parts.join(';')
    const v = (partial.get(rest) ?? 0) + c * m
    if (v === 0) partial.delete(rest)
    else partial.set(rest, v)
  }
  return productSingletCount(ns.slice(0, -1), partial)
}
