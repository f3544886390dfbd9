import { defineApiHandler, created } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { requireUser } from '../../utils/auth/currentUser'
import { GroupCreateSchema } from '../../../shared/schemas/group'
import { createGroupWithOwner } from '../../utils/db/groups'
import { once } from '../../utils/http/requestKeys'

// Any signed-in member may found a group and becomes its owner (once per request key).
export default defineApiHandler(async (event) => {
  const user = await requireUser(event)
  const body = await readJson(event, GroupCreateSchema)
  return once(event, user.id, body, async () => {
    const group = await createGroupWithOwner(body, user.id)
    created(event)
    return { group: { id: group.id, slug: group.slug, name: group.name, description: group.description, role: 'owner' } }
  })
})
