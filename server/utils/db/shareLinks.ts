import { useDb } from './connection'
import { fail } from '../http/apiHandler'
import { hashToken } from '../tokens'
import { liveTheories } from './live'

/** The theory a live share token opens; 404 for unknown, revoked or expired (no hint which). */
export async function theoryForShareToken(token: string) {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) fail(404, 'This share link does not exist, was revoked or has expired')
  // A link of a deleted theory (or of a theory in a deleted group) is dead too.
  const link = await liveTheories(useDb()('share_links as s').join('theories as t', 't.id', 's.theory_id'))
    .where('s.token_hash', hashToken(token))
    .first('s.*')
  const dead = !link || link.revoked_at || (link.expires_at && new Date(link.expires_at) < new Date())
  if (dead) fail(404, 'This share link does not exist, was revoked or has expired')
  return link.theory_id as number
}

export function publicShareLink(row: Record<string, any>) {
  return { id: row.id, createdAt: row.created_at, expiresAt: row.expires_at, revokedAt: row.revoked_at }
}
