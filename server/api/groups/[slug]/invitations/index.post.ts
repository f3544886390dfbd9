import { getRouterParam } from 'h3'
import { defineApiHandler, created } from '../../../../utils/http/apiHandler'
import { readJson } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404 } from '../../../../utils/db/groups'
import { inviteToGroup } from '../../../../utils/accounts/invitations'
import { InvitationCreateSchema } from '../../../../../shared/schemas/sharing'
import { once } from '../../../../utils/http/requestKeys'
// Owners invite a collaborator by e-mail with a role (once per request key); the person joins by
// accepting the link. POST /api/groups/:slug/members (adding a member) is this same route.
export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  const { user } = await requireGroupRole(event, group.id, 'owner')
  const body = await readJson(event, InvitationCreateSchema)
  return once(event, user.id, body, async () => {
    const invitation = await inviteToGroup(group, user, body)
    created(event)
    return { invitation, message: 'Invitation sent; the person joins the group on accepting it.' }
  })
})
