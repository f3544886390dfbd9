import { getRouterParam } from 'h3'
import { defineApiHandler } from '../../../utils/http/apiHandler'
import { requireGroupRole, requireRoleWith, withCaller } from '../../../utils/auth/currentUser'
import { groupBySlugOr404, groupPageQuery, membersOf } from '../../../utils/db/groups'
import { theoriesOfGroup } from '../../../utils/db/theories'
import type { GroupRole } from '../../../../shared/types/roles'

interface GroupPage {
  group: { id: number; slug: string; name: string; description: string | null }
  role: GroupRole
  members: { id: number; email: string; displayName: string; role: GroupRole }[]
  theories: { id: number; name: string; version: number; parentId: number | null; updatedAt: string }[]
}

// The group page: the group, the caller's role, members and theories, read in one query
// together with the caller's account and membership (a hot read).
export default defineApiHandler(async (event): Promise<GroupPage> => {
  const slug = getRouterParam(event, 'slug')!
  const access = await requireRoleWith(event, 'viewer', (userId) => withCaller(groupPageQuery(slug), userId, 'g.id'))
  if (access) {
    const { row, role } = access
    return { group: { id: row.id, slug: row.slug, name: row.name, description: row.description }, role, members: row.members, theories: row.theories }
  }
  const group = await groupBySlugOr404(slug) // 404 when the group is missing …
  const { role } = await requireGroupRole(event, group.id, 'viewer') // … else 401/403
  return {
    group: { id: group.id, slug: group.slug, name: group.name, description: group.description },
    role,
    members: await membersOf(group.id),
    theories: await theoriesOfGroup(group.id),
  }
})
