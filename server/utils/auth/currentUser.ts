import type { H3Event } from 'h3'
import type { Knex } from 'knex'
import { useDb } from '../db/connection'
import { fail } from '../http/apiHandler'
import { sessionFacts, endSession, SESSION_ENDED, type SessionFacts } from './sessions'
import type { GroupRole, SiteRole } from '../../../shared/types/roles'
import { roleAtLeast } from '../../../shared/types/roles'
import { liveTheories } from '../db/live'

export interface CurrentUser {
  id: number
  email: string
  displayName: string
  siteRole: SiteRole
}

/**
 * The signed-in user, re-read from the database on every request together with the session's
 * row, so that a sign-out, a removed account, a changed site role or a password reset takes
 * effect at once (the cookie carries only the account and session ids).
 */
export async function requireUser(event: H3Event): Promise<CurrentUser> {
  const session = await sessionFacts(event)
  const row = await useDb()('users as u').leftJoin('sessions as cs', sessionJoin(session)).where('u.id', session.userId).first('u.email', 'u.display_name', 'u.site_role', 'cs.id as session_id')
  return toUser(event, session, row)
}

/** Join condition of the caller's session row (null in the result when it has ended). */
function sessionJoin(session: SessionFacts) {
  return (j: Knex.JoinClause) => j.on('cs.user_id', 'u.id').andOnVal('cs.id', session.sessionId)
}

interface AccountRow {
  email: string
  display_name: string
  site_role: SiteRole
  session_id: string | null
}

async function toUser(event: H3Event, session: SessionFacts, row: AccountRow | undefined): Promise<CurrentUser> {
  if (!row) {
    await endSession(event)
    fail(401, 'Your account no longer exists; sign in again')
  }
  if (!row.session_id) {
    await endSession(event)
    fail(401, SESSION_ENDED)
  }
  return { id: session.userId, email: row.email, displayName: row.display_name, siteRole: row.site_role }
}

export async function requireAdmin(event: H3Event): Promise<CurrentUser> {
  const user = await requireUser(event)
  if (user.siteRole !== 'admin') fail(403, 'This needs the site administrator role')
  return user
}

function checkRole(role: GroupRole | null, needed: GroupRole): GroupRole {
  if (!role) fail(403, 'You are not a member of this group')
  if (!roleAtLeast(role, needed)) fail(403, `This needs the ${needed} role in the group; you are ${role}`)
  return role
}

/**
 * Signed in and at least `needed` in the group, else 401/403 with a message saying why.
 * One query reads the account and its membership (this runs on every group route).
 */
export async function requireGroupRole(event: H3Event, groupId: number, needed: GroupRole) {
  const session = await sessionFacts(event)
  const row = await useDb()('users as u')
    .leftJoin('memberships as m', (j) => j.on('m.user_id', 'u.id').andOnVal('m.group_id', groupId))
    .leftJoin('sessions as cs', sessionJoin(session))
    .where('u.id', session.userId)
    .first('u.email', 'u.display_name', 'u.site_role', 'cs.id as session_id', 'm.role')
  const user = await toUser(event, session, row)
  return { user, role: checkRole((row!.role ?? null) as GroupRole | null, needed) }
}

/**
 * Join the caller (account and membership of the group in `groupColumn`) onto a hot-path
 * query, as the u_* columns that requireRoleWith reads.
 */
export function withCaller(q: Knex.QueryBuilder, userId: number, groupColumn: string): Knex.QueryBuilder {
  const db = useDb()
  return q
    .crossJoin(db.raw('users as u'))
    .leftJoin('memberships as m', (j) => j.on('m.user_id', 'u.id').andOn('m.group_id', groupColumn))
    .andWhere('u.id', userId)
    .select('u.email as u_email', 'u.display_name as u_name', 'u.site_role as u_site_role', 'm.role as u_role')
}

/**
 * A row read together with the caller's account and role in one query (the hot read paths:
 * board, theory and group pages); `query(userId)` is built with withCaller. Returns null when
 * the row or the account is missing; the caller then falls back to the two-step checks, which
 * tell a missing row (404) from a missing account (401).
 */
export async function requireRoleWith(event: H3Event, needed: GroupRole, query: (userId: number) => Knex.QueryBuilder) {
  const session = await sessionFacts(event)
  // The session row joins here, not in withCaller, so that callers keep building with the user id.
  const row = await query(session.userId).leftJoin('sessions as cs', sessionJoin(session)).select('cs.id as u_session').first()
  if (!row) return null
  const user = await toUser(event, session, { email: row.u_email, display_name: row.u_name, site_role: row.u_site_role, session_id: row.u_session })
  return { row, user, role: checkRole((row.u_role ?? null) as GroupRole | null, needed) }
}

/** A basis or theory row with the caller's role in the group that owns it (see requireRoleWith). */
export function requireRoleOn(event: H3Event, kind: 'bases' | 'theories', id: number, needed: GroupRole) {
  const db = useDb()
  return requireRoleWith(event, needed, (userId) =>
    kind === 'bases'
      ? // The board needs only the version (its cache key); classes/coverage are large JSON.
        withCaller(
          liveTheories(db('bases as x').join('theories as t', 't.id', 'x.theory_id'))
            .select('x.id', 'x.version', 't.group_id')
            .where('x.id', id)
            .whereNull('x.deleted_at'),
          userId,
          't.group_id',
        )
      : withCaller(liveTheories(db('theories as x').select('x.*').where('x.id', id), 'x'), userId, 'x.group_id'),
  )
}
