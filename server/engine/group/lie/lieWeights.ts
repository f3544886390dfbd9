/**
 * Weight systems and dimensions of irreps of any simple Lie algebra (exact integers).
 */
import { EngineConsistencyError, EngineInputError } from '../../errors'
import type { Character } from '../types'
import { RootSystem } from '../../../../shared/physics/lie/rootSystem'
import { weylDimensionOf } from '../../../../shared/physics/groupReps'

/** Largest irrep (dimension) whose weights are listed. */
export const MAX_LIE_WEIGHT_DIMENSION = 5_000_000

const cache = new Map<string, Character>()
const dominantCache = new Map<string, Map<string, number>>()

/** Throw unless `labels` are rank non-negative safe integers. */
export function checkLabels(fn: string, rs: RootSystem, labels: readonly number[]): void {
  const ok = Array.isArray(labels) && labels.length === rs.rank && labels.every((a) => Number.isSafeInteger(a) && a >= 0)
  if (!ok) throw new EngineInputError(fn, `${rs.type}${rs.rank} needs ${rs.rank} non-negative Dynkin labels, got ${JSON.stringify(labels)}`)
}

/**
 * Weyl dimension formula dim V_λ = Π_{α>0} (λ + ρ, α^∨)/(ρ, α^∨) (exact, bigint inside).
 * @example lieDimension(RootSystem.of('E', 6), [1, 0, 0, 0, 0, 0]) // 27
 * Reference: Humphreys, Introduction to Lie Algebras, §24.3; Slansky, Phys. Rep. 79 (1981) 1, eq. (4.7).
 */
export function lieDimension(rs: RootSystem, labels: readonly number[]): number {
  checkLabels('lieDimension', rs, labels)
  const d = weylDimensionOf(rs, labels)
  if (d > BigInt(Number.MAX_SAFE_INTEGER)) throw new EngineInputError('lieDimension', `dimension of ${rs.type}${rs.rank} [${labels.join(',')}] exceeds 2^53: ${d}`)
  return Number(d)
}

/**
 * Multiplicities of the dominant weights of V_λ (key "a,b,…" → multiplicity).
 * @example dominantWeights(RootSystem.of('G', 2), [0, 1]) // {"0,1":1,"1,0":1,"0,0":2} (the 14)
 * Method: Freudenthal's formula, (|λ+ρ|² − |μ+ρ|²) m(μ) = 2 Σ_{α>0} Σ_{k≥1} m(μ+kα)(μ+kα, α),
 * dominant weights reached from λ by subtracting positive roots (Stembridge, Adv. Math. 134
 * (1998) 185, dominant weights form a graded poset), m(w μ) = m(μ).
 * Reference: Humphreys, Introduction to Lie Algebras, §22.3.
 */
export function dominantWeights(rs: RootSystem, labels: readonly number[]): Map<string, number> {
  checkLabels('dominantWeights', rs, labels)
  const key = `${rs.type}${rs.rank}:${labels.join(',')}`
  const hit = dominantCache.get(key)
  if (hit) return hit
  const order = dominantList(rs, labels)
  const mult = new Map<string, number>([[labels.join(','), 1]])
  const rho = new Array<number>(rs.rank).fill(1)
  const shifted = (v: readonly number[]): number[] => v.map((x, i) => x + rho[i]!)
  const top = rs.inner(shifted(labels), shifted(labels))
  for (const mu of order.slice(1)) {
    let sum = 0
    for (const a of rs.positive) {
      const w = mu.slice()
      for (let k = 1; ; k++) {
        for (let j = 0; j < rs.rank; j++) w[j]! += a.labels[j]!
        const m = mult.get(rs.dominantOf(w).join(',')) ?? 0
        if (m === 0) break
        sum += m * rs.inner(w, a.labels)
      }
    }
    const denom = top - rs.inner(shifted(mu), shifted(mu))
    const m = (2 * sum) / denom
    if (!Number.isSafeInteger(m)) throw new EngineConsistencyError('dominantWeights', `non-integer multiplicity ${m} at ${mu.join(',')} in ${rs.type}${rs.rank} [${labels.join(',')}]`)
    mult.set(mu.join(','), m)
  }
  if (dominantCache.size > 2000) dominantCache.clear()
  dominantCache.set(key, mult)
  return mult
}

/** Dominant weights of V_λ sorted by depth (λ first). */
function dominantList(rs: RootSystem, labels: readonly number[]): number[][] {
  const seen = new Set<string>([labels.join(',')])
  const out: number[][] = [labels.slice()]
  for (let k = 0; k < out.length; k++) {
    for (const a of rs.positive) {
      const w = out[k]!.map((x, j) => x - a.labels[j]!)
      if (w.some((x) => x < 0)) continue
      const key = w.join(',')
      if (seen.has(key)) continue
      seen.add(key)
      out.push(w)
    }
  }
  // depth = height of λ − μ in simple roots; (λ − μ, ρ^∨-like) order: use the scaled inner product with ρ.
  const rho = new Array<number>(rs.rank).fill(1)
  const level = (v: number[]): number =>
    rs.inner(
      labels.map((x, i) => x - v[i]!),
      rho,
    )
  return out.sort((a, b) => level(a) - level(b))
}

/**
 * Full character (every weight with its multiplicity) of V_λ; cached, do not mutate.
 * @example lieWeights(RootSystem.of('G', 2), [1, 0]).size // 7
 */
export function lieWeights(rs: RootSystem, labels: readonly number[]): Character {
  checkLabels('lieWeights', rs, labels)
  const key = `${rs.type}${rs.rank}:${labels.join(',')}`
  const hit = cache.get(key)
  if (hit) return hit
  const dim = lieDimension(rs, labels)
  if (dim > MAX_LIE_WEIGHT_DIMENSION) {
    throw new EngineInputError('lieWeights', `${rs.type}${rs.rank} irrep [${labels.join(',')}] has dimension ${dim}, above the limit ${MAX_LIE_WEIGHT_DIMENSION}`)
  }
  const ch: Character = new Map()
  for (const [k, m] of dominantWeights(rs, labels)) {
    for (const w of rs.weylOrbit(k.split(',').map(Number))) ch.set(w.join(','), m)
  }
  let total = 0
  for (const m of ch.values()) total += m
  if (total !== dim) throw new EngineInputError('lieWeights', `weights of ${rs.type}${rs.rank} [${labels.join(',')}] add up to ${total}, not the dimension ${dim}`)
  if (cache.size > 500) cache.clear()
  cache.set(key, ch)
  return ch
}
