import { defineApiHandler } from '../../utils/http/apiHandler'
import { requireUser } from '../../utils/auth/currentUser'
import { groupsOfUser } from '../../utils/db/groups'

export default defineApiHandler(async (event) => {
  const user = await requireUser(event)
  return { groups: await groupsOfUser(user.id) }
})
