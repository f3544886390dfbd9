/**
 * One entry point for the data of a field's representation under any non-abelian group kind
 * of the theory file: dimension, reality, Dynkin index, triviality. A representation is
 * Dynkin labels (SU, SO, Sp, G2, F4, E6, E7, E8) or an irrep name (finite groups).
 */
import { EngineInputError } from '../errors'
import { type Rational, ZERO } from '../exact/rational'
import { suIndex, suReality } from './irrep'
import { suDimension } from './weights'
import { lieDimension } from './lie/lieWeights'
import { lieIndex, lieReality } from './lie/lieIrrep'
import { rootSystemOf, type SimpleKind } from './lie/simpleGroups'
import { FINITE_GROUPS, type FiniteKind } from '../../../shared/physics/finite/tables'
import { finiteConjugate, finiteGroup, finiteReality, irrepIndex } from './finite/finiteGroup'
import { lieConjugate } from './lie/lieIrrep'

export type RepValue = readonly number[] | string

const isFinite = (kind: string): kind is FiniteKind => kind in FINITE_GROUPS

function labels(kind: string, rep: RepValue): readonly number[] {
  if (typeof rep === 'string') throw new EngineInputError('representation', `${kind} takes Dynkin labels, not the irrep name "${rep}"`)
  return rep
}

/**
 * Dimension of a representation.
 * @example repDimension('SO', 10, [0, 0, 0, 0, 1]) // 16
 */
export function repDimension(kind: string, n: number | undefined, rep: RepValue): number {
  if (isFinite(kind)) {
    const t = finiteGroup(kind)
    return t.irreps[irrepIndex(t, String(rep))]!.chi[0]![0]
  }
  if (kind === 'SU') return suDimension(n!, labels(kind, rep))
  return lieDimension(rootSystemOf(kind as SimpleKind, n), labels(kind, rep))
}

/**
 * Reality (Frobenius–Schur indicator) of a representation.
 * @example repReality('Tprime', undefined, '2') // 'pseudoreal'
 */
export function repReality(kind: string, n: number | undefined, rep: RepValue): 'real' | 'pseudoreal' | 'complex' {
  if (isFinite(kind)) return finiteReality(kind, String(rep))
  if (kind === 'SU') return suReality(n!, labels(kind, rep))
  return lieReality(rootSystemOf(kind as SimpleKind, n), labels(kind, rep))
}

/**
 * Dynkin index T(R) (T = 1/2 for SU(n) and Sp(n) fundamentals); finite groups have none.
 * @example repIndex('E6', undefined, [1, 0, 0, 0, 0, 0]) // 3 (Slansky, Table 30: l(27) = 6)
 */
export function repIndex(kind: string, n: number | undefined, rep: RepValue): Rational {
  if (isFinite(kind)) return ZERO
  if (kind === 'SU') return suIndex(n!, labels(kind, rep))
  return lieIndex(rootSystemOf(kind as SimpleKind, n), labels(kind, rep))
}

/**
 * The conjugate representation (reversed labels for SU(n), −w0 for the other Lie groups, the
 * complex-conjugate character for finite groups).
 * @example conjugateRep('A4', undefined, "1'") // "1''"
 */
export function conjugateRep(kind: string, n: number | undefined, rep: RepValue): RepValue {
  if (isFinite(kind)) {
    const t = finiteGroup(kind)
    return t.irreps[finiteConjugate(t, irrepIndex(t, String(rep)))]!.name
  }
  if (kind === 'SU') return labels(kind, rep).slice().reverse()
  return lieConjugate(rootSystemOf(kind as SimpleKind, n), labels(kind, rep))
}

/** True for the trivial representation (all labels 0, or the first irrep of a finite group). */
export function isTrivialRep(kind: string, rep: RepValue | undefined): boolean {
  if (rep === undefined) return true
  if (typeof rep === 'string') return isFinite(kind) && FINITE_GROUPS[kind].irreps[0]!.name === rep
  return rep.every((a) => a === 0)
}
