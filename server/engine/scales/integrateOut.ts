/**
 * One step of a tower: remove heavy fields from a theory at a threshold scale and report the
 * threshold tags and the kinds of operators the heavy fields can generate.
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import type { Theory, TheoryField } from '../../../shared/schemas/theory'
import { generatedClassHints, type GeneratedClassHint } from './generatedClasses'
import { fieldBetaContribution, thresholdShifts } from './thresholdShifts'
import { toString as ratText } from '../exact/rational'
import { toMeV } from './units'
import { checkMassPartners } from './massPartners'
import { anomalyConditions } from '../theory/anomalies'

export interface ThresholdScale {
  name?: string
  value: number
  unit: string
}
/** betaShift: the field's exact contribution to the one-loop b of the group (see fieldBetaContribution). */
export interface ThresholdTag {
  group: string
  field: string
  text: string
  betaShift: string
}
export interface IntegrateOutResult {
  child: Theory
  thresholdScale: { name?: string; value: number; unit: string; valueMeV: number }
  thresholdTags: ThresholdTag[]
  generatedClasses: GeneratedClassHint[]
}

function removedFieldsOf(theory: Theory, names: readonly string[]): TheoryField[] {
  if (names.length === 0) throw new EngineInputError('integrateOut', 'Choose at least one heavy field to integrate out')
  const byName = new Map(theory.fields.map((f) => [f.name, f]))
  return names.map((n) => {
    const f = byName.get(n)
    if (!f) throw new EngineInputError('integrateOut', `Theory "${theory.name}" has no field "${n}"; choose fields of its roster`)
    if (f.lorentz === 'field-strength') throw new EngineInputError('integrateOut', `Field "${n}" is a gauge field strength; only matter fields can be integrated out`)
    return f
  })
}

/** The theory below the threshold: the removed fields, their couplings and counting-rule blocks gone. */
export function childTheory(theory: Theory, removed: Set<string>, scaleText: string): Theory {
  const dropBlock = (k: string) => removed.has(k.replace(/\*$/, ''))
  const rules = theory.countingRules?.map((r) => (r.weights ? { ...r, weights: Object.fromEntries(Object.entries(r.weights).filter(([k]) => !dropBlock(k))) } : r))
  const name = `${theory.name} below ${scaleText}`.slice(0, 80)
  const note = `Obtained from "${theory.name}" by integrating out ${[...removed].join(', ')} at ${scaleText}.`
  return {
    ...theory,
    name,
    description: theory.description ? `${theory.description}\n${note}`.slice(0, 2000) : note,
    fields: theory.fields.filter((f) => !removed.has(f.name)),
    ...(rules ? { countingRules: rules } : {}),
    ...(theory.couplings ? { couplings: theory.couplings.filter((c) => !mentionsRemoved(c.class, removed)) } : {}),
  }
}

/** A coupling's class names a removed field ("S", "S*", "S^2"): the operator is gone below the threshold. */
function mentionsRemoved(classText: string, removed: Set<string>): boolean {
  return classText
    .trim()
    .split(/\s+/)
    .some((t) => removed.has(t.replace(/\^\d+$/, '').replace(/\*$/, '')))
}

/**
 * Refuse a set that leaves an inconsistent child: a fermion without a mass partner in the set
 * (half of a Dirac pair). A vector-like set cannot change the anomaly conditions; that is checked too.
 * The message names the fields and offers the partners to add.
 */
function checkIntegrity(theory: Theory, child: Theory, names: readonly string[]): void {
  const { problems, partners } = checkMassPartners(theory, names)
  if (problems.length) {
    const offer = partners.length ? ` Integrate out ${[...names, ...partners].join(', ')} together.` : ''
    throw new EngineInputError('integrateOut', `These fields cannot be integrated out as chosen. ${problems.join(' ')}${offer}`)
  }
  const before = new Map(anomalyConditions(theory).map((c) => [c.name, c.ok]))
  const broken = anomalyConditions(child).filter((c) => !c.ok && before.get(c.name) !== false)
  if (broken.length) {
    const list = broken.map((c) => `${c.name} (sum ${c.sum})`).join(', ')
    // A vector-like set carries no anomaly, so this is a bug in the partner check, never hidden.
    throw new EngineConsistencyError('integrateOut', `Removing ${names.join(', ')} leaves a theory with gauge anomalies the original does not have: ${list}`)
  }
}

/**
 * The child theory below a threshold, with threshold tags and generated-operator hints.
 * @example integrateOut(qedWithMuon, ['mu'], { value: 105.6583755, unit: 'MeV' }).thresholdTags
 *   // [{ group: 'QED', field: 'mu', text: 'coefficient shifts when mu is integrated out', betaShift: '2/3' }]
 * Method: check that every removed fermion has its mass partner in the set (massPartners.ts) and
 * that no anomaly appears below; remove the fields; tag every gauge group under which a removed field is charged.
 * Reference: S. Weinberg, Phys. Lett. B 91 (1980) 51 (effective gauge theories at thresholds).
 */
export function integrateOut(theory: Theory, fieldNames: readonly string[], thresholdScale: ThresholdScale): IntegrateOutResult {
  if (theory.frame !== 'relativistic') {
    throw new EngineInputError('integrateOut', `Theory "${theory.name}" uses the ${theory.frame} frame; fields can be integrated out of relativistic theories only`)
  }
  const removed = removedFieldsOf(theory, fieldNames)
  const valueMeV = toMeV(thresholdScale.value, thresholdScale.unit)
  const names = new Set(removed.map((f) => f.name))
  if (names.size !== removed.length) throw new EngineInputError('integrateOut', `A field is named more than once (${fieldNames.join(', ')}); name each heavy field once`)
  const scaleText = `${thresholdScale.name ? `${thresholdScale.name} = ` : ''}${thresholdScale.value} ${thresholdScale.unit}`
  const byName = new Map(removed.map((f) => [f.name, f]))
  const groupOf = new Map(theory.groups.map((g) => [g.name, g]))
  const thresholdTags = thresholdShifts(removed, theory.groups).flatMap((s) =>
    s.fields.map((field) => ({
      group: s.group,
      field,
      text: `coefficient shifts when ${field} is integrated out`,
      betaShift: ratText(fieldBetaContribution(byName.get(field)!, groupOf.get(s.group)!, theory.groups)),
    })),
  )
  const child = childTheory(theory, names, scaleText)
  checkIntegrity(theory, child, [...names])
  return {
    child,
    thresholdScale: { ...thresholdScale, valueMeV },
    thresholdTags,
    generatedClasses: removed.flatMap((f) => generatedClassHints(f, theory.groups)),
  }
}
