/**
 * Checks of the theory file that depend on the kind of a group: its n, the shape of a field's
 * representation under it (Dynkin labels of the right length, or an irrep name of a finite
 * group), the dimension limit, and the reality of a real scalar's representation.
 */
import { type RepValue, repDimensionOf, repRealityOf } from '../physics/groupReps'
import { finiteIrrepNames, groupKindLabel, isFiniteKind, isLieKind, lieRank, N_RANGE, validN } from './groupKinds'

export const MAX_REP_DIMENSION = 1000

/** The group fields the checks read (a TheoryGroup). */
export interface GroupLike {
  name: string
  type: string
  n?: number
  gauge: boolean
}
export type { RepValue }

type Bad = (key: string | number, message: string, ...more: (string | number)[]) => void

/** Message for a bad n of the group kind, or undefined when n is fine. */
export function groupNProblem(g: GroupLike): string | undefined {
  const r = N_RANGE[g.type as keyof typeof N_RANGE]
  if (validN(g.type, g.n)) return undefined
  if (!r) return g.type === 'U1' ? `a U(1) group takes no n; remove n = ${g.n}` : `${groupKindLabel(g.type)} takes no n; remove n = ${g.n}`
  const even = g.type === 'Sp' ? ' (even: Sp(n) acts on n = 2k dimensions)' : ''
  const given = g.n === undefined ? '; give n' : `, but n = ${g.n}`
  return `${g.type === 'Z' ? 'Z_n' : `${g.type}(n)`} needs n from ${r[0]} to ${r[1]}${even}${given}`
}

/** Text of a representation for messages: "[1,0]" or "3". */
export function repText(rep: RepValue): string {
  return typeof rep === 'string' ? `"${rep}"` : `[${rep.join(',')}]`
}

/**
 * Check a field's representation under a non-abelian group; returns true when it is well formed.
 * @example checkRep({ name: 'A4', type: 'A4', gauge: false }, '4', bad) // reports: A4 has no irrep "4" …
 */
export function checkRep(g: GroupLike, rep: RepValue, bad: Bad): boolean {
  const at = groupKindLabel(g.type, g.n)
  if (isFiniteKind(g.type)) {
    const names = finiteIrrepNames(g.type)
    if (typeof rep !== 'string' || !names.includes(rep)) {
      bad('reps', `${at} takes an irrep name (one of ${names.join(', ')}), but got ${repText(rep)}`, g.name)
      return false
    }
    return true
  }
  if (!isLieKind(g.type)) {
    bad('reps', `${g.name} is ${groupKindLabel(g.type, g.n)}, which takes a charge, not Dynkin labels`, g.name)
    return false
  }
  const rank = lieRank(g.type, g.n)
  if (rank === undefined) return false
  if (typeof rep === 'string' || rep.length !== rank) {
    bad('reps', `${at} takes ${rank} Dynkin label${rank === 1 ? '' : 's'}, but ${typeof rep === 'string' ? `got ${repText(rep)}` : `${repText(rep)} has ${rep.length}`}`, g.name)
    return false
  }
  const dim = repDimensionOf(g.type, g.n, rep)
  if (dim > BigInt(MAX_REP_DIMENSION)) {
    bad('reps', `representations are limited to dimension ${MAX_REP_DIMENSION}, but [${rep.join(',')}] has dimension ${dim}`, g.name)
    return false
  }
  return true
}

/**
 * A real scalar's representation is real when the product of the factors' Frobenius–Schur
 * indicators (+1 real, −1 pseudoreal, 0 complex) is +1: a real (2,2) of SU(2)×SU(2) is real.
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, §4 (indicators multiply on outer products).
 */
export function checkRealRepresentation(reps: [GroupLike, RepValue][], bad: Bad): void {
  const factors = reps.map(([g, rep]) => ({ g, rep, reality: repRealityOf(g.type, g.n, rep) }))
  const complex = factors.find((x) => x.reality === 'complex')
  const pseudo = factors.filter((x) => x.reality === 'pseudoreal')
  if (complex) bad('reps', `a real scalar must sit in a real representation, but ${repText(complex.rep)} is complex`, complex.g.name)
  else if (pseudo.length === 1) bad('reps', `a real scalar must sit in a real representation, but ${repText(pseudo[0]!.rep)} is pseudoreal`, pseudo[0]!.g.name)
  else if (pseudo.length % 2 === 1) {
    const list = pseudo.map((x) => `${x.g.name} = ${repText(x.rep)}`).join(', ')
    bad(
      'reps',
      `a real scalar must sit in a real representation, but the product of the reality indicators is −1: ${list} are pseudoreal (an even number of pseudoreal factors is real)`,
      pseudo[0]!.g.name,
    )
  }
}
