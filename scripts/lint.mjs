// `npm run lint` (import circles and ESLint), `npm run lint:cycles`, `npm run format:check`:
// the code checks of scripts/lib/codeChecks.mjs named on the command line.
import { runCodeChecks } from './lib/codeChecks.mjs'

const failed = runCodeChecks(process.argv.slice(2))
for (const name of failed) console.log(`failed: ${name}`)
process.exit(failed.length > 0 ? 1 : 0)
