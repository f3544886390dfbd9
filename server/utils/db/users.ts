import type { Knex } from 'knex'
import { useDb } from './connection'

export interface UserRow { id: number, email: string, display_name: string, password_hash: string, site_role: 'admin' | 'member' }

export function findUserByEmail(email: string): Promise<UserRow | undefined> {
  return useDb()('users').where({ email: email.toLowerCase() }).first()
}

export async function createUser(input: { email: string, displayName: string, passwordHash: string, siteRole?: 'admin' | 'member' }, db: Knex = useDb()): Promise<UserRow> {
  const [row] = await db('users')
    .insert({ email: input.email.toLowerCase(), display_name: input.displayName, password_hash: input.passwordHash, site_role: input.siteRole ?? 'member' })
    .returning('*')
  return row
}

export function publicUser(row: Pick<UserRow, 'id' | 'email' | 'display_name' | 'site_role'>) {
  return { id: row.id, email: row.email, displayName: row.display_name, siteRole: row.site_role }
}
