import type { Knex } from 'knex'

// The basis board: each operator carries a version so that two collaborators moving
// different operators merge, and moving the same one is reported instead of lost.
// Each operator may carry its fingerprint (values at the class's sample points over two
// primes), from which coverage and rewrites are exact linear algebra.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('operators', (t) => {
    t.integer('version').notNullable().defaultTo(1)
    t.string('text', 400).notNullable().defaultTo('') // the operator in our input syntax
    t.jsonb('fingerprint')
    t.integer('moved_by').references('users.id').onDelete('SET NULL')
    t.timestamp('moved_at', { useTz: true })
  })
  await knex.schema.alterTable('bases', (t) => {
    t.text('note').notNullable().defaultTo('')
  })
  await knex.schema.createTable('threshold_tags', (t) => {
    t.increments('id').primary()
    t.integer('theory_id').notNullable().references('theories.id').onDelete('CASCADE').index()
    t.string('term', 120).notNullable() // e.g. "kinetic term of Uh"
    t.string('field', 64).notNullable() // the heavy field whose removal shifts it
    t.text('text').notNullable()
    t.jsonb('details') // beta-function shift, matching scale, …
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('threshold_tags')
  await knex.schema.alterTable('bases', (t) => t.dropColumn('note'))
  await knex.schema.alterTable('operators', (t) => {
    for (const c of ['version', 'text', 'fingerprint', 'moved_by', 'moved_at']) t.dropColumn(c)
  })
}
