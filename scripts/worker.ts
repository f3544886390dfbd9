// `npm run worker`: take runs from the PostgreSQL queue and carry them out. Start as many as
// you like, on any machine that reaches DATABASE_URL; each takes one run at a time, and each
// sweeps for runs whose worker vanished (server/utils/jobs/orphans.ts).
import { appDatabaseUrl } from './lib/postgres.mjs'
import { useQueue, RUN_QUEUE, stopQueue, sendRunJob } from '../server/utils/jobs/queue'
import { settleRuns, RUN_LEASE } from '../server/utils/jobs/orphans'
import { useDb, closeDb } from '../server/utils/db/connection'
import { executeRun } from '../server/worker/executeRun'
import { WORKER_ID } from '../server/worker/runLease'

process.env.DATABASE_URL = await appDatabaseUrl()
const boss = await useQueue()
const db = useDb()
await boss.work<{ runId: number }>(RUN_QUEUE, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
  await executeRun(db, job!.data.runId, sendRunJob)
})
console.log(`[worker] ready (${WORKER_ID}), queue ${RUN_QUEUE}`)

const SETTLED = { cancelled: 'cancelled (their worker had stopped)', failed: 'failed (their worker stopped twice)', requeued: 'queued again (their worker stopped)', resent: 'given a new queue job' }
let sweepFailing = false
const sweeper = setInterval(async () => {
  try {
    const settled = await settleRuns(db, sendRunJob)
    for (const [what, ids] of Object.entries(settled)) if (ids.length) console.log(`[worker] runs ${ids.join(', ')} ${SETTLED[what as keyof typeof SETTLED]}`)
    sweepFailing = false
  } catch (error) {
    if (!sweepFailing) console.error('[worker] sweep for stopped runs failed (retrying):', (error as Error).message)
    sweepFailing = true
  }
}, RUN_LEASE.sweepMs)

async function shutdown() {
  clearInterval(sweeper)
  await stopQueue()
  await closeDb()
  process.exit(0)
}
process.on('SIGTERM', shutdown)
process.on('SIGINT', shutdown)
