import { z } from 'zod'
import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireAdmin } from '../../../utils/auth/currentUser'
import { useDb } from '../../../utils/db/connection'

const SiteRoleBody = z.object({ siteRole: z.enum(['admin', 'member'], { error: 'must be "admin" or "member"' }) }).strict()

// Admins promote or demote accounts; the last admin cannot demote themselves.
export default defineApiHandler(async (event) => {
  const admin = await requireAdmin(event)
  const id = intParam(event, 'id')
  const { siteRole } = await readJson(event, SiteRoleBody)
  await useDb().transaction(async (trx) => {
    const target = await trx('users').where({ id }).forUpdate().first('id')
    if (!target) fail(404, `No account with id ${id}`)
    if (siteRole === 'member' && id === admin.id) {
      const admins = await trx('users').where({ site_role: 'admin' }).count<{ count: string }[]>('id as count')
      if (Number(admins[0]!.count) <= 1) fail(409, 'The site needs at least one admin')
    }
    await trx('users').where({ id }).update({ site_role: siteRole })
  })
  return { user: { id, siteRole } }
})
