import type { H3Event } from 'h3'
import { useDb } from '../db/connection'
import { fail } from '../http/apiHandler'
import type { GroupRole, SiteRole } from '../../../shared/types/roles'
import { roleAtLeast } from '../../../shared/types/roles'

export interface CurrentUser { id: number, email: string, displayName: string, siteRole: SiteRole }

/**
 * The signed-in user, re-read from the database on every request so that a removed account
 * or a changed site role takes effect at once (the sealed cookie only carries the id).
 */
export async function requireUser(event: H3Event): Promise<CurrentUser> {
  const id = await sessionUserId(event)
  const row = await useDb()('users').where({ id }).first('id', 'email', 'display_name', 'site_role')
  return toUser(event, row)
}

async function sessionUserId(event: H3Event): Promise<number> {
  const session = await getUserSession(event)
  const id = (session.user as { id?: number } | undefined)?.id
  if (!id) fail(401, 'Sign in to continue')
  return id
}

async function toUser(event: H3Event, row: Record<string, any> | undefined): Promise<CurrentUser> {
  if (!row) {
    await clearUserSession(event)
    fail(401, 'Your account no longer exists; sign in again')
  }
  return { id: row.id, email: row.email, displayName: row.display_name, siteRole: row.site_role }
}

export async function requireAdmin(event: H3Event): Promise<CurrentUser> {
  const user = await requireUser(event)
  if (user.siteRole !== 'admin') fail(403, 'This needs the site administrator role')
  return user
}

/**
 * Signed in and at least `needed` in the group, else 401/403 with a message saying why.
 * One query reads the account and its membership (this runs on every group route).
 */
export async function requireGroupRole(event: H3Event, groupId: number, needed: GroupRole) {
  const id = await sessionUserId(event)
  const row = await useDb()('users as u').leftJoin('memberships as m', (j) => j.on('m.user_id', 'u.id').andOnVal('m.group_id', groupId))
    .where('u.id', id).first('u.id', 'u.email', 'u.display_name', 'u.site_role', 'm.role')
  const user = await toUser(event, row)
  const role = (row.role ?? null) as GroupRole | null
  if (!role) fail(403, 'You are not a member of this group')
  if (!roleAtLeast(role, needed)) fail(403, `This needs the ${needed} role in the group; you are ${role}`)
  return { user, role: role! }
}

/**
 * A basis or theory row together with the caller's role in the group that owns it, read in
 * one query (the hot read paths: the board and the theory page). Falls back to the two-step
 * checks to tell a missing row (404) from a missing account (401).
 */
export async function requireRoleOn(event: H3Event, kind: 'bases' | 'theories', id: number, needed: GroupRole) {
  const userId = await sessionUserId(event)
  const db = useDb()
  const q = kind === 'bases'
    ? db('bases as x').join('theories as t', 't.id', 'x.theory_id').select('x.*', 't.group_id')
    : db('theories as x').select('x.*')
  const row = await q.crossJoin(db.raw('users as u'))
    .leftJoin('memberships as m', (j) => j.on('m.user_id', 'u.id').andOn('m.group_id', kind === 'bases' ? 't.group_id' : 'x.group_id'))
    .where('x.id', id).andWhere('u.id', userId)
    .first('u.email as u_email', 'u.display_name as u_name', 'u.site_role as u_site_role', 'm.role as u_role')
  if (!row) return null // caller falls back to the explicit checks for the right message
  const user: CurrentUser = { id: userId, email: row.u_email, displayName: row.u_name, siteRole: row.u_site_role }
  const role = (row.u_role ?? null) as GroupRole | null
  if (!role) fail(403, 'You are not a member of this group')
  if (!roleAtLeast(role, needed)) fail(403, `This needs the ${needed} role in the group; you are ${role}`)
  return { row, user, role: role! }
}
