import { z } from 'zod'
import { defineApiHandler } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireAdmin } from '../../../utils/auth/currentUser'
import { setSiteRole } from '../../../utils/db/users'

const SiteRoleBody = z.object({ siteRole: z.enum(['admin', 'member'], { error: 'must be "admin" or "member"' }) }).strict()

// Admins promote or demote accounts; the site always keeps one admin, even under racing requests.
export default defineApiHandler(async (event) => {
  const admin = await requireAdmin(event)
  const id = intParam(event, 'id')
  const { siteRole } = await readJson(event, SiteRoleBody)
  await setSiteRole(admin.id, id, siteRole)
  return { user: { id, siteRole } }
})
