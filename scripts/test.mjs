// `npm test`: install what the tests need from Debian when missing (PostgreSQL, Chromium, LiE,
// pdflatex and Latin Modern), start the local PostgreSQL (unless DATABASE_URL), build the app
// once, type-check, run every vitest project, and end with the plain line "N passed, N failed"
// that CI reads.
import { spawnSync } from 'node:child_process'
import { join } from 'node:path'
import { ensureLocalPostgres } from './lib/postgres.mjs'
import { buildIfStale } from './lib/build.mjs'
import { ensureDebianPackages, TEST_PACKAGES } from './lib/debian.mjs'
import { root } from './lib/run.mjs'
import { runVitest } from './lib/vitestRun.mjs'
import { runCodeChecks, CODE_CHECKS } from './lib/codeChecks.mjs'

const extra = process.argv.slice(2)
const projects = extra.flatMap((a, i) => (a === '--project' ? [extra[i + 1]] : a.startsWith('--project=') ? [a.slice(10)] : []))
const runs = (name) => projects.length === 0 || projects.includes(name)
ensureDebianPackages(TEST_PACKAGES.filter((p) => p.pkg !== 'chromium' || runs('e2e')))
if (runs('api') || runs('e2e')) {
  if (!process.env.DATABASE_URL) await ensureLocalPostgres([])
  buildIfStale()
}
// On a full run (as CI does it) the code checks (import circles, ESLint, Prettier's layout) run
// first and count as one test each.
const checksFailed = extra.length > 0 ? null : runCodeChecks()
// On a full run (as CI does it) the type check of app, server, shared code and tests counts as
// one test: a type error fails the run. `npm run typecheck` runs it alone.
const typecheck = extra.length > 0 ? null : spawnSync(process.execPath, [join(root, 'node_modules/vue-tsc/bin/vue-tsc.js'), '-b', '--noEmit'], { cwd: root, stdio: 'inherit' })
let { passed, failed } = runVitest(extra)
if (typecheck) {
  if (typecheck.status === 0) passed += 1
  else {
    failed += 1
    console.log('\ntype check failed (see the errors above)')
  }
}
if (checksFailed) {
  passed += CODE_CHECKS.length - checksFailed.length
  failed += checksFailed.length
  for (const name of checksFailed) console.log(`\ncode check failed: ${name} (see the output above)`)
}
console.log(`\n${passed} passed, ${failed} failed`)
process.exit(failed > 0 ? 1 : 0)
