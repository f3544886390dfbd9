import { getRouterParam } from 'h3'
import { defineApiHandler } from '../../../../utils/http/apiHandler'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404 } from '../../../../utils/db/groups'
import { useDb } from '../../../../utils/db/connection'

export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  await requireGroupRole(event, group.id, 'owner')
  const invitations = await useDb()('invitations')
    .where({ group_id: group.id })
    .orderBy('id', 'desc')
    .select('id', 'email', 'role', 'expires_at as expiresAt', 'accepted_at as acceptedAt', 'created_at as createdAt')
  return { invitations }
})
