/**
 * Compare two counting rules on the same operators: which operators change order, and how
 * the operators group by order under a rule (the board highlights the movers).
 */
import { compare, equals, toString, type Rational } from '../exact/rational'
import type { CountingRule } from '../../../shared/schemas/countingRules'
import type { RuleContext, ResolvedRule } from './defaultWeights'
import { asResolved, orderOfOperator, type RuleOperator } from './orderOf'

export interface OrderChange {
  id: string
  from: Rational
  to: Rational
}

/**
 * The operators whose order differs between ruleA and ruleB (orders compared as exact
 * rationals, each relative to its rule's leading Lagrangian), in input order.
 * @example reshuffle([kinetic, darwin], massRule, velocityRule, heavyCtx)
 *   // [{ id: 'kinetic', from: 1, to: 0 }]  (Darwin stays at 2)
 * Method: orderOfOperator under both rules. Reference: common practice.
 */
export function reshuffle(operators: readonly RuleOperator[], ruleA: CountingRule | ResolvedRule, ruleB: CountingRule | ResolvedRule, ctx?: RuleContext): OrderChange[] {
  const a = asResolved(ruleA, ctx)
  const b = asResolved(ruleB, ctx)
  const out: OrderChange[] = []
  for (const op of operators) {
    const from = orderOfOperator(op, a)
    const to = orderOfOperator(op, b)
    if (!equals(from, to)) out.push({ id: op.id, from, to })
  }
  return out
}

/**
 * Group operator ids by their order under a rule, ascending in order.
 * @example groupByOrder([kinetic, sigmaB], velocityRule, heavyCtx) // [{order:'0',ids:['kinetic']},{order:'2',ids:['sigmaB']}]
 * Method: orderOfOperator then sort. Reference: common practice.
 */
export function groupByOrder(operators: readonly RuleOperator[], rule: CountingRule | ResolvedRule, ctx?: RuleContext): Array<{ order: string; value: Rational; ids: string[] }> {
  const r = asResolved(rule, ctx)
  const groups = new Map<string, { order: string; value: Rational; ids: string[] }>()
  for (const op of operators) {
    const o = orderOfOperator(op, r)
    const key = toString(o)
    if (!groups.has(key)) groups.set(key, { order: key, value: o, ids: [] })
    groups.get(key)!.ids.push(op.id)
  }
  return [...groups.values()].sort((x, y) => compare(x.value, y.value))
}
