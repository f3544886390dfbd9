// `npm run backup [-- FILE]`: the whole database (app tables and the run queue) in pg_dump's
// custom format, to FILE or backups/scalewright-<date>-<time>.dump. Consistent while the app
// runs (pg_dump reads one snapshot); written to FILE.partial first, so a file under the final
// name is always complete.
import { spawnSync } from 'node:child_process'
import { mkdirSync, renameSync, rmSync, statSync } from 'node:fs'
import { dirname, join, resolve } from 'node:path'
import { appDatabaseUrl } from './lib/postgres.mjs'
import { pgTool, shown, timestamp } from './lib/dumpTools.mjs'
import { root } from './lib/run.mjs'

const url = await appDatabaseUrl()
const file = resolve(process.argv[2] ?? join(root, 'backups', `scalewright-${timestamp()}.dump`))
mkdirSync(dirname(file), { recursive: true })
const partial = `${file}.partial`
const r = spawnSync(pgTool('pg_dump'), ['--format=custom', '--no-owner', '--no-privileges', `--file=${partial}`, `--dbname=${url}`], { stdio: ['ignore', 'inherit', 'inherit'] })
if (r.status !== 0) {
  rmSync(partial, { force: true })
  console.error(`backup failed: pg_dump of ${shown(url)} exited with ${r.status ?? r.signal}; nothing was written`)
  process.exit(1)
}
renameSync(partial, file)
console.log(`backup of ${shown(url)} written to ${file} (${(statSync(file).size / 1024).toFixed(0)} KiB)`)
console.log(`restore it with: npm run restore -- ${file}`)
