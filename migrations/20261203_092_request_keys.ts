import type { Knex } from 'knex'

// Create requests sent twice (a double click, a retried connection) with the same
// Idempotency-Key header are done once: the first claims (user, key), the repeat waits for it
// and gets the same answer. Rows are forgotten after a day (server/utils/http/requestKeys.ts).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('request_keys', (t) => {
    t.integer('user_id').notNullable().references('users.id').onDelete('CASCADE')
    t.string('key', 100).notNullable()
    t.string('request_hash', 64).notNullable() // sha256 of method, path and body: a key names one request
    t.integer('status') // null while the first request is being done
    t.jsonb('response')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now()).index()
    t.primary(['user_id', 'key'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('request_keys')
}
