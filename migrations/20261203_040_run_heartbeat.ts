import type { Knex } from 'knex'

// A run's worker writes heartbeat_at every half second while it computes. A running run whose
// heartbeat is old lost its worker (killed, machine gone): it is retried once or failed with a
// clear message (server/utils/jobs/orphans.ts). `worker` says which process holds it (host:pid).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('runs', (t) => {
    t.timestamp('heartbeat_at', { useTz: true })
    t.string('worker', 120)
  })
  await knex.raw(`CREATE INDEX runs_active_idx ON runs (status) WHERE status IN ('queued', 'running')`)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX IF EXISTS runs_active_idx')
  await knex.schema.alterTable('runs', (t) => {
    t.dropColumn('heartbeat_at')
    t.dropColumn('worker')
  })
}
