import { buildScaleLadder, type ScaleLadder } from '../../engine/scales/scaleLadder'
import type { OrderSpec } from '../../../shared/schemas/scaleLadder'
import type { LadderDocument } from '../../../shared/schemas/scaleRequests'
import { leadingOrderOf } from '../../../shared/physics/leadingOrder'

export { frameOfDefinition, frameOfBasisClasses } from './ladderFrame'

/**
 * The computed ladder (sorted scales, derived scales, parameters, per-order estimates) of a stored
 * document, for a theory of the given frame: order n is ε^(n − leading order), ε^(k−2) for p^k in
 * the Goldstone frame (shared/physics/leadingOrder.ts).
 */
export function computeLadder(doc: LadderDocument, frame: string): ScaleLadder {
  const { orders, ...input } = doc
  return buildScaleLadder(input, orders, { leadingOrder: leadingOrderOf(frame) })
}

/**
 * The basis orders whose estimated size lies below `target`: an order n listed in the ladder
 * with its own powers uses them; any other order n is ε^(n − leading order) under the counting
 * parameter, as on the board's headings.
 */
export function ordersBelowTarget(doc: LadderDocument, basisOrders: number[], target: number, frame: string) {
  const specs: OrderSpec[] = basisOrders.map((n) => doc.orders.find((s) => (typeof s === 'number' ? s === n : s.order === n)) ?? n)
  const { orders: _ignored, ...input } = doc
  const ladder = buildScaleLadder({ ...input, precisionTarget: target }, specs, { leadingOrder: leadingOrderOf(frame) })
  return ladder.orders.map((o, i) => ({ order: basisOrders[i]!, estimate: o.estimate, exactEstimate: o.exactEstimate, belowTarget: o.belowTarget }))
}
