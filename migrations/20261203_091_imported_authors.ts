import type { Knex } from 'knex'

// Notes and tags brought in by importing a JSON export keep their author: the account when the
// file's author is a member of the group (author_id / created_by), otherwise the name as the
// file gives it (author_name), shown as imported and not matched to an account.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('annotations', (t) => t.string('author_name', 120))
  await knex.schema.alterTable('tags', (t) => t.string('author_name', 120))
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('annotations', (t) => t.dropColumn('author_name'))
  await knex.schema.alterTable('tags', (t) => t.dropColumn('author_name'))
}
