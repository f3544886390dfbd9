import { randomUUID } from 'node:crypto'
import { getCookie, type H3Event } from 'h3'
import type { Knex } from 'knex'
import { useDb } from '../db/connection'
import { fail } from '../http/apiHandler'

/** What a session cookie says: whose it is and which sign-in (a row of `sessions`) it belongs to. */
export interface SessionFacts {
  userId: number
  sessionId: string
}

export const SESSION_ENDED = 'This session has ended (signed out, the password was changed, or all other sessions were signed out); sign in again'

// Unsealing the session cookie (iron: HMAC check plus AES) was the largest single cost of an
// API read (~0.9 ms of ~1.4 ms). The result is a pure function of the cookie text and the
// server secret, so it is remembered per cookie text: a hit is exactly as trustworthy as a
// fresh unseal. Whether the session still exists is not remembered: every request reads its
// row together with the account (currentUser.ts), so a sign-out takes effect at once. Entries
// live at most ENTRY_MS and never past the session's own expiry; only successful unseals are
// remembered, so forged cookies cannot fill the map.
const ENTRY_MS = 5 * 60_000
const LIMIT = 5000
const unsealed = new Map<string, SessionFacts & { until: number }>()
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/

// The shared config (useRuntimeConfig(event) would copy the whole config on every request).
function sessionConfig() {
  return useRuntimeConfig().session as { name: string; maxAge?: number }
}

/**
 * Sign the user in on this browser: a new `sessions` row and a sealed cookie naming it. The
 * browser's previous session (if it had one) ends, and rows older than the cookie's lifetime
 * are deleted on the way (of every account), so the table holds live sessions only.
 */
export async function startSession(event: H3Event, user: { id: number; email: string; displayName: string; siteRole: string }, db: Knex = useDb()) {
  const sessionId = randomUUID()
  const maxAge = sessionConfig().maxAge ?? 30 * 86_400
  if (getCookie(event, sessionConfig().name)) await deleteSessionRow(await getUserSession(event))
  await db('sessions').insert({ id: sessionId, user_id: user.id })
  await db('sessions')
    .where('created_at', '<', new Date(Date.now() - maxAge * 1000))
    .delete()
  await replaceUserSession(event, { user, sessionId })
}

/** The session cookie's facts, or 401. Whether the session and account still exist is the caller's check. */
export async function sessionFacts(event: H3Event): Promise<SessionFacts> {
  const { name, maxAge } = sessionConfig()
  const sealed = getCookie(event, name)
  if (!sealed) fail(401, 'Sign in to continue')
  const now = Date.now()
  const hit = unsealed.get(sealed)
  if (hit && hit.until > now) return hit
  if (hit) unsealed.delete(sealed)
  const session = await getUserSession(event)
  const userId = (session.user as { id?: number } | undefined)?.id
  if (!userId) fail(401, 'Sign in to continue')
  // Cookies sealed before sessions had rows carry no id: they have ended.
  if (typeof session.sessionId !== 'string' || !UUID.test(session.sessionId)) {
    await clearUserSession(event)
    fail(401, SESSION_ENDED)
  }
  const createdAt = (event.context.sessions?.[name]?.createdAt as number | undefined) ?? now
  if (unsealed.size >= LIMIT) unsealed.delete(unsealed.keys().next().value!)
  const facts = { userId, sessionId: session.sessionId, until: Math.min(now + ENTRY_MS, createdAt + (maxAge ?? Infinity) * 1000) }
  unsealed.set(sealed, facts)
  return facts
}

/**
 * Sign out on this browser. Clearing the cookie also deletes its session row (the `clear` hook
 * in server/plugins/20.sessionRows.ts, which nuxt-auth-utils' own DELETE /api/_auth/session
 * calls too), so a copied cookie stops working at the same moment.
 */
export async function endSession(event: H3Event) {
  const sealed = getCookie(event, sessionConfig().name)
  if (sealed) unsealed.delete(sealed)
  await clearUserSession(event)
}

/** Delete the row a cleared cookie named (its data as nuxt-auth-utils' clear hook passes it). */
export async function deleteSessionRow(data: Record<string, unknown>) {
  if (typeof data.sessionId === 'string' && UUID.test(data.sessionId)) await useDb()('sessions').where({ id: data.sessionId }).delete()
}

/** End every session of an account except `keep` (this browser's, when it stays signed in). */
export async function endOtherSessions(userId: number, keep: string | null, db: Knex = useDb()) {
  const rows = db('sessions').where({ user_id: userId })
  await (keep ? rows.whereNot({ id: keep }) : rows).delete()
}
