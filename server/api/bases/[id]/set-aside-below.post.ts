import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { intParam, readJson } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { ladderOf } from '../../../utils/db/scaleLadders'
import { frameOfBasisClasses } from '../../../utils/scales/ladderFrame'
import { ordersOfBasis, setAsideOrders } from '../../../utils/db/setAsideBelow'
import { compute } from '../../../utils/compute/computePool'
import { SetAsideBelowSchema } from '../../../../shared/schemas/scaleRequests'
import type { StoredClass } from '../../../utils/db/boardMath'

// Editors set aside, in one transaction, every kept operator of the orders whose estimated
// size (from the theory's scale ladder, in the power counting of the basis's frame) lies below
// the precision target; answers the count.
export default defineApiHandler(async (event) => {
  const { target } = await readJson(event, SetAsideBelowSchema)
  const basis = await basisOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, basis.group_id, 'editor')
  const stored = await ladderOf(basis.theory_id)
  if (!stored) fail(409, 'This theory has no scale ladder yet: save one on its scale-ladder page, then set orders aside')
  const estimates = await compute('ordersBelowTarget', { doc: stored!.ladder, orders: await ordersOfBasis(basis.id), target, frame: frameOfBasisClasses(basis.classes) }, user.id)
  const below = estimates.filter((o) => o.belowTarget).map((o) => o.order)
  const { count, basisVersion } = await setAsideOrders(basis.id, below, user.id, basis.classes as StoredClass[])
  return { count, orders: below, estimates, target, basisVersion }
})
