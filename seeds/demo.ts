import type { Knex } from 'knex'
import { DEMO_ADMIN, DEMO_GROUP, DEMO_MEMBERS, DEMO_PASSWORD } from './demoPeople'
import { DEMO_THEORIES } from './demoTheories'

/**
 * Seed the demo into an empty database (does nothing when any account exists).
 * `hash` is the app's password hasher, passed in so that seeding stays framework-free.
 */
export async function seedDemo(db: Knex, hash: (password: string) => Promise<string>): Promise<boolean> {
  const existing = await db('users').count<{ count: string }[]>('id as count')
  if (Number(existing[0]!.count) > 0) return false
  const passwordHash = await hash(DEMO_PASSWORD)
  await db.transaction(async (trx) => {
    await trx('users').insert({ email: DEMO_ADMIN.email, display_name: DEMO_ADMIN.displayName, password_hash: passwordHash, site_role: 'admin' })
    const [group] = await trx('groups').insert(DEMO_GROUP).returning('id')
    for (const member of DEMO_MEMBERS) {
      const [user] = await trx('users').insert({ email: member.email, display_name: member.displayName, password_hash: passwordHash }).returning('id')
      await trx('memberships').insert({ group_id: group.id, user_id: user.id, role: member.role })
    }
    const owner = await trx('users').where({ email: DEMO_MEMBERS[0].email }).first('id')
    for (const definition of DEMO_THEORIES) {
      await trx('theories').insert({ group_id: group.id, name: definition.name, definition: JSON.stringify(definition), created_by: owner.id })
    }
  })
  return true
}
