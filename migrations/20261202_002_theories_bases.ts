import type { Knex } from 'knex'

// Theories (definition as JSONB, validated with zod before it is written), runs (background
// jobs), bases and their operators, annotations with edit history, tags, share links.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('theories', (t) => {
    t.increments('id').primary()
    t.integer('group_id').notNullable().references('groups.id').onDelete('CASCADE')
    t.string('name', 120).notNullable()
    t.jsonb('definition').notNullable()
    t.integer('version').notNullable().defaultTo(1) // optimistic concurrency on edits
    t.integer('parent_id').references('theories.id').onDelete('SET NULL') // tower link
    t.jsonb('threshold') // { scale, unit, removedFields } when made by integrating out
    t.integer('created_by').references('users.id').onDelete('SET NULL')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.unique(['group_id', 'name'])
  })
  await knex.schema.createTable('runs', (t) => {
    t.increments('id').primary()
    t.integer('theory_id').notNullable().references('theories.id').onDelete('CASCADE').index()
    t.string('kind', 32).notNullable() // count | basis
    t.enu('status', ['queued', 'running', 'done', 'failed', 'cancelled'], { useNative: true, enumName: 'run_status' }).notNullable().defaultTo('queued')
    t.jsonb('params').notNullable()
    t.double('progress').notNullable().defaultTo(0)
    t.string('current_label', 200).notNullable().defaultTo('')
    t.jsonb('summary')
    t.text('error')
    t.boolean('cancel_requested').notNullable().defaultTo(false)
    t.integer('created_by').references('users.id').onDelete('SET NULL')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('started_at', { useTz: true })
    t.timestamp('finished_at', { useTz: true })
  })
  await knex.schema.createTable('bases', (t) => {
    t.increments('id').primary()
    t.integer('theory_id').notNullable().references('theories.id').onDelete('CASCADE').index()
    t.integer('run_id').references('runs.id').onDelete('SET NULL')
    t.integer('theory_version').notNullable()
    t.string('counting_rule', 64).notNullable().defaultTo('massRatio')
    t.integer('max_order').notNullable()
    t.integer('version').notNullable().defaultTo(1)
    t.jsonb('classes').notNullable().defaultTo('[]') // per class: key, rank, hilbert, tallyOk
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('operators', (t) => {
    t.increments('id').primary()
    t.integer('basis_id').notNullable().references('bases.id').onDelete('CASCADE')
    t.integer('order').notNullable()
    t.string('class_key', 200).notNullable()
    t.enu('column', ['kept', 'set_aside'], { useNative: true, enumName: 'operator_column' }).notNullable()
    t.integer('position').notNullable()
    t.jsonb('structure').notNullable()
    t.text('latex').notNullable()
    t.text('latex_dirac')
    t.boolean('hermitian').notNullable()
    t.integer('real_parameters').notNullable()
    t.index(['basis_id', 'order', 'column', 'position'])
  })
  await knex.schema.createTable('annotations', (t) => {
    t.increments('id').primary()
    t.integer('theory_id').notNullable().references('theories.id').onDelete('CASCADE').index()
    t.integer('operator_id').references('operators.id').onDelete('CASCADE').index()
    t.integer('author_id').references('users.id').onDelete('SET NULL')
    t.text('body').notNullable()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('annotation_revisions', (t) => {
    t.increments('id').primary()
    t.integer('annotation_id').notNullable().references('annotations.id').onDelete('CASCADE').index()
    t.text('body').notNullable() // the text as it was before an edit
    t.integer('edited_by').references('users.id').onDelete('SET NULL')
    t.timestamp('edited_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('tags', (t) => {
    t.increments('id').primary()
    t.integer('operator_id').notNullable().references('operators.id').onDelete('CASCADE').index()
    t.string('kind', 32).notNullable() // threshold | tree | loop | cp-odd | b-violating | custom
    t.string('label', 120).notNullable().defaultTo('')
    t.integer('created_by').references('users.id').onDelete('SET NULL')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.unique(['operator_id', 'kind', 'label'])
  })
  await knex.schema.createTable('share_links', (t) => {
    t.increments('id').primary()
    t.integer('theory_id').notNullable().references('theories.id').onDelete('CASCADE').index()
    t.string('token_hash', 64).notNullable().unique()
    t.integer('created_by').references('users.id').onDelete('SET NULL')
    t.timestamp('expires_at', { useTz: true })
    t.timestamp('revoked_at', { useTz: true })
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['share_links', 'tags', 'annotation_revisions', 'annotations', 'operators', 'bases', 'runs', 'theories']) {
    await knex.schema.dropTableIfExists(table)
  }
  await knex.raw('DROP TYPE IF EXISTS operator_column; DROP TYPE IF EXISTS run_status')
}
