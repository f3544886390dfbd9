import type { Knex } from 'knex'

// Coverage per class, kept up to date by moves and imports, so that reading a board computes
// nothing (the rank work happens once per change, not once per read).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('bases', (t) => {
    t.jsonb('coverage').notNullable().defaultTo('{}')
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('bases', (t) => t.dropColumn('coverage'))
}
