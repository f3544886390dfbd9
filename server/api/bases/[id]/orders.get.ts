import { getQuery } from 'h3'
import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { ordersUnderRule } from '../../../utils/db/ruleView'

// Orders of every operator under a counting rule of the theory (?rule=NAME), for the board's switch.
export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, basis.group_id, 'viewer')
  const rule = getQuery(event).rule
  return ordersUnderRule(basis.id, typeof rule === 'string' && rule ? rule : undefined, user.id)
})
