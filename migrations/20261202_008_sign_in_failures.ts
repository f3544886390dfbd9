import type { Knex } from 'knex'

// Failed sign-ins per (address, client address), kept for the throttling window only: a
// security record, not user data (see server/utils/auth/throttle.ts).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sign_in_failures', (t) => {
    t.increments('id').primary()
    t.string('key', 400).notNullable()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['key', 'created_at'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('sign_in_failures')
}
