import { defineApiHandler } from '../../../utils/http/apiHandler'
import { requireAdmin } from '../../../utils/auth/currentUser'
import { useDb } from '../../../utils/db/connection'

export default defineApiHandler(async (event) => {
  await requireAdmin(event)
  return { users: await useDb()('users').orderBy('id').select('id', 'email', 'display_name as displayName', 'site_role as siteRole', 'created_at as createdAt') }
})
