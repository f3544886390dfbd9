import { defineApiHandler, created } from '../../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../../utils/db/theories'
import { publicShareLink } from '../../../../utils/db/shareLinks'
import { useDb } from '../../../../utils/db/connection'
import { newToken } from '../../../../utils/tokens'
import { appUrl } from '../../../../utils/mail'
import { ShareLinkCreateSchema } from '../../../../../shared/schemas/sharing'

// Owners make a read-only link; the token is shown once (only its hash is stored).
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, theory.group_id, 'owner')
  const body = await readJson(event, ShareLinkCreateSchema)
  const { token, hash } = newToken()
  const expires = body.expiresInDays ? new Date(Date.now() + body.expiresInDays * 86_400_000) : null
  const [row] = await useDb()('share_links').insert({ theory_id: theory.id, token_hash: hash, created_by: user.id, expires_at: expires }).returning('*')
  created(event)
  return { link: { ...publicShareLink(row), token, url: appUrl(`/share/${token}`) } }
})
