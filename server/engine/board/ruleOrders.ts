/**
 * Orders of the board's operators under any counting rule of the theory, so the board can
 * switch rules and show which operators change order. Relativistic operators are read from
 * their class key; heavy-frame operators carry their building-block terms.
 */
import { EngineInputError } from '../errors'
import { resolveRule, type RuleContext } from '../rules/defaultWeights'
import { orderOfOperator, formatOrder } from '../rules/orderOf'
import { blocksFromClassKey } from '../rules/classKeyBlocks'
import { lightFields } from '../heavy/lightFields'
import type { CountingRule } from '../../../shared/schemas/countingRules'
import type { Theory } from '../../../shared/schemas/theory'
import { buildTheoryModel } from '../theory/model'

/** The parts of a stored theory file the counting rules read. */
export interface RuleTheory {
  frame?: string
  groups?: Theory['groups']
  fields?: Theory['fields']
  heavy?: { particle: { name: string }; antiparticle?: { name: string } }
  countingRules?: CountingRule[]
}

/** The mass-ratio rule every theory has, named as the board shows it. */
export const DEFAULT_RULE: CountingRule = { name: 'mass ratio (E/M)', kind: 'massRatio' }

/** The rules a theory offers: its own, with the mass-ratio rule first when it has none of that kind. */
export function rulesOf(theory: RuleTheory): CountingRule[] {
  const own = theory.countingRules ?? []
  return own.some((r) => r.kind === 'massRatio') ? own : [DEFAULT_RULE, ...own]
}

function contextOf(theory: RuleTheory): RuleContext {
  if (theory.frame === 'heavy') {
    if (!theory.heavy) throw new EngineInputError('ruleOrders', 'A theory in the heavy-particle frame needs its heavy particle; declare it in the editor')
    const light = lightFields(theory.fields ?? [], theory.groups ?? []).fields.map((f) => ({ name: f.name, dim: f.kind === 'dirac' ? '3/2' : '1' }))
    return { frame: 'heavy', particle: theory.heavy.particle.name, antiparticle: theory.heavy.antiparticle?.name, light }
  }
  const roster = { name: '', frame: 'relativistic' as const, groups: theory.groups ?? [], fields: theory.fields ?? [] }
  return { frame: 'relativistic', species: buildTheoryModel(roster).species }
}

/**
 * Exact order (as "p/q" text) of every operator under the named rule.
 * @example ruleOrders(smeft, 'mass ratio (E/M)', [{ id: 1, classKey: 'H^3 H*^3' }]) // { 1: '2' }
 */
export function ruleOrders(theory: RuleTheory, ruleName: string, operators: { id: number; classKey: string; terms?: Record<string, number>[] }[]): Record<number, string> {
  const rule = rulesOf(theory).find((r) => r.name === ruleName)
  if (!rule) throw new EngineInputError('ruleOrders', `The theory has no counting rule named "${ruleName}"; choose one of its rules`)
  const ctx = contextOf(theory)
  const resolved = resolveRule(rule, ctx)
  const out: Record<number, string> = {}
  for (const op of operators) {
    const terms = op.terms?.length ? op.terms : [classBlocks(op.classKey, ctx)]
    out[op.id] = formatOrder(orderOfOperator({ id: String(op.id), terms }, resolved, ctx))
  }
  return out
}

/** Block counts of a relativistic class key; a field strength's chiral halves count as the field. */
function classBlocks(key: string, ctx: RuleContext): Record<string, number> {
  const strengthOf = new Map(ctx.frame === 'relativistic' ? ctx.species.filter((s) => s.kind === 'field-strength').map((s) => [s.label, s.field]) : [])
  const out: Record<string, number> = {}
  for (const [b, n] of Object.entries(blocksFromClassKey(key))) {
    const name = strengthOf.get(b) ?? b
    out[name] = (out[name] ?? 0) + n
  }
  return out
}
