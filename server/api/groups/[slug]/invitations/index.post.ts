import { getRouterParam } from 'h3'
import { defineApiHandler, created } from '../../../../utils/http/apiHandler'
import { readJson } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404 } from '../../../../utils/db/groups'
import { useDb } from '../../../../utils/db/connection'
import { newToken } from '../../../../utils/tokens'
import { sendMail, appUrl } from '../../../../utils/mail'
import { InvitationCreateSchema } from '../../../../../shared/schemas/sharing'

const INVITATION_DAYS = 14

// Owners invite a collaborator by e-mail with a role; the link signs them up into the group.
export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  const { user } = await requireGroupRole(event, group.id, 'owner')
  const body = await readJson(event, InvitationCreateSchema)
  const { token, hash } = newToken()
  const [row] = await useDb()('invitations').insert({
    group_id: group.id, email: body.email, role: body.role, token_hash: hash, invited_by: user.id,
    expires_at: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
  }).returning(['id', 'email', 'role', 'expires_at as expiresAt'])
  await sendMail({
    to: body.email,
    subject: `${user.displayName} invites you to ${group.name} on Scalewright`,
    text: `${user.displayName} invites you to the group "${group.name}" on Scalewright as ${body.role}.\n\nAccept here (valid ${INVITATION_DAYS} days, once):\n${appUrl(`/join/${token}`)}\n`,
  })
  created(event)
  return { invitation: row }
})
