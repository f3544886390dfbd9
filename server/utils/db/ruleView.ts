import { useDb } from './connection'
import { theoryOfBasis } from './bases'
import { ruleOrders, rulesOf, type RuleTheory } from '../../engine/board/ruleOrders'

/** The counting rules a basis can be viewed under, and (when a rule is named) every operator's order under it. */
export async function ordersUnderRule(basisId: number, ruleName: string | undefined) {
  const theory = (await theoryOfBasis(basisId)) as RuleTheory
  const rules = rulesOf(theory).map((r) => ({ name: r.name, kind: r.kind, parameter: r.parameter ?? null }))
  if (!ruleName) return { rules, rule: null, orders: {} }
  // Order 0 (the renormalizable Lagrangian, ψ†iD_tψ) defines the leading order: it is not re-counted under other rules.
  const ops = await useDb()('operators').where({ basis_id: basisId }).where('order', '>', 0).select('id', 'class_key', 'structure')
  const orders = ruleOrders(theory, ruleName, ops.map((o) => ({ id: o.id, classKey: o.class_key, terms: o.structure?.terms })))
  return { rules, rule: ruleName, orders }
}
