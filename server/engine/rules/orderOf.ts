/**
 * The order of an operator under a counting rule, computed exactly from its building blocks.
 */
import { EngineInputError } from '../errors'
import { add, compare, mul, rat, sub, toString, type Rational } from '../exact/rational'
import type { CountingRule } from '../../../shared/schemas/countingRules'
import { resolveRule, type ResolvedRule, type RuleContext } from './defaultWeights'

/** Building blocks of one operator term: block name → multiplicity (non-negative integer). */
export type BlockCounts = Readonly<Record<string, number>>

/** An operator as the rules see it: an id and one or more terms (the order is the lowest). */
export interface RuleOperator {
  id: string
  /** Terms of the operator; a single-term operator has one entry. */
  terms: readonly BlockCounts[]
}

function isResolved(r: CountingRule | ResolvedRule): r is ResolvedRule {
  return r.weights instanceof Map
}

/** Resolve a rule unless it is resolved already. */
export function asResolved(rule: CountingRule | ResolvedRule, ctx?: RuleContext): ResolvedRule {
  return isResolved(rule) ? rule : resolveRule(rule, ctx)
}

/**
 * Order of one term: Σ_blocks multiplicity × weight − offset, an exact rational.
 * Mass ratio on a relativistic theory gives mass dimension − 4.
 * @example orderOf({ H: 6 }, { name: 'E/M', kind: 'massRatio' }, ctxSM) // 2  (H^6 has dimension 6)
 * Method: weighted sum. Reference: common practice (EFT power counting).
 */
export function orderOf(blocks: BlockCounts, rule: CountingRule | ResolvedRule, ctx?: RuleContext): Rational {
  const r = asResolved(rule, ctx)
  let total = rat(0)
  for (const [block, n] of Object.entries(blocks)) {
    if (!Number.isSafeInteger(n) || n < 0) {
      throw new EngineInputError('orderOf', `The building block "${block}" appears ${n} times; a count of building blocks is a whole number, 0 or more`)
    }
    if (n === 0) continue
    const w = r.weights.get(block)
    if (!w) {
      throw new EngineInputError('orderOf', `Counting rule "${r.name}" gives no weight to the building block "${block}"; add a weight for it`)
    }
    total = add(total, mul(w, rat(n)))
  }
  return sub(total, r.offset)
}

/**
 * Order of a (possibly multi-term) operator: the lowest order of its terms (its leading part).
 * @example orderOfOperator({id:'B2-E2', terms:[{psi:1,'psi*':1,B:2},{psi:1,'psi*':1,E:2}]}, velocity) // 4
 * Method: minimum over terms of orderOf. Reference: common practice.
 */
export function orderOfOperator(op: RuleOperator, rule: CountingRule | ResolvedRule, ctx?: RuleContext): Rational {
  if (op.terms.length === 0) throw new EngineInputError('orderOfOperator', `Operator "${op.id}" has no terms, so it has no order`)
  const r = asResolved(rule, ctx)
  let best: Rational | undefined
  for (const t of op.terms) {
    const o = orderOf(t, r)
    if (!best || compare(o, best) < 0) best = o
  }
  return best!
}

/** Format an order for display, e.g. "3/2". */
export function formatOrder(o: Rational): string {
  return toString(o)
}
