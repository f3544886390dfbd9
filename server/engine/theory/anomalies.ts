/**
 * Gauge anomaly conditions of the chiral fermions of a theory.
 *
 * Conventions: every fermion is written as a left-handed Weyl field; a right-handed field
 * ("lorentz": "right-weyl") enters as its conjugate (conjugate SU(n) rep, negated U(1) charges),
 * as the (1/2,0) species of the theory model (model.ts).
 * Each Weyl field is weighted by its flavor number and the dimensions of its representations
 * under the other non-abelian groups, gauge or global. Only gauge groups (gauge: true) are
 * checked: anomalies of global symmetries are not inconsistencies. Z_n and finite-group
 * (discrete) anomalies are not checked.
 * Conditions (all sums must vanish; Witten: must be even):
 *   SU(N)^3 (N >= 3) and SO(6)^3 (as SU(4)): Σ A(R) — no other simple group has a cubic
 *   Casimir (Okubo, Phys. Rev. D 16 (1977) 3528);  G^2 U(1) for every non-abelian G: Σ T(R) q;
 *   U(1)^3: Σ q^3;  U(1)_a U(1)_b^2 (a ≠ b): Σ q_a q_b^2;  gravity^2 U(1): Σ q;
 *   Witten for SU(2), Sp(n) and SO(5) = Sp(4) (π4 = Z2): Σ 2T(R) even (the number of doublets
 *   for doublets only).
 * References: Bouchiat, Iliopoulos, Meyer, Phys. Lett. B 38 (1972) 519; Georgi & Glashow,
 * Phys. Rev. D 6 (1972) 429; Alvarez-Gaumé & Witten, Nucl. Phys. B 234 (1984) 269
 * (gravitational); Witten, Phys. Lett. B 117 (1982) 324 (SU(2) anomaly).
 */
import type { Theory } from '../../../shared/schemas/theory'
import { type Rational, ZERO, add, isZero, mul, rat, toString } from '../exact/rational'
import { buildTheoryModel } from './model'
import { suCubicAnomaly } from '../group/irrep'
import { type RepValue, repDimension, repIndex } from '../group/representation'
import { isFiniteKind, isLieKind } from '../../../shared/schemas/groupKinds'

export interface AnomalyCondition {
  /** e.g. "colour^3", "weak^2 Y", "Y^3", "Y X^2", "gravity^2 Y", "weak Witten". */
  name: string
  /** Exact sum over left-handed Weyl fields, as a rational string. */
  sum: string
  /** True when the condition is satisfied. */
  ok: boolean
}

interface Weyl {
  name: string
  reps: Map<string, RepValue>
  charges: Map<string, Rational>
  weight: number
}

/**
 * All anomaly conditions with their exact sums.
 * @example anomalyConditions(smeft).find(c => c.name === 'Y^3') // { name: 'Y^3', sum: '0', ok: true }
 */
export function anomalyConditions(theory: Theory): AnomalyCondition[] {
  const nonAbelian = theory.groups.filter((g) => isLieKind(g.type) || isFiniteKind(g.type))
  const gauged = nonAbelian.filter((g) => g.gauge && isLieKind(g.type))
  const u1 = theory.groups.filter((g) => g.gauge && g.type === 'U1').map((g) => g.name)
  const fermions = leftHanded(theory)
  const out: AnomalyCondition[] = []
  const push = (name: string, sum: Rational, ok = isZero(sum)) => out.push({ name, sum: toString(sum), ok })
  const total = (term: (f: Weyl) => Rational) => fermions.reduce((s, f) => add(s, mul(rat(f.weight), term(f))), ZERO)
  const others = (f: Weyl, skip: string) =>
    nonAbelian.reduce((d, g) => {
      const rep = f.reps.get(g.name)
      return g.name === skip || rep === undefined ? d : d * repDimension(g.type, g.n, rep)
    }, 1)
  for (const g of gauged) {
    const index = (f: Weyl): Rational => {
      const rep = f.reps.get(g.name)
      return rep === undefined ? ZERO : repIndex(g.type, g.n, rep)
    }
    const cubic = cubicAnomaly(g.type, g.n)
    if (cubic)
      push(
        `${g.name}^3`,
        total((f) => mul(rat(others(f, g.name)), cubic(f.reps.get(g.name)))),
      )
    for (const y of u1)
      push(
        `${g.name}^2 ${y}`,
        total((f) => mul(rat(others(f, g.name)), mul(index(f), charge(f, y)))),
      )
    if ((g.type === 'SU' && g.n === 2) || g.type === 'Sp' || (g.type === 'SO' && g.n === 5)) {
      const s = total((f) => mul(rat(2 * others(f, g.name)), index(f)))
      push(`${g.name} Witten`, s, s.den === 1n && s.num % 2n === 0n)
    }
  }
  for (const a of u1) {
    const dim = (f: Weyl) => rat(others(f, ''))
    push(
      `${a}^3`,
      total((f) => mul(dim(f), cube(charge(f, a)))),
    )
    for (const b of u1) {
      if (a !== b)
        push(
          `${a} ${b}^2`,
          total((f) => mul(dim(f), mul(charge(f, a), mul(charge(f, b), charge(f, b))))),
        )
    }
    push(
      `gravity^2 ${a}`,
      total((f) => mul(dim(f), charge(f, a))),
    )
  }
  return out
}

/** A(R) of SU(N >= 3), and of SO(6) through SU(4) (D3 labels [a1, a2, a3] = A3 labels [a2, a1, a3]); null when G has no cubic Casimir. */
function cubicAnomaly(kind: string, n: number | undefined): ((rep: RepValue | undefined) => Rational) | null {
  const labels = (rep: RepValue | undefined, k: number): number[] => (rep === undefined || typeof rep === 'string' ? new Array<number>(k).fill(0) : rep.slice())
  if (kind === 'SU' && n! >= 3) return (rep) => suCubicAnomaly(n!, labels(rep, n! - 1))
  if (kind === 'SO' && n === 6)
    return (rep) => {
      const a = labels(rep, 3)
      return suCubicAnomaly(4, [a[1]!, a[0]!, a[2]!])
    }
  return null
}

/**
 * The failed anomaly conditions (empty when the fermion content is anomaly free).
 * @example checkAnomalies(smeftWithoutE) // [{ name: 'Y^3', sum: '-3', ok: false }, { name: 'gravity^2 Y', sum: '-3', ok: false }]
 */
export function checkAnomalies(theory: Theory): AnomalyCondition[] {
  return anomalyConditions(theory).filter((c) => !c.ok)
}

/** The (1/2,0) species of the model: left-weyl fields and the conjugates of right-weyl ones. */
function leftHanded(theory: Theory): Weyl[] {
  const model = buildTheoryModel(theory)
  return model.species
    .filter((s) => s.lorentz === 'L')
    .map((s) => {
      const reps = new Map<string, RepValue>([...Object.entries(s.reps), ...Object.entries(s.lie)])
      for (const g of model.finite) reps.set(g.name, g.table.irreps[s.finite[g.name]!]!.name)
      return { name: s.label, reps, charges: new Map(Object.entries(s.u1)), weight: s.flavors }
    })
}

function charge(f: Weyl, group: string): Rational {
  return f.charges.get(group) ?? ZERO
}

function cube(q: Rational): Rational {
  return mul(q, mul(q, q))
}
