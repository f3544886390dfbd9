/**
 * Candidate operators of a class: every Lorentz structure times every gauge contraction.
 * U(1) and Z_N charges only select the class (charge conservation).
 */
import { EngineInputError } from '../errors'
import { add as ratAdd, isZero, ZERO } from '../exact/rational'
import type { Theory } from '../../../shared/schemas/theory'
import type { OperatorClass } from './classKey'
import { lorentzStructures, type LorentzStructure } from './lorentzStructures'
import { suStructures, type SuStructure } from './gaugeStructures'
import { speciesShape } from './species'
import { loopPlan } from './tensorLoops'

export interface Candidate {
  lorentz: LorentzStructure
  /** One contraction per SU(N) group under which some leg is charged. */
  gauge: SuStructure[]
}

/**
 * True when every U(1) charge sums to 0 and every Z_N charge to 0 mod N.
 * @example chargesConserved(smeft, class "L^2 H^2") // true (Y: 2·(−1/2) + 2·(1/2) = 0)
 */
export function chargesConserved(t: Theory, c: OperatorClass): boolean {
  for (const g of t.groups) {
    if (g.type === 'U1') {
      const q = c.legs.reduce((s, p) => ratAdd(s, p.u1[g.name] ?? ZERO), ZERO)
      if (!isZero(q)) return false
    } else if (g.type === 'Z') {
      const q = c.legs.reduce((s, p) => s + (p.zn[g.name] ?? 0), 0)
      if (q % (g.n ?? 1) !== 0) return false
    }
  }
  return true
}

/**
 * Per SU group with charged legs, its list of contractions (empty list = no invariant).
 * @example gaugeFactorLists(smeft, class "G_L^3") // [[tr(X1X2X3), tr(X1X3X2)]]
 */
export function gaugeFactorLists(t: Theory, c: OperatorClass): SuStructure[][] {
  const lists: SuStructure[][] = []
  for (const g of t.groups) {
    if (g.type !== 'SU') continue
    const kinds = c.legs.map((p) => p.suKind[g.name] ?? 'singlet')
    if (kinds.every((k) => k === 'singlet')) continue
    const shapes = c.legs.map((p) => speciesShape(p, g.name, g.n ?? 0))
    lists.push(suStructures(g.name, g.n ?? 0, kinds, shapes))
  }
  return lists
}

/**
 * All candidates of a class (empty when charges are not conserved or no invariant exists).
 * @example classCandidates(photons, F_L^2 F_R^2 class).length // 1: ⟨12⟩²[34]²
 * Method: Shadmi & Weiss, JHEP 02 (2019) 165 (Lorentz part); δ/ε contractions (gauge part).
 */
export function classCandidates(t: Theory, c: OperatorClass): { lorentz: LorentzStructure[]; gauge: SuStructure[][]; candidates: Candidate[] } {
  if (c.legs.length > 12) throw new EngineInputError('classCandidates', `The class ${c.key} has ${c.legs.length} fields; explicit bases support at most 12; lower the maximum dimension`)
  let gauge: SuStructure[][] = chargesConserved(t, c) ? [[]] : []
  for (const list of gauge.length ? gaugeFactorLists(t, c) : []) gauge = gauge.flatMap((g) => list.map((s) => [...g, s]))
  const lorentz =
    gauge.length === 0
      ? []
      : lorentzStructures(
          c.legs.map((p) => p.angles),
          c.legs.map((p) => p.squares),
          c.k,
        )
  const candidates: Candidate[] = []
  for (const l of lorentz) for (const g of gauge) candidates.push({ lorentz: l, gauge: g })
  checkTensorBudget(c, candidates)
  return { lorentz, gauge, candidates }
}

/** Index-loop terms (about 2 µs each) allowed for one class with tensor legs: about 20 s. */
const TENSOR_BUDGET = 1e7

/**
 * Refuse classes with higher-representation (tensor) legs whose evaluation would take too
 * long: work ≈ candidates (columns) × candidates (points) × leg permutations × loop terms.
 */
function checkTensorBudget(c: OperatorClass, candidates: Candidate[]): void {
  if (!c.legs.some((p) => Object.values(p.suKind).includes('other')) || candidates.length === 0) return
  const leaves = Math.max(...candidates.map((k) => k.gauge.reduce((x, s) => x * loopPlan(s).leaves, 1)))
  const counts = new Map<string, number>()
  for (const p of c.legs) counts.set(p.label, (counts.get(p.label) ?? 0) + 1)
  const perms = [...counts.values()].reduce((x, m) => x * factorial(m), 1)
  const work = candidates.length ** 2 * perms * leaves
  if (work > TENSOR_BUDGET) {
    throw new EngineInputError(
      'classCandidates',
      `class ${c.key}: writing it out needs about ${work.toExponential(1)} index-loop terms (${candidates.length} candidate operators, ${perms} permutations of identical fields, ${leaves} terms per contraction), beyond the budget of ${TENSOR_BUDGET.toExponential(0)} for fields in higher representations; its count is given by the Hilbert series`,
    )
  }
}

function factorial(m: number): number {
  return m <= 1 ? 1 : m * factorial(m - 1)
}
