import { buildScaleLadder, type ScaleLadder } from '../../engine/scales/scaleLadder'
import type { OrderSpec } from '../../../shared/schemas/scaleLadder'
import type { LadderDocument } from '../../../shared/schemas/scaleRequests'

/** The computed ladder (sorted scales, derived scales, parameters, per-order estimates) of a stored document. */
export function computeLadder(doc: LadderDocument): ScaleLadder {
  const { orders, ...input } = doc
  return buildScaleLadder(input, orders)
}

/**
 * The basis orders whose estimated size lies below `target`: an order n listed in the ladder
 * with its own powers uses them; any other order n is ε^n under the counting parameter.
 */
export function ordersBelowTarget(doc: LadderDocument, basisOrders: number[], target: number) {
  const specs: OrderSpec[] = basisOrders.map((n) => doc.orders.find((s) => (typeof s === 'number' ? s === n : s.order === n)) ?? n)
  const { orders: _ignored, ...input } = doc
  const ladder = buildScaleLadder({ ...input, precisionTarget: target }, specs)
  return ladder.orders.map((o, i) => ({ order: basisOrders[i]!, estimate: o.estimate, exactEstimate: o.exactEstimate, belowTarget: o.belowTarget }))
}
