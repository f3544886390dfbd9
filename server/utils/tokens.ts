import { randomBytes, createHash } from 'node:crypto'

/** An unguessable token (256 bits, URL-safe) and the hash we store instead of it. */
export function newToken(): { token: string, hash: string } {
  const token = randomBytes(32).toString('base64url')
  return { token, hash: hashToken(token) }
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}
