import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { intParam } from '../../utils/http/readJson'
import { requireGroupRole } from '../../utils/auth/currentUser'
import { useDb } from '../../utils/db/connection'

// Owners withdraw an invitation that was not accepted yet.
export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const inv = await useDb()('invitations').where({ id }).first('id', 'group_id', 'accepted_at')
  if (!inv) fail(404, `No invitation with id ${id}`)
  await requireGroupRole(event, inv.group_id, 'owner')
  if (inv.accepted_at) fail(409, 'This invitation was already accepted')
  await useDb()('invitations').where({ id }).delete()
  return { deleted: id }
})
