import { defineApiHandler } from '../../../../utils/http/apiHandler'
import { intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../../utils/db/theories'
import { publicShareLink } from '../../../../utils/db/shareLinks'
import { useDb } from '../../../../utils/db/connection'

export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  await requireGroupRole(event, theory.group_id, 'owner')
  const rows = await useDb()('share_links').where({ theory_id: theory.id }).orderBy('id', 'desc')
  return { links: rows.map(publicShareLink) }
})
