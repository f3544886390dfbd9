import { getRouterParam } from 'h3'
import { defineApiHandler } from '../../../../utils/http/apiHandler'
import { intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404, changeMembership } from '../../../../utils/db/groups'

// Owners remove anyone; every member may leave (remove themselves). The last owner stays.
export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  const userId = intParam(event, 'userId')
  const { user } = await requireGroupRole(event, group.id, 'viewer')
  await changeMembership(group.id, user.id, userId, null)
  return { removed: userId }
})
