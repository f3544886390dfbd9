import { useDb } from './connection'
import { theoryOfBasis } from './bases'
import { compute } from '../compute/computePool'
import type { RuleTheory } from '../../engine/board/ruleOrders'

/**
 * The counting rules a basis can be viewed under, and (when a rule is named) every operator's
 * order under it, computed in the compute pool for `user` (a share link: `share:<theory id>`)
 * and counted against the basis's group.
 */
export async function ordersUnderRule(basisId: number, ruleName: string | undefined, user: string | number) {
  const theory = (await theoryOfBasis(basisId)) as RuleTheory
  const { group_id: groupId } = await useDb()('bases as b').join('theories as t', 't.id', 'b.theory_id').where('b.id', basisId).first('t.group_id')
  // Order 0 (the renormalizable Lagrangian, ψ†iD_tψ) defines the leading order: it is not re-counted under other rules.
  const rows = ruleName ? await useDb()('operators').where({ basis_id: basisId }).where('order', '>', 0).select('id', 'class_key', 'structure') : []
  const ops = rows.map((o) => ({ id: o.id as number, classKey: o.class_key as string, terms: o.structure?.terms as Record<string, number>[] | undefined }))
  return compute('ruleView', { theory, ruleName, ops }, user, groupId as number)
}
