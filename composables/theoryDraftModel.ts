// The editor's form model of a theory file, and the exact conversions both ways.
// Pure TypeScript (no Vue): the draft keeps every input as the text the user typed, so that a
// half-typed value is never lost, and converts to the theory file that TheorySchema validates.
// Groups carry a stable `uid`, so that renaming a group keeps the field roster's labels on it.
import type { Theory } from '../shared/schemas/theory'
import type { DraftGroup, DraftIssue } from './theoryDraft/draftTypes'
import { LORENTZ_KINDS, type LorentzKind } from '../shared/schemas/lorentzKind'
import { GROUP_KINDS, type GroupKind, groupKindLabel, takesN } from '../shared/schemas/groupKinds'
import { type DraftLabels, asText as text, isRecord, labelsToDraft, labelsToTheory } from './theoryDraft/labels'
import { type DraftHeavy, heavyToDraft, heavyToTheory } from './theoryDraft/heavyBlock'
import { type DraftGoldstone, goldstoneToDraft, goldstoneToTheory } from './theoryDraft/goldstoneBlock'
import { type DraftCoupling, type DraftMass, couplingToDraft, couplingToTheory, massToDraft, massToTheory } from './theoryDraft/couplingsBlock'

export type { DraftHeavy, DraftGroup, DraftIssue, GroupKind, DraftCoupling, DraftMass }

export type CountingKind = 'massRatio' | 'velocity' | 'momentumRatio' | 'custom'

export interface DraftField extends DraftLabels {
  uid: string
  name: string
  lorentz: LorentzKind
  real: boolean
  /** uid of a group of the draft, or "?NAME" for a group name the file names but does not declare. */
  gaugeOf: string
  flavors: string
  /** The mass symbol (and value) used when the field is integrated out; all empty = none. */
  mass: DraftMass
  /** How papers print the field (φ, \bar{N}); empty = the plain name. */
  display: string
  description?: string
}
export interface DraftWeight {
  uid: string
  block: string
  value: string
}
export interface DraftRule {
  uid: string
  name: string
  kind: CountingKind
  weights: DraftWeight[]
  offset: string
  parameter?: unknown
  description?: string
}
export interface TheoryDraft {
  name: string
  description: string
  frame: 'relativistic' | 'heavy' | 'goldstone'
  maxOrder: string
  groups: DraftGroup[]
  fields: DraftField[]
  countingRules: DraftRule[]
  /** True when the file had a countingRules key (kept even when empty). */
  hasRules: boolean
  /** The heavy-particle block; written to the file only while the frame is "heavy". */
  heavy?: DraftHeavy
  /** The Goldstone block; written to the file only while the frame is "goldstone". */
  goldstone?: DraftGoldstone
  /** Symbols (and values) of order-0 operators; written when there is at least one. */
  couplings: DraftCoupling[]
}

let counter = 0
export function newUid(prefix = 'u'): string {
  counter += 1
  return `${prefix}${counter}`
}

export function emptyDraft(): TheoryDraft {
  return { name: '', description: '', frame: 'relativistic', maxOrder: '', groups: [], fields: [], countingRules: [], hasRules: false, couplings: [] }
}

export function newGroup(): DraftGroup {
  return { uid: newUid('g'), name: '', type: 'U1', n: '', gauge: true }
}

export function newField(): DraftField {
  return {
    uid: newUid('f'),
    name: '',
    lorentz: 'scalar',
    real: false,
    gaugeOf: '',
    flavors: '',
    mass: { symbol: '', number: '', unit: '' },
    display: '',
    reps: {},
    charges: {},
    strayReps: {},
    strayCharges: {},
  }
}

export function newCoupling(): DraftCoupling {
  return { uid: newUid('c'), class: '', operator: '', symbol: '', number: '', unit: '' }
}

export function newRule(): DraftRule {
  return { uid: newUid('r'), name: '', kind: 'massRatio', weights: [], offset: '' }
}

const list = (v: unknown): unknown[] => (Array.isArray(v) ? v : [])

