/**
 * What the gauge β functions of a theory see: its running gauge groups (simple groups and
 * U(1)s, theory order) and its matter multiplets (Weyl fermions, complex and real scalars,
 * with flavours, representations, charges) each with the mass below which it decouples.
 *
 * A tower gives the masses: walking from the lowest theory up, the fields a step removed
 * are heavy with the step's threshold scale; the lowest theory's fields are light (mass 0).
 * Field strengths are not matter; a heavy-frame theory's heavy particle is static and does
 * not run (its loops are absent in that frame), so only its roster counts.
 */
import { EngineInputError } from '../../errors'
import { parseRational, type Rational } from '../../exact/rational'
import type { Theory, TheoryField, TheoryGroup } from '../../../../shared/schemas/theory'
import { hasRunningCoupling } from './groupFactors'

export type MatterKind = 'weyl' | 'complex-scalar' | 'real-scalar'

export interface GaugeGroupInfo {
  name: string
  group: TheoryGroup
  abelian: boolean
}

export interface GaugeMultiplet {
  name: string
  kind: MatterKind
  flavors: number
  /** Dynkin labels per simple group name (absent = singlet). */
  reps: Record<string, readonly number[]>
  /** Charge per U(1) name (absent = 0). */
  charges: Record<string, Rational>
  /** Active for μ > massGeV; 0 for a field of the lowest theory. */
  massGeV: number
  /** The theory the field was integrated out of (the lowest theory for light fields). */
  theory: string
}

export interface GaugeContent {
  groups: GaugeGroupInfo[]
  multiplets: GaugeMultiplet[]
  /** Theories of the tower, top first, with the scale each was obtained at (null for the top). */
  chain: { name: string; thresholdGeV: number | null }[]
}

/** One theory of a tower and the scale (GeV) at which it was obtained from the one above it. */
export interface TowerStep {
  theory: Theory
  thresholdGeV: number | null
}

const fail = (message: string): never => {
  throw new EngineInputError('gaugeContent', message)
}

function matterKind(f: TheoryField): MatterKind | null {
  if (f.lorentz === 'field-strength') return null
  if (f.lorentz === 'scalar') return f.real ? 'real-scalar' : 'complex-scalar'
  return 'weyl'
}

function multiplet(f: TheoryField, kind: MatterKind, groups: GaugeGroupInfo[], massGeV: number, theory: string): GaugeMultiplet {
  const reps: Record<string, readonly number[]> = {}
  const charges: Record<string, Rational> = {}
  for (const g of groups) {
    const rep = f.reps?.[g.name]
    if (!g.abelian && rep && typeof rep !== 'string') reps[g.name] = rep
    if (g.abelian && f.charges?.[g.name] !== undefined) charges[g.name] = parseRational(String(f.charges[g.name]))
  }
  return { name: f.name, kind, flavors: f.flavors ?? 1, reps, charges, massGeV, theory }
}

function sameGroups(a: Theory, b: Theory): boolean {
  const key = (t: Theory) => JSON.stringify(t.groups.filter(hasRunningCoupling).map((g) => [g.name, g.type, g.n ?? null]))
  return key(a) === key(b)
}

function checkStep(above: TowerStep, below: TowerStep): void {
  const t = below.thresholdGeV
  if (t === null || !Number.isFinite(t) || t <= 0) fail(`The threshold scale of “${below.theory.name}” below “${above.theory.name}” is missing or not a positive number of GeV.`)
  if (!sameGroups(above.theory, below.theory)) {
    fail(`“${below.theory.name}” and the theory above it, “${above.theory.name}”, have different gauge groups; the running through a tower needs the same gauge groups on every step.`)
  }
  const aboveNames = new Set(above.theory.fields.map((f) => f.name))
  for (const f of below.theory.fields) {
    if (!aboveNames.has(f.name))
      fail(
        `The field ${f.name} appears in “${below.theory.name}” but not in the theory above it, “${above.theory.name}”: a tower only removes fields going down. Add ${f.name} above or remove it below.`,
      )
  }
  if (above.thresholdGeV !== null && t! >= above.thresholdGeV) {
    fail(`“${below.theory.name}” is obtained at ${t} GeV, not below the threshold of “${above.theory.name}” (${above.thresholdGeV} GeV): the thresholds of a tower must fall going down.`)
  }
}

/**
 * The gauge content of the lowest theory of a tower, with the heavier fields of the theories
 * above it and their masses (the thresholds at which they were integrated out).
 * @example towerGaugeContent([{ theory: qedWithMuon, thresholdGeV: null }, { theory: qed, thresholdGeV: 0.1057 }])
 *   .multiplets.map(m => [m.name, m.massGeV]) // [['e', 0], ['muL', 0.1057], ['muR', 0.1057]]
 * Method: bottom-up walk; a field missing from the theory below a step has the step's mass.
 * Reference: S. Weinberg, Phys. Lett. B 91 (1980) 51 (a heavy field leaves the running below its mass).
 */
export function towerGaugeContent(steps: readonly TowerStep[]): GaugeContent {
  if (steps.length === 0) fail('The tower has no theory.')
  for (let i = 1; i < steps.length; i++) checkStep(steps[i - 1]!, steps[i]!)
  const bottom = steps[steps.length - 1]!.theory
  const groups: GaugeGroupInfo[] = bottom.groups.filter(hasRunningCoupling).map((g) => ({ name: g.name, group: g, abelian: g.type === 'U1' }))
  const multiplets: GaugeMultiplet[] = []
  const add = (f: TheoryField, mass: number, theory: string) => {
    const kind = matterKind(f)
    if (kind) multiplets.push(multiplet(f, kind, groups, mass, theory))
  }
  bottom.fields.forEach((f) => add(f, 0, bottom.name))
  for (let i = steps.length - 1; i >= 1; i--) {
    const below = new Set(steps[i]!.theory.fields.map((f) => f.name))
    const above = steps[i - 1]!.theory
    above.fields.filter((f) => !below.has(f.name)).forEach((f) => add(f, steps[i]!.thresholdGeV!, above.name))
  }
  return { groups, multiplets, chain: steps.map((s) => ({ name: s.theory.name, thresholdGeV: s.thresholdGeV })) }
}

/** The gauge content of one theory on its own: every field light. @example gaugeContentOf(smeft).groups.length // 3 */
export function gaugeContentOf(theory: Theory): GaugeContent {
  return towerGaugeContent([{ theory, thresholdGeV: null }])
}
