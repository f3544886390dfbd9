import type { Knex } from 'knex'

// Sessions are sealed cookies (nothing stored per session). A password reset sets this
// cut-off; a cookie whose sign-in time is earlier is refused from then on.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => {
    t.timestamp('sessions_valid_from', { useTz: true })
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => t.dropColumn('sessions_valid_from'))
}