/**
 * The draft of a theory file (a parsed JSON object, valid or not: unknown keys are dropped,
 * missing ones left empty). Throws when the input is not an object.
 */
export function theoryToDraft(input: unknown): TheoryDraft {
  if (!isRecord(input)) throw new Error('a theory file is a JSON object with "name", "frame", "groups" and "fields"')
  const groups: DraftGroup[] = list(input.groups).map((g) => {
    const r = isRecord(g) ? g : {}
    const type = ((GROUP_KINDS as readonly string[]).includes(String(r.type)) ? r.type : 'U1') as GroupKind
    return { uid: newUid('g'), name: text(r.name), type, n: text(r.n), gauge: r.gauge !== false, ...(r.description !== undefined ? { description: text(r.description) } : {}) }
  })
  const byName = new Map(groups.map((g) => [g.name, g.uid]))
  const fields = list(input.fields).map((f) => fieldToDraft(isRecord(f) ? f : {}, byName))
  const rules = list(input.countingRules).map((r) => ruleToDraft(isRecord(r) ? r : {}))
  const frame = input.frame === 'heavy' || input.frame === 'goldstone' ? input.frame : 'relativistic'
  return {
    name: text(input.name),
    description: text(input.description),
    frame,
    maxOrder: text(input.maxOrder),
    groups,
    fields,
    countingRules: rules,
    hasRules: Array.isArray(input.countingRules),
    ...(input.heavy !== undefined ? { heavy: heavyToDraft(input.heavy, byName) } : {}),
    ...(input.goldstone !== undefined ? { goldstone: goldstoneToDraft(input.goldstone) } : {}),
    couplings: list(input.couplings).map((c) => couplingToDraft(c, newUid('c'))),
  }
}

function fieldToDraft(f: Record<string, unknown>, byName: Map<string, string>): DraftField {
  const out = newField()
  out.name = text(f.name)
  out.lorentz = LORENTZ_KINDS.find((k) => k === f.lorentz) ?? 'scalar'
  out.real = f.real === true
  out.flavors = text(f.flavors)
  out.display = text(f.display)
  if (f.gaugeOf !== undefined) out.gaugeOf = byName.get(text(f.gaugeOf)) ?? `?${text(f.gaugeOf)}`
  Object.assign(out, labelsToDraft(f.reps, f.charges, byName))
  const mass = massToDraft(f.mass)
  if (mass) out.mass = mass
  if (f.description !== undefined) out.description = text(f.description)
  return out
}

function ruleToDraft(r: Record<string, unknown>): DraftRule {
  const kinds = ['massRatio', 'velocity', 'momentumRatio', 'custom']
  const weights = Object.entries(isRecord(r.weights) ? r.weights : {}).map(([block, value]) => ({ uid: newUid('w'), block, value: text(value) }))
  return {
    uid: newUid('r'),
    name: text(r.name),
    kind: (kinds.includes(String(r.kind)) ? r.kind : 'massRatio') as CountingKind,
    weights,
    offset: text(r.offset),
    ...(r.parameter !== undefined ? { parameter: r.parameter } : {}),
    ...(r.description !== undefined ? { description: text(r.description) } : {}),
  }
}

/**
 * The theory file of a draft (to be validated by TheorySchema), with the problems found while
 * reading typed numbers (those values are left out of the file and reported at their path).
 */
