import type { Knex } from 'knex'

// Scale ladders: one per theory, the ladder as the engine's zod schema accepts it (validated
// before it is written), with a version for optimistic concurrency between editors.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('scale_ladders', (t) => {
    t.increments('id').primary()
    t.integer('theory_id').notNullable().unique().references('theories.id').onDelete('CASCADE')
    t.jsonb('ladder').notNullable()
    t.integer('version').notNullable().defaultTo(1)
    t.integer('updated_by').references('users.id').onDelete('SET NULL')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('scale_ladders')
}
