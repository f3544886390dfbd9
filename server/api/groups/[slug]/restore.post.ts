import { getRouterParam } from 'h3'
import { defineApiHandler } from '../../../utils/http/apiHandler'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { groupBySlugOr404 } from '../../../utils/db/groups'
import { restoreDeleted } from '../../../utils/db/softDelete'

// Undo of a group's deletion, by its owners (their memberships stay while it is deleted).
export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!, { deleted: true })
  await requireGroupRole(event, group.id, 'owner')
  await restoreDeleted('groups', group.id)
  return { restored: group.id, slug: group.slug }
})
