import { getRouterParam } from 'h3'
import { defineApiHandler } from '../../../../utils/http/apiHandler'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404 } from '../../../../utils/db/groups'
import { theoriesOfGroup } from '../../../../utils/db/theories'

export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  await requireGroupRole(event, group.id, 'viewer')
  return { theories: await theoriesOfGroup(group.id) }
})
