// `npm test`: start the local PostgreSQL (unless DATABASE_URL), build the app once, type-check,
// run every vitest project, and end with the plain line "N passed, N failed" that CI reads.
import { spawnSync } from 'node:child_process'
import { existsSync, mkdirSync, readFileSync } from 'node:fs'
import { join } from 'node:path'
import { ensureLocalPostgres } from './lib/postgres.mjs'
import { buildIfStale } from './lib/build.mjs'
import { root } from './lib/run.mjs'

const extra = process.argv.slice(2)
const unitOnly = extra.join(' ').includes('--project unit')
if (!unitOnly) {
  if (!process.env.DATABASE_URL) await ensureLocalPostgres([])
  buildIfStale()
}
// On a full run (as CI does it) the type check of app, server, shared code and tests counts as
// one test: a type error fails the run. `npm run typecheck` runs it alone.
const typecheck = extra.length > 0 ? null : spawnSync(process.execPath, [join(root, 'node_modules/vue-tsc/bin/vue-tsc.js'), '-b', '--noEmit'], { cwd: root, stdio: 'inherit' })
mkdirSync(join(root, 'test-results'), { recursive: true })
const report = join(root, 'test-results', 'vitest.json')
const r = spawnSync(process.execPath, [join(root, 'node_modules/vitest/vitest.mjs'), 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...extra], { cwd: root, stdio: 'inherit' })

let passed = 0
let failed = 0
if (existsSync(report)) {
  const json = JSON.parse(readFileSync(report, 'utf8'))
  passed = json.numPassedTests ?? 0
  // A suite that failed to load has no test results; count it as one failure so it shows.
  failed = (json.numFailedTests ?? 0) + (json.testResults ?? []).filter((s) => s.status === 'failed' && !(s.assertionResults ?? []).some((a) => a.status === 'failed')).length
}
if (r.status !== 0 && failed === 0) failed = 1 // the runner itself failed (setup error, crash)
if (typecheck) {
  if (typecheck.status === 0) passed += 1
  else { failed += 1; console.log('\ntype check failed (see the errors above)') }
}
const exitCode = failed > 0 ? 1 : 0
console.log(`\n${passed} passed, ${failed} failed`)
process.exit(exitCode)
