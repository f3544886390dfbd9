import { randomBytes, createHash, createHmac } from 'node:crypto'

/** An unguessable token (256 bits, URL-safe) and the hash we store instead of it. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url')
  return { token, hash: hashToken(token) }
}

/**
 * A token as unguessable as newToken's, computed from `label` with the server's secret (the
 * session password), so that the same request (its key in the label) gives the same token.
 */
export function derivedToken(label: string): string {
  const secret = (useRuntimeConfig().session as { password: string }).password
  return createHmac('sha256', secret).update(label).digest('base64url')
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}
