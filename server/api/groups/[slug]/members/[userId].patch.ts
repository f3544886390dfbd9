import { getRouterParam } from 'h3'
import { defineApiHandler, fail } from '../../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404, assertOwnerRemains } from '../../../../utils/db/groups'
import { useDb } from '../../../../utils/db/connection'
import { MemberRoleSchema } from '../../../../../shared/schemas/group'

export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  await requireGroupRole(event, group.id, 'owner')
  const userId = intParam(event, 'userId')
  const { role } = await readJson(event, MemberRoleSchema)
  await useDb().transaction(async (trx) => {
    const member = await trx('memberships').where({ group_id: group.id, user_id: userId }).forUpdate().first()
    if (!member) fail(404, 'That account is not a member of this group')
    await assertOwnerRemains(trx, group.id, userId, role)
    await trx('memberships').where({ group_id: group.id, user_id: userId }).update({ role })
  })
  return { member: { id: userId, role } }
})
