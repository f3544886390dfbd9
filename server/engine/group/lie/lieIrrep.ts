/**
 * Irreps of any simple Lie algebra: conjugate, reality (Frobenius–Schur indicator), tensor
 * products, symmetric and alternating powers, plethysms, and singlet counts of characters.
 */
import { EngineInputError } from '../../errors'
import type { Character } from '../types'
import { type Chamber, multiplyIrrepsIn, schurFunctorIrrepsIn } from '../brauer'
import type { PlethysmOptions } from '../plethysm'
import { MAX_PLETHYSM_DEGREE } from '../plethysm'
import { parseWeightKey } from '../labels'
import { type Rational, rat } from '../../exact/rational'
import type { RootSystem } from '../../../../shared/physics/lie/rootSystem'
import { conjugateLabels, labelsReality } from '../../../../shared/physics/groupReps'
import { checkLabels, lieDimension, lieWeights } from './lieWeights'

/** The Weyl chamber of a root system (for the Brauer–Klimyk products of brauer.ts). */
export function lieChamber(rs: RootSystem): Chamber {
  return { rank: rs.rank, label: `${rs.type}${rs.rank}`, reflect: (mu, shift) => rs.reflectToDominant(mu, shift) }
}

/**
 * Highest weight −w0(λ) of the conjugate irrep.
 * @example lieConjugate(RootSystem.of('E', 6), [1, 0, 0, 0, 0, 0]) // [0,0,0,0,0,1] (27 → 27̄)
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, §4 (the lowest weight is w0 λ).
 */
export function lieConjugate(rs: RootSystem, labels: readonly number[]): number[] {
  checkLabels('lieConjugate', rs, labels)
  return conjugateLabels(rs, labels)
}

/**
 * Reality of an irrep: 'complex' unless self-conjugate; then the Frobenius–Schur indicator
 * (−1)^{⟨λ, 2ρ^∨⟩}: 'real' (+1) or 'pseudoreal' (−1).
 * @example lieReality(RootSystem.of('C', 2), [1, 0]) // 'pseudoreal' (the 4 of Sp(4))
 * Reference: Bourbaki, Lie Groups and Lie Algebras, ch. VIII §7.5 Prop. 12; Slansky, Table 11.
 */
export function lieReality(rs: RootSystem, labels: readonly number[]): 'real' | 'pseudoreal' | 'complex' {
  checkLabels('lieReality', rs, labels)
  return labelsReality(rs, labels)
}

/**
 * Irreps in a ⊗ b (labels key → multiplicity).
 * @example lieTensorProduct(RootSystem.of('G', 2), [1, 0], [1, 0]) // {"2,0":1,"1,0":1,"0,1":1,"0,0":1}
 * Method: Brauer–Klimyk over the weights of the smaller factor (Fulton & Harris, ex. 25.33).
 */
export function lieTensorProduct(rs: RootSystem, a: readonly number[], b: readonly number[]): Map<string, number> {
  checkLabels('lieTensorProduct', rs, a)
  checkLabels('lieTensorProduct', rs, b)
  const [small, big] = lieDimension(rs, a) <= lieDimension(rs, b) ? [a, b] : [b, a]
  return multiplyIrrepsIn(lieChamber(rs), new Map([[big.join(','), 1]]), lieWeights(rs, small))
}

/**
 * Irreps of the Schur functor S_partition(V_a) (partition [k]: Sym^k, [1^k]: Λ^k).
 * @example liePlethysm(RootSystem.of('B', 2), [1, 0], [2]) // {"2,0":1,"0,0":1} (Sym² of the 5 of SO(5))
 * Method: cycle index of S_k with Brauer's formula (brauer.ts). Reference: Macdonald, I.8.
 */
