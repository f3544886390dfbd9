import { getRouterParam } from 'h3'
import { defineApiHandler } from '../../../utils/http/apiHandler'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { groupBySlugOr404, membersOf } from '../../../utils/db/groups'
import { theoriesOfGroup } from '../../../utils/db/theories'

export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  const { role } = await requireGroupRole(event, group.id, 'viewer')
  return {
    group: { id: group.id, slug: group.slug, name: group.name, description: group.description },
    role,
    members: await membersOf(group.id),
    theories: await theoriesOfGroup(group.id),
  }
})
