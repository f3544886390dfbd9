import type { Knex } from 'knex'

// The engine version each basis's fingerprints came from (FINGERPRINT_VERSION in
// server/engine/board/fingerprintVersion.ts). Existing rows stay null: they were stored before
// versions were recorded and are read as version 1. Heavy-frame bases have no fingerprints
// and keep null.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('bases', (t) => {
    t.integer('fingerprint_version').nullable()
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('bases', (t) => t.dropColumn('fingerprint_version'))
}
