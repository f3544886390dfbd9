import type { Knex } from 'knex'

// Accounts, groups and memberships; password-reset tokens; the fake e-mail outbox.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary()
    t.string('email', 254).notNullable().unique() // stored lower-cased
    t.string('display_name', 80).notNullable()
    t.text('password_hash').notNullable()
    t.enu('site_role', ['admin', 'member'], { useNative: true, enumName: 'site_role' }).notNullable().defaultTo('member')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('password_resets', (t) => {
    t.increments('id').primary()
    t.integer('user_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.string('token_hash', 64).notNullable().unique() // sha256 of the e-mailed token
    t.timestamp('expires_at', { useTz: true }).notNullable()
    t.timestamp('used_at', { useTz: true })
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('groups', (t) => {
    t.increments('id').primary()
    t.string('slug', 48).notNullable().unique()
    t.string('name', 120).notNullable()
    t.text('description').notNullable().defaultTo('')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('memberships', (t) => {
    t.integer('group_id').notNullable().references('groups.id').onDelete('CASCADE')
    t.integer('user_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.enu('role', ['owner', 'editor', 'commenter', 'viewer'], { useNative: true, enumName: 'group_role' }).notNullable()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.primary(['group_id', 'user_id'])
  })
  await knex.schema.createTable('invitations', (t) => {
    t.increments('id').primary()
    t.integer('group_id').notNullable().references('groups.id').onDelete('CASCADE').index()
    t.string('email', 254).notNullable()
    t.specificType('role', 'group_role').notNullable()
    t.string('token_hash', 64).notNullable().unique()
    t.integer('invited_by').references('users.id').onDelete('SET NULL')
    t.timestamp('expires_at', { useTz: true }).notNullable()
    t.timestamp('accepted_at', { useTz: true })
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('outbox', (t) => {
    t.increments('id').primary()
    t.string('to_address', 254).notNullable().index()
    t.string('subject', 200).notNullable()
    t.text('text_body').notNullable()
    t.text('raw').notNullable() // the RFC 822 message nodemailer built
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['outbox', 'invitations', 'memberships', 'groups', 'password_resets', 'users']) {
    await knex.schema.dropTableIfExists(table)
  }
  await knex.raw('DROP TYPE IF EXISTS group_role; DROP TYPE IF EXISTS site_role')
}
