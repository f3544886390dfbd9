import type { Knex } from 'knex'

// Deleting a note, tag, theory, basis or group marks it (deleted_at, deleted_by) instead of
// removing it: every read hides marked rows, and undo clears the mark. A theory's name need only
// be unique among the group's theories that are not deleted, so a deleted one does not block
// its name (restoring it then refuses while another theory carries that name).
const TABLES = ['annotations', 'tags', 'theories', 'bases', 'groups']

export async function up(knex: Knex): Promise<void> {
  for (const table of TABLES) {
    await knex.schema.alterTable(table, (t) => {
      t.timestamp('deleted_at', { useTz: true })
      t.integer('deleted_by').references('users.id').onDelete('SET NULL')
    })
  }
  await knex.schema.alterTable('theories', (t) => t.dropUnique(['group_id', 'name']))
  await knex.raw('CREATE UNIQUE INDEX theories_live_name_unique ON theories (group_id, name) WHERE deleted_at IS NULL')
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX IF EXISTS theories_live_name_unique')
  await knex.schema.alterTable('theories', (t) => t.unique(['group_id', 'name']))
  for (const table of TABLES) {
    await knex.schema.alterTable(table, (t) => {
      t.dropColumn('deleted_by')
      t.dropColumn('deleted_at')
    })
  }
}
