import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { useDb } from '../../../utils/db/connection'
import { theoryOr404 } from '../../../utils/db/theories'

// Owners undo the revocation of a share link: the same address works again (unless it expired).
export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const link = await useDb()('share_links').where({ id }).first('id', 'theory_id', 'expires_at')
  if (!link) fail(404, `No share link with id ${id}`)
  const theory = await theoryOr404(link.theory_id)
  await requireGroupRole(event, theory.group_id, 'owner')
  if (link.expires_at && new Date(link.expires_at) < new Date()) fail(409, 'This share link has expired; make a new one')
  await useDb()('share_links').where({ id }).update({ revoked_at: null })
  return { restored: id }
})
