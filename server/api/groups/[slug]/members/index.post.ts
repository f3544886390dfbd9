import { getRouterParam } from 'h3'
import { defineApiHandler, fail, created } from '../../../../utils/http/apiHandler'
import { readJson } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404 } from '../../../../utils/db/groups'
import { findUserByEmail } from '../../../../utils/db/users'
import { useDb } from '../../../../utils/db/connection'
import { MemberAddSchema } from '../../../../../shared/schemas/group'

// Owners add an existing account to the group with a role (e-mail invitations are separate).
export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  await requireGroupRole(event, group.id, 'owner')
  const body = await readJson(event, MemberAddSchema)
  const user = await findUserByEmail(body.email)
  if (!user) fail(404, `No account uses ${body.email}; send an invitation instead`)
  const inserted = await useDb()('memberships').insert({ group_id: group.id, user_id: user.id, role: body.role }).onConflict(['group_id', 'user_id']).ignore().returning('user_id')
  if (!inserted.length) fail(409, `${body.email} is already a member; change the role instead`)
  created(event)
  return { member: { id: user.id, email: user.email, displayName: user.display_name, role: body.role } }
})
