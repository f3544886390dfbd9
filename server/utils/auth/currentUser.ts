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
