import type { Knex } from 'knex'

// Runs remember the queue job that carries them, so that a run whose worker died can be
// recognised (the queue marks the job failed) and shown as failed instead of hanging.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('runs', (t) => {
    t.string('job_id', 64)
    t.integer('attempts').notNullable().defaultTo(0)
  })
  await knex.schema.alterTable('bases', (t) => {
    t.unique(['run_id'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('bases', (t) => t.dropUnique(['run_id']))
  await knex.schema.alterTable('runs', (t) => {
    t.dropColumn('job_id')
    t.dropColumn('attempts')
  })
}
