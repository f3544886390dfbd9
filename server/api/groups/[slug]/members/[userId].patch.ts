import { getRouterParam } from 'h3'
import { defineApiHandler } from '../../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404, changeMembership } from '../../../../utils/db/groups'
import { MemberRoleSchema } from '../../../../../shared/schemas/group'

// Owners change members' roles; the last owner stays.
export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  const { user } = await requireGroupRole(event, group.id, 'owner')
  const userId = intParam(event, 'userId')
  const { role } = await readJson(event, MemberRoleSchema)
  await changeMembership(group.id, user.id, userId, role)
  return { member: { id: userId, role } }
})
