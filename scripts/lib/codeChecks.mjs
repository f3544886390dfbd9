// The checks that read the code without running it: import circles (madge), ESLint and
// Prettier's layout check. `npm test` runs them on a full run before the tests, each counting as
// one test; `npm run lint` and `npm run format:check` run them alone.
import { spawnSync } from 'node:child_process'
import { join } from 'node:path'
import { root } from './run.mjs'

const bin = (pkg, file) => join(root, 'node_modules', pkg, file)

export const CODE_CHECKS = [
  {
    key: 'cycles',
    name: 'import circles (npm run lint:cycles)',
    args: [
      bin('madge', 'bin/cli.js'),
      '--circular',
      '--no-spinner',
      '--no-color',
      'app.vue',
      'pages',
      'components',
      'stores',
      'composables',
      'layouts',
      'middleware',
      'plugins',
      'server',
      'shared',
      'scripts',
      'bench',
    ],
  },
  { key: 'eslint', name: 'ESLint (npm run lint)', args: [bin('eslint', 'bin/eslint.js'), '.'] },
  { key: 'prettier', name: 'Prettier layout (npm run format:check; npm run format fixes it)', args: [bin('prettier', 'bin/prettier.cjs'), '--check', '--log-level', 'warn', '.'] },
]

/** Runs the checks named by key (all by default); returns the names of those that failed (their output is already printed). */
export function runCodeChecks(keys = CODE_CHECKS.map((c) => c.key)) {
  const failed = []
  for (const check of CODE_CHECKS.filter((c) => keys.includes(c.key))) {
    const r = spawnSync(process.execPath, check.args, { cwd: root, stdio: 'inherit' })
    if (r.status !== 0) failed.push(check.name)
  }
  return failed
}
