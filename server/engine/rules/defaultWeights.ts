/**
 * Default weights of building blocks for the counting rules of shared/schemas/countingRules.ts.
 * A rule's own `weights` override these per block; a block with neither throws.
 */
import { EngineInputError } from '../errors'
import { parseRational, rat, type Rational } from '../exact/rational'
import type { CountingRule } from '../../../shared/schemas/countingRules'
import type { Species } from '../theory/model'

/** The species facts a relativistic rule reads (theory/model.ts). */
export type RuleSpecies = Pick<Species, 'label' | 'field' | 'kind' | 'dim2'>

/** The context a rule is applied in: the species of a relativistic theory or a heavy-particle frame. */
export type RuleContext =
  { frame: 'relativistic'; species: ReadonlyArray<RuleSpecies> } | { frame: 'heavy'; particle: string; antiparticle?: string; light?: ReadonlyArray<{ name: string; dim: string }> }

/** A rule with every weight resolved to an exact rational. */
export interface ResolvedRule {
  name: string
  kind: CountingRule['kind']
  weights: ReadonlyMap<string, Rational>
  offset: Rational
}

/**
 * Velocity scalings of the heavy-frame building blocks: ψ ~ (mv)^{3/2}, D ~ mv, D_t ~ mv²,
 * gE ~ m²v³, gB ~ m²v⁴, σ ~ 1. The leading Lagrangian ψ†iD_tψ scales as v⁵ (offset 5).
 * @example HEAVY_VELOCITY_WEIGHTS.B // "4"
 * Method: power counting in the bound state. Reference: Lepage, Magnea, Nakhleh, Magnea,
 * Hornbostel, Phys. Rev. D 46 (1992) 4052; Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125.
 */
export const HEAVY_VELOCITY_WEIGHTS: Readonly<Record<string, string>> = {
  psi: '3/2',
  D: '1',
  D_t: '2',
  E: '3',
  B: '4',
  sigma: '0',
}

/** Mass dimensions of the heavy-frame blocks (order in 1/m = dimension − 4). */
export const HEAVY_MASS_WEIGHTS: Readonly<Record<string, string>> = {
  psi: '3/2',
  D: '1',
  D_t: '1',
  E: '2',
  B: '2',
  sigma: '0',
}

function heavyDefaults(rule: CountingRule, ctx: { particle: string; antiparticle?: string; light?: ReadonlyArray<{ name: string; dim: string }> }): Map<string, Rational> {
  const table = rule.kind === 'velocity' ? HEAVY_VELOCITY_WEIGHTS : rule.kind === 'massRatio' ? HEAVY_MASS_WEIGHTS : {}
  const out = new Map<string, Rational>()
  for (const [k, v] of Object.entries(table)) {
    if (k === 'psi') {
      for (const f of [ctx.particle, ctx.antiparticle]) {
        if (f) {
          out.set(f, parseRational(v))
          out.set(`${f}*`, parseRational(v))
        }
      }
    } else out.set(k, parseRational(v))
  }
  // Light fields of heavy–light operators: their mass dimension under the 1/m rule.
  if (rule.kind === 'massRatio')
    for (const f of ctx.light ?? []) {
      out.set(f.name, parseRational(f.dim))
      out.set(`${f.name}*`, parseRational(f.dim))
    }
  return out
}

/** Mass-ratio weights: every species weighs its mass dimension; a field strength's name weighs as its halves. */
function relativisticDefaults(rule: CountingRule, ctx: RuleContext & { frame: 'relativistic' }): Map<string, Rational> {
  const out = new Map<string, Rational>()
  if (rule.kind === 'massRatio') {
    out.set('D', rat(1))
    for (const s of ctx.species) {
      out.set(s.label, rat(s.dim2, 2))
      if (s.kind === 'field-strength') out.set(s.field, rat(s.dim2, 2))
    }
  } else if (rule.kind === 'momentumRatio') {
    out.set('D', rat(1))
  }
  return out
}

/** The mass-ratio rule's offset: the order of a relativistic operator is its mass dimension − 4. */
export const MASS_RATIO_OFFSET = 4

/**
 * Order of a relativistic operator of this mass dimension under the mass-ratio rule.
 * @example massRatioOrder(6) // 2
 * Method: Σ weights (= mass dimension) − offset. Reference: common practice.
 */
export function massRatioOrder(dimension: number): number {
  return dimension - MASS_RATIO_OFFSET
}

/** The mass dimension of a mass-ratio order (inverse of massRatioOrder). @example massRatioDimension(2) // 6 */
export function massRatioDimension(order: number): number {
  return order + MASS_RATIO_OFFSET
}

function defaultOffset(rule: CountingRule, ctx?: RuleContext): Rational {
  if (rule.kind === 'massRatio') return rat(MASS_RATIO_OFFSET)
  if (rule.kind === 'velocity' && ctx?.frame === 'heavy') return rat(5)
  return rat(0)
}

/**
 * Resolve a counting rule in a context: defaults for the kind, overridden by the rule's weights.
 * Relativistic massRatio: scalars 1, Weyl fermions 3/2, field strengths 2, D 1, offset 4.
 * Heavy frame: HEAVY_MASS_WEIGHTS (offset 4) or HEAVY_VELOCITY_WEIGHTS (offset 5).
 * momentumRatio: D weighs 1 unless overridden (light masses must be given, e.g. "m": "2").
 * @example resolveRule({name:'v',kind:'velocity'}, {frame:'heavy',particle:'psi'}).weights.get('E') // 3
 * Method: table look-up. Reference: common practice; velocity table as HEAVY_VELOCITY_WEIGHTS.
 */
export function resolveRule(rule: CountingRule, ctx?: RuleContext): ResolvedRule {
  let weights: Map<string, Rational>
  if (!ctx) weights = new Map(rule.kind === 'momentumRatio' || rule.kind === 'massRatio' ? [['D', rat(1)]] : [])
  else if (ctx.frame === 'heavy') weights = heavyDefaults(rule, ctx)
  else weights = relativisticDefaults(rule, ctx)
  for (const [k, v] of Object.entries(rule.weights ?? {})) weights.set(k, parseRational(v))
  if (rule.kind === 'custom' && !rule.weights) {
    throw new EngineInputError('resolveRule', `Counting rule "${rule.name}" is of kind "custom" but gives no weights; give a weight to each building block`)
  }
  const offset = rule.offset !== undefined ? parseRational(rule.offset) : defaultOffset(rule, ctx)
  return { name: rule.name, kind: rule.kind, weights, offset }
}
