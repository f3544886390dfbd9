import { defineApiHandler, created } from '../../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../../utils/db/theories'
import { publicShareLink } from '../../../../utils/db/shareLinks'
import { useDb } from '../../../../utils/db/connection'
import { derivedToken, hashToken, newToken } from '../../../../utils/tokens'
import { once, requestKey } from '../../../../utils/http/requestKeys'
import { appUrl } from '../../../../utils/mail'
import { ShareLinkCreateSchema } from '../../../../../shared/schemas/sharing'

// Owners make a read-only link; the token is shown once (only its hash is stored).
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, theory.group_id, 'owner')
  const body = await readJson(event, ShareLinkCreateSchema)
  // With a request key the token is derived from it, so a repeated request answers the same
  // link without the token ever being stored (only its hash is).
  const key = requestKey(event)
  const token = key ? derivedToken(`share-link:${user.id}:${key}`) : newToken().token
  const stored = await once(event, user.id, body, async () => {
    const expires = body.expiresInDays ? new Date(Date.now() + body.expiresInDays * 86_400_000) : null
    const [row] = await useDb()('share_links')
      .insert({ theory_id: theory.id, token_hash: hashToken(token), created_by: user.id, expires_at: expires })
      .returning('*')
    created(event)
    return { link: publicShareLink(row) }
  })
  return { link: { ...stored.link, token, url: appUrl(`/share/${token}`) } }
})
