/**
 * Parity partners of particles and the parity image of a class.
 *
 * Conventions (phases): P maps every on-shell particle to the particle of opposite helicity
 * with identical gauge and discrete charges:
 * - a scalar to itself, intrinsic parity +1 (no pseudoscalars are declared);
 * - a field strength X_L ↔ X_R;
 * - a Weyl fermion to a fermion of another field with opposite helicity and the same
 *   SU(N) kinds, U(1) charges, Z_N charges and flavor number: ψ (L) ↔ χ (R) when both carry
 *   the same charges (a Dirac fermion written as L + R), or ψ ↔ χ* when both are L with
 *   opposite charges. When several fields qualify, fields are paired greedily in theory
 *   order. Intrinsic phases are chosen with P² = 1 on every field (η = 1 for a Dirac pair).
 * A particle without partner (a chiral fermion, e.g. any SMEFT fermion) makes P undefined
 * on every class containing it.
 */
import { EngineInputError } from '../errors'
import type { Species } from '../theory/model'
import { makeClass, type OperatorClass } from './classKey'

/** Same SU(N) kinds and charges under every group (species of one model list every group). */
function sameCharges(p: Species, q: Species): boolean {
  if (Object.entries(p.suKind).some(([g, k]) => q.suKind[g] !== k || p.reps[g]?.join(',') !== q.reps[g]?.join(','))) return false
  if (Object.entries(p.u1).some(([g, r]) => q.u1[g]!.num * r.den !== r.num * q.u1[g]!.den)) return false
  return Object.entries(p.zn).every(([g, z]) => q.zn[g] === z)
}

/**
 * Map particle label ↦ label of its parity partner; labels without partner are absent.
 * @example parityPartners(basisSpecies(qed)).get("eL") // "eR"
 * Method: helicity flip at fixed charges (conventions above); common practice, e.g.
 * Dreiner, Haber & Martin, Phys. Rep. 494 (2010) 1, §2 (two-component spinors under P).
 */
export function parityPartners(particles: Species[]): Map<string, string> {
  const map = new Map<string, string>()
  const byLabel = new Map(particles.map((p) => [p.label, p]))
  for (const p of particles) {
    if (p.kind === 'scalar') map.set(p.label, p.label)
    if (p.kind === 'field-strength') map.set(p.label, p.conjugate)
  }
  const matched = new Set<string>()
  for (const p of particles) {
    if (!p.fermion || p.conj || matched.has(p.field)) continue
    const q = particles.find((x) => x.fermion && x.field !== p.field && !matched.has(x.field) && x.helicity2 === -p.helicity2 && x.flavors === p.flavors && sameCharges(p, x))
    if (!q) continue
    matched.add(p.field).add(q.field)
    const pc = byLabel.get(p.conjugate)!
    const qc = byLabel.get(q.conjugate)!
    for (const [a, b] of [
      [p, q],
      [pc, qc],
    ] as const) {
      map.set(a.label, b.label)
      map.set(b.label, a.label)
    }
  }
  return map
}

export interface ParityImage {
  /** The image class P(C), or null when P is not defined on C. */
  image: OperatorClass | null
  reason?: string
}

/**
 * The parity image of a class: every leg replaced by its partner.
 * @example parityImage(qedParticles, class "eL eR* A_L").image.key // "eL* eR A_R"
 */
export function parityImage(particles: Species[], c: OperatorClass): ParityImage {
  const partners = parityPartners(particles)
  const byLabel = new Map(particles.map((p) => [p.label, p]))
  const legs: Species[] = []
  for (const p of c.legs) {
    const q = partners.get(p.label)
    if (q === undefined) {
      return { image: null, reason: `P is not defined on class ${c.key}: ${p.label} has no parity partner (no field of opposite chirality with identical gauge and discrete charges)` }
    }
    legs.push(byLabel.get(q)!)
  }
  return { image: makeClass(particles, c.k, legs) }
}

/**
 * Leg involution π of a class mapped to itself by P: leg i ↦ a leg holding the partner of
 * leg i, blocks of identical particles matched in order (so π² = id).
 * @example parityLegMap(qedParticles, class "eL eL* eR eR*") // [2, 3, 0, 1]
 */
export function parityLegMap(particles: Species[], c: OperatorClass): number[] {
  const partners = parityPartners(particles)
  const firstOf = (label: string): number => c.legs.findIndex((q) => q.label === label)
  return c.legs.map((p, i) => {
    const q = partners.get(p.label)
    const start = q === undefined ? -1 : firstOf(q)
    const count = q === undefined ? 0 : c.legs.filter((x) => x.label === q).length
    const offset = i - firstOf(p.label)
    if (start < 0 || offset >= count)
      throw new EngineInputError('parityLegMap', `Parity does not map the class ${c.key} to itself (${p.label} has no partner), so "(X) ± P" cannot be formed in it; write X alone`)
    return start + offset
  })
}
