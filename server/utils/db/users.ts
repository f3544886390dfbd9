import type { Knex } from 'knex'
import { useDb } from './connection'
import { fail } from '../http/apiHandler'
import { endOtherSessions } from '../auth/sessions'

export interface UserRow {
  id: number
  email: string
  display_name: string
  password_hash: string
  site_role: 'admin' | 'member'
}

export function findUserByEmail(email: string): Promise<UserRow | undefined> {
  return useDb()('users').where({ email: email.toLowerCase() }).first()
}

export async function createUser(input: { email: string; displayName: string; passwordHash: string; siteRole?: 'admin' | 'member' }, db: Knex = useDb()): Promise<UserRow> {
  const [row] = await db('users')
    .insert({ email: input.email.toLowerCase(), display_name: input.displayName, password_hash: input.passwordHash, site_role: input.siteRole ?? 'member' })
    .returning('*')
  return row
}

export function publicUser(row: Pick<UserRow, 'id' | 'email' | 'display_name' | 'site_role'>) {
  return { id: row.id, email: row.email, displayName: row.display_name, siteRole: row.site_role }
}

/**
 * A new password (inside the caller's transaction): every reset link of the account not yet
 * used is spent, and every session ends except `keep` (the browser that changed it, if any).
 */
export async function setPassword(trx: Knex.Transaction, userId: number, passwordHash: string, keep: string | null) {
  await trx('users').where({ id: userId }).update({ password_hash: passwordHash })
  await trx('password_resets').where({ user_id: userId }).whereNull('used_at').update({ used_at: trx.fn.now() })
  await endOtherSessions(userId, keep, trx)
}

/**
 * Set an account's site role as the admin `callerId`, keeping at least one admin. Every change
 * first locks the admins' rows in id order, so concurrent changes run one after the other
 * (without deadlock) and each sees the admins the one before left; the caller's own role is
 * checked again under the lock.
 */
export async function setSiteRole(callerId: number, targetId: number, siteRole: 'admin' | 'member') {
  await useDb().transaction(async (trx) => {
    const admins = (await trx('users').where({ site_role: 'admin' }).orderBy('id').forNoKeyUpdate().select('id')).map((r) => r.id as number)
    if (!admins.includes(callerId)) fail(403, 'This needs the site administrator role')
    const target = await trx('users').where({ id: targetId }).first('id', 'site_role')
    if (!target) fail(404, `No account with id ${targetId}`)
    if (siteRole === 'member' && target.site_role === 'admin' && admins.length <= 1) fail(409, 'The site needs at least one admin; make someone else admin first')
    await trx('users').where({ id: targetId }).update({ site_role: siteRole })
  })
}
