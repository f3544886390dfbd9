import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { intParam } from '../../utils/http/readJson'
import { requireGroupRole } from '../../utils/auth/currentUser'
import { useDb } from '../../utils/db/connection'
import { theoryOr404 } from '../../utils/db/theories'

// Owners revoke a share link; it stops working at once, and undo makes it work again.
export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const link = await useDb()('share_links').where({ id }).first('id', 'theory_id', 'revoked_at')
  if (!link) fail(404, `No share link with id ${id}`)
  const theory = await theoryOr404(link.theory_id)
  await requireGroupRole(event, theory.group_id, 'owner')
  if (!link.revoked_at) await useDb()('share_links').where({ id }).update({ revoked_at: useDb().fn.now() })
  return { revoked: id, undo: `/api/share-links/${id}/restore` }
})
