import { defineApiHandler } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { requireUser } from '../../utils/auth/currentUser'
import { acceptInvitation } from '../../utils/db/invitations'
import { useDb } from '../../utils/db/connection'
import { InvitationAcceptSchema } from '../../../shared/schemas/sharing'

// A signed-in account accepts an invitation addressed to its own e-mail address.
export default defineApiHandler(async (event) => {
  const user = await requireUser(event)
  const { token } = await readJson(event, InvitationAcceptSchema)
  const groupId = await useDb().transaction((trx) => acceptInvitation(trx, token, user.id, user.email))
  const group = await useDb()('groups').where({ id: groupId }).first('slug', 'name')
  return { group }
})