export function draftToTheory(d: TheoryDraft): { theory: Record<string, unknown>; issues: DraftIssue[] } {
  const issues: DraftIssue[] = []
  const names = new Map(d.groups.map((g) => [g.uid, g.name]))
  const theory: Record<string, unknown> = { name: d.name.trim() }
  if (d.description.trim()) theory.description = d.description
  theory.frame = d.frame
  const maxOrder = readInt(d.maxOrder, ['maxOrder'], issues, 'must be a whole number, e.g. 8')
  if (maxOrder !== undefined) theory.maxOrder = maxOrder
  theory.groups = d.groups.map((g, i) => {
    const out: Record<string, unknown> = { name: g.name.trim(), type: g.type }
    const label = g.type === 'Z' ? 'Z_n' : groupKindLabel(g.type)
    const n = takesN(g.type) ? readInt(g.n, ['groups', i, 'n'], issues, `must be a whole number (the n of ${label})`) : undefined
    if (n !== undefined) out.n = n
    if (takesN(g.type) && n === undefined && !g.n.trim()) issues.push({ path: ['groups', i, 'n'], message: `is required: ${label} needs n` })
    out.gauge = g.gauge
    if (g.description !== undefined) out.description = g.description
    return out
  })
  theory.fields = d.fields.map((f, i) => fieldToTheory(f, i, d.groups, names, issues))
  if (d.hasRules || d.countingRules.length) theory.countingRules = d.countingRules.map(ruleToTheory)
  if (d.heavy !== undefined && d.frame === 'heavy') theory.heavy = heavyToTheory(d.heavy, d.groups, issues)
  if (d.goldstone !== undefined && d.frame === 'goldstone') theory.goldstone = goldstoneToTheory(d.goldstone, issues)
  if (d.couplings.length) theory.couplings = d.couplings.map(couplingToTheory)
  return { theory, issues }
}

function fieldToTheory(f: DraftField, i: number, groups: DraftGroup[], names: Map<string, string>, issues: DraftIssue[]) {
  const out: Record<string, unknown> = { name: f.name.trim(), lorentz: f.lorentz }
  labelsToTheory(f, groups, out, ['fields', i], issues)
  if (f.lorentz === 'scalar' && f.real) out.real = true
  const flavors = readInt(f.flavors, ['fields', i, 'flavors'], issues, 'must be a whole number from 1 to 6')
  if (flavors !== undefined) out.flavors = flavors
  if (f.lorentz === 'field-strength' || f.gaugeOf) {
    const g = f.gaugeOf.startsWith('?') ? f.gaugeOf.slice(1) : names.get(f.gaugeOf)
    if (g !== undefined && f.lorentz === 'field-strength') out.gaugeOf = g
  }
  const mass = massToTheory(f.mass)
  if (mass) out.mass = mass
  if (f.display.trim()) out.display = f.display.trim()
  if (f.description !== undefined) out.description = f.description
  return out
}

function ruleToTheory(r: DraftRule): Record<string, unknown> {
  const out: Record<string, unknown> = { name: r.name.trim(), kind: r.kind }
  if (r.weights.length) out.weights = Object.fromEntries(r.weights.map((w) => [w.block.trim(), w.value.trim()]))
  if (r.offset.trim()) out.offset = r.offset.trim()
  if (r.parameter !== undefined) out.parameter = r.parameter
  if (r.description !== undefined) out.description = r.description
  return out
}

function readInt(raw: string, path: (string | number)[], issues: DraftIssue[], message: string): number | undefined {
  const t = raw.trim()
  if (!t) return undefined
  if (/^-?\d{1,6}$/.test(t)) return Number(t)
  issues.push({ path, message: `${message}, not "${t}"` })
  return undefined
}

/** Where an issue is shown: its path cut to the depth of one input ("fields.4.charges.Y"). */
export function issueKey(path: readonly PropertyKey[]): string {
  if (path[0] === 'goldstone')
    return path
      .slice(0, path[1] === 'sources' ? 3 : 2)
      .map(String)
      .join('.')
  if (path[0] === 'heavy') {
    const depth = path[1] === 'particle' && (path[2] === 'reps' || path[2] === 'charges') ? 4 : path[1] === 'particle' || path[1] === 'antiparticle' ? 3 : 2
    return path.slice(0, depth).map(String).join('.')
  }
  const depth =
    path[0] === 'fields' && (path[2] === 'reps' || path[2] === 'charges')
      ? 4
      : path[0] === 'countingRules' && path[2] === 'weights'
        ? 4
        : path[0] === 'groups' || path[0] === 'fields' || path[0] === 'countingRules' || path[0] === 'couplings'
          ? 3
          : 1
  return path.slice(0, depth).map(String).join('.')
}

export type { Theory }
