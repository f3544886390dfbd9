import knexFactory, { type Knex } from 'knex'
import { inject } from 'vitest'

let db: Knex | undefined
export function testDb(): Knex {
  db ??= knexFactory({ client: 'pg', connection: inject('databaseUrl'), pool: { min: 0, max: 4 } })
  return db
}

export const ALL_TABLES = [
  'users',
  'password_resets',
  'groups',
  'memberships',
  'invitations',
  'outbox',
  'theories',
  'runs',
  'bases',
  'operators',
  'annotations',
  'annotation_revisions',
  'tags',
  'share_links',
  'threshold_tags',
  'scale_ladders',
  'sessions',
  'sign_up_requests',
  'account_mails',
  'request_keys',
]

const MARKS = { annotations: 'deleted_at', tags: 'deleted_at', theories: 'deleted_at', bases: 'deleted_at', groups: 'deleted_at', share_links: 'revoked_at' }

/** Row counts of every table, to prove that a rejected request wrote nothing. */
export async function rowCounts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {}
  for (const t of ALL_TABLES) {
    const [row] = await testDb()(t).count<{ count: string }[]>('* as count')
    out[t] = Number(row!.count)
  }
  // Deleting marks rows instead of removing them: their marks count as writes too.
  for (const [t, column] of Object.entries(MARKS)) {
    const [row] = await testDb()(t).whereNotNull(column).count<{ count: string }[]>('* as count')
    out[`${t} with ${column}`] = Number(row!.count)
  }
  return out
}

/** Make a signed-up account a site admin (there is no route that lets a member do this). */
export async function makeAdmin(userId: number) {
  await testDb()('users').where({ id: userId }).update({ site_role: 'admin' })
}
