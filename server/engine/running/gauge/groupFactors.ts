/**
 * The group theory the gauge β functions need, per gauge group of a theory: for a simple group
 * the dimension, Dynkin index T(R) and quadratic Casimir C2(R) of any irrep and C2 of the
 * adjoint; a U(1) needs none (its charges enter directly). A new group kind (SO(N), Sp(2N),
 * exceptional) plugs in by one more case in `simpleGroupFactors`.
 *
 * Normalisation (physics): T(fund of SU(N)) = 1/2, C2(fund) = (N²−1)/(2N), C2(adj) = N,
 * T(R) dim G = C2(R) dim R.
 */
import { EngineInputError } from '../../errors'
import { rat, type Rational } from '../../exact/rational'
import { suCasimir, suIndex } from '../../group/irrep'
import { suDimension } from '../../group/weights'
import type { TheoryGroup } from '../../../../shared/schemas/theory'

/** Invariants of the irreps of one simple gauge group, labels in its Dynkin basis. */
export interface SimpleGroupFactors {
  /** e.g. "SU(3)". */
  label: string
  /** Number of Dynkin labels of an irrep. */
  rank: number
  /** dim G and C2(G) = T(adjoint). */
  dimension: number
  adjointCasimir: Rational
  irrepDimension: (labels: readonly number[]) => number
  index: (labels: readonly number[]) => Rational
  casimir: (labels: readonly number[]) => Rational
}

function suFactors(n: number): SimpleGroupFactors {
  return {
    label: `SU(${n})`,
    rank: n - 1,
    dimension: n * n - 1,
    adjointCasimir: rat(n),
    irrepDimension: (a) => suDimension(n, a),
    index: (a) => suIndex(n, a),
    casimir: (a) => suCasimir(n, a),
  }
}

/**
 * The irrep invariants of a simple gauge group of the theory file.
 * @example simpleGroupFactors({ name: 'colour', type: 'SU', n: 3, gauge: true }).index([1, 1]) // 3
 * Method: SU(N) through the weight engine (Casimir from the partition of the highest weight,
 *   index T = dim R · C2(R) / dim G).
 * Reference: R. Slansky, Phys. Rep. 79 (1981) 1, eq. (4.14) and Table 30.
 */
export function simpleGroupFactors(group: TheoryGroup): SimpleGroupFactors {
  if (group.type === 'SU') return suFactors(group.n!)
  throw new EngineInputError('simpleGroupFactors', `The running of the coupling of ${group.name} is not available: it is a ${group.type} group, and only SU(N) and U(1) gauge groups run for now.`)
}

/** True for the gauge groups whose couplings run: continuous (SU(N) or U(1)) and gauged. */
export function hasRunningCoupling(group: TheoryGroup): boolean {
  return group.gauge && group.type !== 'Z'
}
