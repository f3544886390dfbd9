// `npm run test:faults`: the fault suite (tests/faults, vitest.faults.config.ts) on a cluster of
// its own: kill -9 of PostgreSQL during acknowledged writes, PostgreSQL stopped and started
// while the app serves, kill -9 of the worker mid-run. FAULT_TRIALS sets the crash trials
// (default 3). Ends with "N passed, N failed" like `npm test`.
import { buildIfStale } from './lib/build.mjs'
import { serverBinDir } from './lib/pgCluster.mjs'
import { runVitest } from './lib/vitestRun.mjs'

serverBinDir() // installs Debian's PostgreSQL when missing
buildIfStale()
const { passed, failed } = runVitest(['--config', 'vitest.faults.config.ts', ...process.argv.slice(2)], 'faults.json')
console.log(`\n${passed} passed, ${failed} failed`)
process.exit(failed > 0 ? 1 : 0)
