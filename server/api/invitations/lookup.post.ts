import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { useDb } from '../../utils/db/connection'
import { hashToken } from '../../utils/tokens'
import { InvitationAcceptSchema } from '../../../shared/schemas/sharing'

// What an invitation link offers (group, role, address), so the join page can explain it.
// POST so the token never lands in access logs; it reads only.
export default defineApiHandler(async (event) => {
  const { token } = await readJson(event, InvitationAcceptSchema)
  const inv = await useDb()('invitations as i')
    .join('groups as g', 'g.id', 'i.group_id')
    .where('i.token_hash', hashToken(token))
    .first('i.email', 'i.role', 'i.expires_at', 'i.accepted_at', 'g.name as groupName')
  if (!inv || inv.accepted_at || new Date(inv.expires_at) < new Date()) fail(404, 'This invitation is invalid, used or expired; ask the group owner for a new one')
  return { invitation: { email: inv.email, role: inv.role, groupName: inv.groupName } }
})
