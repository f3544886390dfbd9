/**
 * Gauge anomaly conditions of the chiral fermions of a theory.
 *
 * Conventions: every fermion is written as a left-handed Weyl field; a right-handed field
 * ("lorentz": "right-weyl") enters as its conjugate (conjugate SU(n) rep, negated U(1) charges),
 * as the (1/2,0) species of the theory model (model.ts).
 * Each Weyl field is weighted by its flavor number and the dimensions of its representations
 * under the other SU(n) groups. Only gauge groups (gauge: true) are checked: anomalies of
 * global symmetries are not inconsistencies. Z_n (discrete) anomalies are not checked.
 * Conditions (all sums must vanish; SU(2) Witten: must be even):
 *   SU(N)^3 (N >= 3): Σ A(R);  SU(N)^2 U(1): Σ T(R) q;  U(1)^3: Σ q^3;
 *   U(1)_a U(1)_b^2 (a ≠ b): Σ q_a q_b^2;  gravity^2 U(1): Σ q;
 *   SU(2) Witten: Σ 2T(R) (the number of doublets for doublets only) even.
 * References: Bouchiat, Iliopoulos, Meyer, Phys. Lett. B 38 (1972) 519; Georgi & Glashow,
 * Phys. Rev. D 6 (1972) 429; Alvarez-Gaumé & Witten, Nucl. Phys. B 234 (1984) 269
 * (gravitational); Witten, Phys. Lett. B 117 (1982) 324 (SU(2) anomaly).
 */
import type { Theory } from '../../../shared/schemas/theory'
import { type Rational, ZERO, add, isZero, mul, rat, toString } from '../exact/rational'
import { buildTheoryModel } from './model'
import { suCubicAnomaly, suIndex } from '../group/irrep'
import { suDimension } from '../group/weights'

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
  reps: Map<string, number[]>
  charges: Map<string, Rational>
  weight: number
}

/**
 * All anomaly conditions with their exact sums.
 * @example anomalyConditions(smeft).find(c => c.name === 'Y^3') // { name: 'Y^3', sum: '0', ok: true }
 */
export function anomalyConditions(theory: Theory): AnomalyCondition[] {
  const su = theory.groups.filter((g) => g.gauge && g.type === 'SU').map((g) => ({ name: g.name, n: g.n! }))
  const u1 = theory.groups.filter((g) => g.gauge && g.type === 'U1').map((g) => g.name)
  const fermions = leftHanded(theory)
  const out: AnomalyCondition[] = []
  const push = (name: string, sum: Rational, ok = isZero(sum)) => out.push({ name, sum: toString(sum), ok })
  const total = (term: (f: Weyl) => Rational) => fermions.reduce((s, f) => add(s, mul(rat(f.weight), term(f))), ZERO)
  const others = (f: Weyl, skip: string) =>
    su.reduce((d, g) => (g.name === skip ? d : d * suDimension(g.n, f.reps.get(g.name) ?? zeros(g.n))), 1)
  for (const g of su) {
    const rep = (f: Weyl) => f.reps.get(g.name) ?? zeros(g.n)
    if (g.n >= 3) push(`${g.name}^3`, total((f) => mul(rat(others(f, g.name)), suCubicAnomaly(g.n, rep(f)))))
    for (const y of u1) push(`${g.name}^2 ${y}`, total((f) => mul(rat(others(f, g.name)), mul(suIndex(g.n, rep(f)), charge(f, y)))))
    if (g.n === 2) {
      const s = total((f) => mul(rat(2 * others(f, g.name)), suIndex(2, rep(f))))
      push(`${g.name} Witten`, s, s.den === 1n && s.num % 2n === 0n)
    }
  }
  for (const a of u1) {
    const dim = (f: Weyl) => rat(others(f, ''))
    push(`${a}^3`, total((f) => mul(dim(f), cube(charge(f, a)))))
    for (const b of u1) {
      if (a !== b) push(`${a} ${b}^2`, total((f) => mul(dim(f), mul(charge(f, a), mul(charge(f, b), charge(f, b))))))
    }
    push(`gravity^2 ${a}`, total((f) => mul(dim(f), charge(f, a))))
  }
  return out
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
  return buildTheoryModel(theory).species.filter((s) => s.lorentz === 'L').map((s) => ({
    name: s.label, reps: new Map(Object.entries(s.reps)), charges: new Map(Object.entries(s.u1)), weight: s.flavors,
  }))
}

function charge(f: Weyl, group: string): Rational {
  return f.charges.get(group) ?? ZERO
}

function cube(q: Rational): Rational {
  return mul(q, mul(q, q))
}

function zeros(n: number): number[] {
  return new Array<number>(n - 1).fill(0)
}