export function liePlethysm(rs: RootSystem, a: readonly number[], partition: readonly number[], opts: PlethysmOptions = {}): Map<string, number> {
  checkLabels('liePlethysm', rs, a)
  const ok = partition.length > 0 && partition.every((p, i) => Number.isSafeInteger(p) && p >= 1 && (i === 0 || p <= partition[i - 1]!))
  const k = partition.reduce((s, p) => s + p, 0)
  if (!ok || k > MAX_PLETHYSM_DEGREE)
    throw new EngineInputError('liePlethysm', `partition must be non-increasing positive integers of size at most ${MAX_PLETHYSM_DEGREE}, got ${JSON.stringify(partition)}`)
  return schurFunctorIrrepsIn(lieChamber(rs), lieWeights(rs, a), partition, k, opts)
}

/** Sym^k(V_a); Sym^0 is the singlet. */
export function lieSymmetricPower(rs: RootSystem, a: readonly number[], k: number): Map<string, number> {
  if (k === 0) return new Map([[new Array<number>(rs.rank).fill(0).join(','), 1]])
  return liePlethysm(rs, a, [k])
}

/** Λ^k(V_a) (empty above dim V_a); Λ^0 is the singlet. */
export function lieAlternatingPower(rs: RootSystem, a: readonly number[], k: number): Map<string, number> {
  if (k === 0) return new Map([[new Array<number>(rs.rank).fill(0).join(','), 1]])
  return liePlethysm(rs, a, new Array<number>(k).fill(1))
}

const singletSigns = new Map<RootSystem, Map<string, number>>()

/**
 * Sign with which a weight contributes to the singlet count (ε(w) if key + ρ = w ρ, else 0).
 * @example lieSingletContribution(RootSystem.of('G', 2), '-2,0') // -1
 */
export function lieSingletContribution(rs: RootSystem, key: string): number {
  let cache = singletSigns.get(rs)
  if (!cache) singletSigns.set(rs, (cache = new Map()))
  const hit = cache.get(key)
  if (hit !== undefined) return hit
  const w = parseWeightKey('lieSingletCount', key)
  if (w.length !== rs.rank) throw new EngineInputError('lieSingletCount', `weight "${key}" does not have ${rs.rank} labels for ${rs.type}${rs.rank}`)
  const r = rs.reflectToDominant(w, null)
  const s = r && r.labels.every((x) => x === 0) ? r.sign : 0
  if (cache.size > 2_000_000) cache.clear()
  cache.set(key, s)
  return s
}

/**
 * Number of singlets (signed for virtual characters) of a character: Weyl integration as the
 * alternating sum over the Weyl group (Fulton & Harris, §26.2).
 * @example lieSingletCount(rs, product of the 7 of G2 with itself) // 1
 */
export function lieSingletCount(rs: RootSystem, ch: Character): number {
  let s = 0
  for (const [key, m] of ch) {
    const c = lieSingletContribution(rs, key)
    if (c !== 0) s += c * m
  }
  if (!Number.isSafeInteger(s)) throw new EngineInputError('lieSingletCount', `multiplicities must be safe integers, got a total of ${s}`)
  return s
}

/**
 * Dynkin index T(R) = dim(R) C2(R) / dim(G), normalised with long roots of length² 2, so that
 * T = 1/2 for the fundamental of SU(n) and Sp(n) and T = 1 for the vector of SO(n).
 * @example lieIndex(RootSystem.of('D', 5), [1, 0, 0, 0, 0]) // 1 (the 10 of SO(10))
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, eq. (4.14) and Table 30 (there l = 2T).
 */
export function lieIndex(rs: RootSystem, labels: readonly number[]): Rational {
  checkLabels('lieIndex', rs, labels)
  const long = Math.max(...rs.half)
  const twoRho = new Array<number>(rs.rank).fill(2)
  const casimirTimes = rs.inner(
    labels,
    labels.map((x, i) => x + twoRho[i]!),
  ) // (λ, λ+2ρ)·scale
  const adj = rs.positive[rs.positive.length - 1]!.labels
  const dimG = lieDimension(rs, adj)
  // C2 = (λ, λ+2ρ)/2 with (·,·) divided by `long` (long roots of length² 2) and by the scale.
  return rat(BigInt(lieDimension(rs, labels)) * BigInt(casimirTimes), BigInt(2 * long * rs.scale * dimG))
}
