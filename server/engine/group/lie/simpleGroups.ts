/**
 * The compact simple groups a theory file can name, and their root systems:
 * SU(n) = A_{n−1}, SO(2k+1) = B_k, Sp(2k) = C_k, SO(2k) = D_k, G2, F4, E6, E7, E8.
 * Representations are Dynkin labels in Bourbaki's numbering (cartan.ts), e.g. the vector of
 * SO(10) is [1,0,0,0,0], its spinors [0,0,0,0,1] and [0,0,0,1,0]; the 27 of E6 is [1,0,0,0,0,0].
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, Tables 2 and 6; Yamatsu, arXiv:1511.08771.
 */
import { EngineInputError } from '../../errors'
import type { RootSystem } from '../../../../shared/physics/lie/rootSystem'
import { type SimpleKind, simpleRootSystem } from '../../../../shared/physics/groupReps'

export type { SimpleKind }

/** Ranges of n per kind (SO(n), Sp(n) with n the size of the defining matrices). */
export const SIMPLE_N_RANGE: Record<'SU' | 'SO' | 'Sp', readonly [number, number]> = { SU: [2, 8], SO: [5, 18], Sp: [4, 16] }

/**
 * Root system of a simple group.
 * @example rootSystemOf('SO', 10).type // 'D' (rank 5)
 */
export function rootSystemOf(kind: SimpleKind, n?: number): RootSystem {
  if (kind === 'G2' || kind === 'F4' || kind === 'E6' || kind === 'E7' || kind === 'E8') return simpleRootSystem(kind)
  const [lo, hi] = SIMPLE_N_RANGE[kind]
  if (n === undefined || !Number.isInteger(n) || n < lo || n > hi || (kind === 'Sp' && n % 2 !== 0)) {
    throw new EngineInputError('rootSystemOf', `${kind}(n) needs ${kind === 'Sp' ? 'an even' : 'an integer'} n from ${lo} to ${hi}, got n = ${n}`)
  }
  return simpleRootSystem(kind, n)
}

/** Readable name, e.g. "SO(10)", "Sp(4)", "E6". */
export function simpleGroupLabel(kind: SimpleKind, n?: number): string {
  return kind === 'SU' || kind === 'SO' || kind === 'Sp' ? `${kind}(${n})` : kind
}

/**
 * Dynkin labels of the adjoint (the highest root).
 * @example adjointLabels(rootSystemOf('G2')) // [0, 1]
 */
export function adjointLabels(rs: RootSystem): number[] {
  return rs.positive[rs.positive.length - 1]!.labels.slice()
}
