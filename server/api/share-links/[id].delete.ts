import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { intParam } from '../../utils/http/readJson'
import { requireGroupRole } from '../../utils/auth/currentUser'
import { useDb } from '../../utils/db/connection'

// Owners revoke a share link; it stops working at once.
export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const link = await useDb()('share_links as s').join('theories as t', 't.id', 's.theory_id').where('s.id', id).first('s.id', 's.revoked_at', 't.group_id')
  if (!link) fail(404, `No share link with id ${id}`)
  await requireGroupRole(event, link.group_id, 'owner')
  if (!link.revoked_at) await useDb()('share_links').where({ id }).update({ revoked_at: useDb().fn.now() })
  return { revoked: id }
})
