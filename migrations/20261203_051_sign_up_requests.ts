import type { Knex } from 'knex'

// Sign-up by e-mailed link: the account is created only when the link is opened, so that the
// answer to a sign-up is the same whether or not the address already has an account.
// `account_mails` counts the mails sent per address and purpose (sign-up, reset) within the
// last hour, known address or not, to keep anyone from flooding an inbox.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sign_up_requests', (t) => {
    t.increments('id').primary()
    t.string('email', 254).notNullable().index() // lower-cased
    t.string('display_name', 80).notNullable()
    t.text('password_hash').notNullable()
    t.string('token_hash', 64).notNullable().unique() // sha256 of the e-mailed token
    t.timestamp('expires_at', { useTz: true }).notNullable().index()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('account_mails', (t) => {
    t.increments('id').primary()
    t.string('address', 254).notNullable()
    t.string('purpose', 16).notNullable() // sign-up | reset
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['address', 'purpose', 'created_at'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('account_mails')
  await knex.schema.dropTableIfExists('sign_up_requests')
}
