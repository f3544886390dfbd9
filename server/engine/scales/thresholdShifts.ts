/**
 * Threshold shifts of gauge kinetic terms: which gauge groups see their −(1/4g²) F² coefficient
 * change at one loop when given fields are integrated out (plain data for threshold tags).
 */
import { EngineInputError } from '../errors'
import { add, mul, parseRational, rat, ZERO, toString as ratText, type Rational } from '../exact/rational'
import { isTrivialRep, repDimension, repIndex } from '../group/representation'
import type { TheoryField, TheoryGroup } from '../../../shared/schemas/theory'
import { FINITE_KINDS, type FiniteKind } from '../../../shared/physics/finite/tables'

export interface ThresholdShift {
  group: string
  /** Kind of the gauge group (theory-file type: SU, SO, Sp, G2, …, U1). */
  type: string
  /** Removed fields charged (non-singlet) under the group, in input order. */
  fields: string[]
  /**
   * Exact contribution Δb of the removed fields to b in μ dg/dμ = b g³/(16π²) (for U(1): charges
   * as written, no GUT normalisation); below the threshold b drops by Δb.
   */
  betaShift: string
}

/** 2/3 per Weyl fermion, 1/3 per complex scalar, 1/6 per real scalar (Machacek & Vaughn 1983). */
function spinWeight(f: TheoryField): Rational {
  if (f.lorentz === 'left-weyl' || f.lorentz === 'right-weyl') return rat(2, 3)
  return f.real ? rat(1, 6) : rat(1, 3)
}

/** Number of components of the field under every group except g (dimensions under the non-abelian groups, gauge or global; U(1), Z_n add none). */
function multiplicity(f: TheoryField, g: TheoryGroup, groups: readonly TheoryGroup[]): Rational {
  let m = rat(f.flavors ?? 1)
  for (const h of groups) {
    const rep = f.reps?.[h.name]
    if (h.name !== g.name && rep !== undefined) m = mul(m, rat(repDimension(h.type, h.n, rep)))
  }
  return m
}

/**
 * Contribution of one matter field to the one-loop gauge β coefficient b of group g.
 * @example fieldBetaContribution(top partner TL (colour [1,0]), colour, groups) // 1/3 (a Dirac quark gives 2/3)
 * Method: b = −(11/3) C2(G) + (2/3) Σ_Weyl T(R) + (1/3) Σ_complex scalars T(R) (+1/6 for real scalars),
 *   T(R) the Dynkin index (T(fund) = 1/2) or Q² for U(1), times the multiplicity under the other groups.
 * Reference: M. E. Machacek, M. T. Vaughn, Nucl. Phys. B 222 (1983) 83; D. R. T. Jones, Nucl. Phys. B 75 (1974) 531.
 */
export function fieldBetaContribution(f: TheoryField, g: TheoryGroup, groups: readonly TheoryGroup[]): Rational {
  let t: Rational = ZERO
  const rep = f.reps?.[g.name]
  if (g.type !== 'U1' && rep !== undefined) t = repIndex(g.type, g.n, rep)
  if (g.type === 'U1' && f.charges?.[g.name] !== undefined) {
    const q = parseRational(String(f.charges[g.name]))
    t = mul(q, q)
  }
  return mul(mul(spinWeight(f), t), multiplicity(f, g, groups))
}

/** True when the field transforms non-trivially under the group g (non-abelian: a non-trivial representation; U(1): non-zero charge; Z_n: false). @example isChargedUnder(H, weak) // true */
export function isChargedUnder(field: TheoryField, g: TheoryGroup): boolean {
  if (g.type !== 'U1' && g.type !== 'Z') return !isTrivialRep(g.type, field.reps?.[g.name])
  if (g.type === 'U1') {
    const q = field.charges?.[g.name]
    return q !== undefined && parseRational(String(q)).num !== 0n
  }
  return false
}

/**
 * The gauge groups whose kinetic-term coefficient shifts at one loop when `removedFields`
 * are integrated out: every SU(n) or U(1) gauge group under which a removed field is
 * non-singlet (Z_n and global groups have no kinetic term).
 * @example thresholdShifts([{ name: 'T', lorentz: 'left-weyl', reps: { colour: [1, 0] }, charges: { Y: '2/3' } }], smGroups)
 *   // [{ group: 'colour', type: 'SU', fields: ['T'], betaShift: '1/3' }, { group: 'Y', type: 'U1', fields: ['T'], betaShift: '8/9' }]
 * Method: a heavy loop contributes to the gauge two-point function iff the field carries the
 *   gauge charge (Dynkin index or charge squared non-zero); Δb from fieldBetaContribution.
 * Reference: S. Weinberg, Phys. Lett. B 91 (1980) 51; L. J. Hall, Nucl. Phys. B 178 (1981) 75.
 */
export function thresholdShifts(removedFields: readonly TheoryField[], groups: readonly TheoryGroup[]): ThresholdShift[] {
  for (const f of removedFields) {
    if (f.lorentz === 'field-strength') {
      throw new EngineInputError('thresholdShifts', `Field "${f.name}" is a gauge field strength; only matter fields can be integrated out`)
    }
  }
  const out: ThresholdShift[] = []
  for (const g of groups) {
    if (!g.gauge || g.type === 'Z' || FINITE_KINDS.includes(g.type as FiniteKind)) continue
    const charged = removedFields.filter((f) => isChargedUnder(f, g))
    if (charged.length === 0) continue
    const shift = charged.reduce((s, f) => add(s, fieldBetaContribution(f, g, groups)), ZERO)
    out.push({ group: g.name, type: g.type, fields: charged.map((f) => f.name), betaShift: ratText(shift) })
  }
  return out
}
