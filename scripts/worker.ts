// `npm run worker`: take runs from the PostgreSQL queue and carry them out. Start as many as
// you like, on any machine that reaches DATABASE_URL; each takes one run at a time.
import { useQueue, RUN_QUEUE, stopQueue } from '../server/utils/jobs/queue'
import { useDb, closeDb } from '../server/utils/db/connection'
import { executeRun } from '../server/worker/executeRun'

const boss = await useQueue()
const db = useDb()
await boss.work<{ runId: number }>(RUN_QUEUE, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
  await executeRun(db, job!.data.runId)
})
console.log(`[worker] ready (pid ${process.pid}), queue ${RUN_QUEUE}`)

async function shutdown() {
  await stopQueue()
  await closeDb()
  process.exit(0)
}
process.on('SIGTERM', shutdown)
process.on('SIGINT', shutdown)
