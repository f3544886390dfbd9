import type { Knex } from 'knex'

// Failed runs stored before errors were written for users: drop the function-name prefix of
// an engine message ("parseTheory: …", "QuotientSpace.rewrite: …"), and replace the text of
// an unexpected failure (a runtime message, a stopped engine thread) by a sentence that says
// what happened. New failures store a readable message or an error reference.
const PREFIX = String.raw`^([a-z]+[A-Z][A-Za-z]*|[A-Za-z]+\.[A-Za-z]+|rat|div|crt|rref|solve|multiply|heavy algebra): `
const RUNTIME = String.raw`(Cannot read propert|is not a function|is not iterable|is not defined|engine thread exited|Maximum call stack)`
const OLD_INTERNAL = 'This run failed with an internal error (recorded before error references were kept); start it again, and quote the reference if it fails again.'

export async function up(knex: Knex): Promise<void> {
  await knex('runs').where({ status: 'failed' }).whereRaw('error ~ ?', [RUNTIME]).update({ error: OLD_INTERNAL })
  await knex('runs').where({ status: 'failed' }).whereRaw('error ~ ?', [PREFIX]).update({ error: knex.raw('regexp_replace(error, ?, \'\')', [PREFIX]) })
}

// The old texts are not kept: they were never meant to be shown.
export async function down(): Promise<void> {}
