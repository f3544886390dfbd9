import type { Knex } from 'knex'

// One row per sign-in: the sealed cookie carries the row's id, and every request reads the row
// with the account, so signing out (deleting the row) ends the session on the server at once.
// A password change, a reset or "sign out everywhere else" deletes the account's other rows,
// which replaces the per-account cut-off time.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sessions', (t) => {
    t.uuid('id').primary()
    t.integer('user_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now()).index()
  })
  await knex.schema.alterTable('users', (t) => t.dropColumn('sessions_valid_from'))
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => t.timestamp('sessions_valid_from', { useTz: true }))
  await knex.schema.dropTableIfExists('sessions')
}
