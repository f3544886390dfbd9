import { getRouterParam } from 'h3'
import { defineApiHandler, fail } from '../../../../utils/http/apiHandler'
import { intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404, assertOwnerRemains } from '../../../../utils/db/groups'
import { useDb } from '../../../../utils/db/connection'

// Owners remove anyone; every member may leave (remove themselves). The last owner stays.
export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  const userId = intParam(event, 'userId')
  const { user, role } = await requireGroupRole(event, group.id, 'viewer')
  if (user.id !== userId && role !== 'owner') fail(403, 'This needs the owner role in the group; you may only remove yourself')
  await useDb().transaction(async (trx) => {
    const member = await trx('memberships').where({ group_id: group.id, user_id: userId }).forUpdate().first()
    if (!member) fail(404, 'That account is not a member of this group')
    await assertOwnerRemains(trx, group.id, userId, null)
    await trx('memberships').where({ group_id: group.id, user_id: userId }).delete()
  })
  return { removed: userId }
})
