import { getRouterParam } from 'h3'
import { defineApiHandler } from '../../../utils/http/apiHandler'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { groupBySlugOr404 } from '../../../utils/db/groups'
import { markDeleted } from '../../../utils/db/softDelete'

// Only owners delete a group: its theories, bases, notes and share links go out of sight for
// everyone; its owners can undo it.
export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  const { user } = await requireGroupRole(event, group.id, 'owner')
  await markDeleted('groups', group.id, user.id)
  return { deleted: group.id, undo: `/api/groups/${group.slug}/restore` }
})
