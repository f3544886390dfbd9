// Run vitest with the JSON reporter and count what passed and failed, so that the scripts can
// end with the plain line "N passed, N failed" that CI reads.
import { spawnSync } from 'node:child_process'
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs'
import { join } from 'node:path'
import { root } from './run.mjs'

export function runVitest(args, reportName = 'vitest.json', env = process.env) {
  mkdirSync(join(root, 'test-results'), { recursive: true })
  const report = join(root, 'test-results', reportName)
  rmSync(report, { force: true })
  const r = spawnSync(process.execPath, [join(root, 'node_modules/vitest/vitest.mjs'), 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...args], {
    cwd: root,
    stdio: 'inherit',
    env,
  })
  let passed = 0
  let failed = 0
  if (existsSync(report)) {
    const json = JSON.parse(readFileSync(report, 'utf8'))
    passed = json.numPassedTests ?? 0
    // A suite that failed to load has no test results; count it as one failure so it shows.
    failed = (json.numFailedTests ?? 0) + (json.testResults ?? []).filter((s) => s.status === 'failed' && !(s.assertionResults ?? []).some((a) => a.status === 'failed')).length
  }
  if (r.status !== 0 && failed === 0) failed = 1 // the runner itself failed (setup error, crash)
  return { passed, failed }
}
