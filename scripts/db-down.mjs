// `npm run db:down`: stop the project-local PostgreSQL (a fast shutdown: open transactions are
// rolled back, everything committed stays).
import { mainCluster } from './lib/postgres.mjs'

if (mainCluster.isReady()) {
  mainCluster.stop()
  console.log(`PostgreSQL stopped (${mainCluster.dataDir})`)
} else {
  console.log(`PostgreSQL was not running (${mainCluster.dataDir})`)
}
