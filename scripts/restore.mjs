// `npm run restore -- FILE`: replace the database with a backup made by `npm run backup`.
// The backup is restored into a new database in one transaction; only when that succeeded is
// it renamed into place, and the database it replaces is kept under another name. Stop the
// app and its workers first (the script refuses while anything else is connected).
import { spawnSync } from 'node:child_process'
import { existsSync } from 'node:fs'
import { resolve } from 'node:path'
import pg from 'pg'
import { appDatabaseUrl } from './lib/postgres.mjs'
import { databaseOf, pgTool, quoteIdent, shown, timestamp, withDatabase } from './lib/dumpTools.mjs'

function stop(message) {
  console.error(`restore: ${message}`)
  process.exit(1)
}

const file = process.argv[2] ? resolve(process.argv[2]) : stop('name the backup file: npm run restore -- FILE')
if (!existsSync(file)) stop(`${file} does not exist`)
if (spawnSync(pgTool('pg_restore'), ['--list', file], { stdio: 'ignore' }).status !== 0) stop(`${file} is not a backup made by npm run backup (pg_restore cannot read it)`)

const url = await appDatabaseUrl()
const name = databaseOf(url)
const staging = `${name}_restoring`.slice(0, 63)
const kept = `${name}_before_restore_${timestamp().replace('-', '_')}`.slice(0, 63)
const admin = new pg.Client({ connectionString: withDatabase(url, 'postgres') })
await admin.connect()
try {
  const { rows: others } = await admin.query('SELECT count(*)::int AS n FROM pg_stat_activity WHERE datname = $1', [name])
  if (others[0].n > 0) stop(`${others[0].n} connection(s) to ${name} are open: stop npm start and every worker, then restore again (nothing was changed)`)
  await admin.query(`DROP DATABASE IF EXISTS ${quoteIdent(staging)}`)
  await admin.query(`CREATE DATABASE ${quoteIdent(staging)}`)
  const r = spawnSync(pgTool('pg_restore'), ['--no-owner', '--no-privileges', '--exit-on-error', '--single-transaction', `--dbname=${withDatabase(url, staging)}`, file], {
    stdio: ['ignore', 'inherit', 'inherit'],
  })
  if (r.status !== 0) {
    await admin.query(`DROP DATABASE IF EXISTS ${quoteIdent(staging)}`)
    stop(`pg_restore failed (exit ${r.status ?? r.signal}); ${name} is unchanged`)
  }
  const { rows: exists } = await admin.query('SELECT 1 FROM pg_database WHERE datname = $1', [name])
  if (exists.length) await admin.query(`ALTER DATABASE ${quoteIdent(name)} RENAME TO ${quoteIdent(kept)}`)
  await admin.query(`ALTER DATABASE ${quoteIdent(staging)} RENAME TO ${quoteIdent(name)}`)
  console.log(`restored ${file} into ${shown(url)}`)
  if (exists.length) console.log(`the database it replaced is kept as ${kept} (drop it when you no longer need it: DROP DATABASE ${kept})`)
} finally {
  await admin.end()
}
