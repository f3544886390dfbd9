import { defineApiHandler } from '../utils/http/apiHandler'
import { useDb } from '../utils/db/connection'
import { demoState } from '../utils/demoState'
import { longestStallSinceLastReading } from '../utils/compute/eventLoopStalls'

// Liveness plus readiness: the database answers and the demo seed (if asked for) is done; and
// the event loop's longest stall (ms) since the previous health read (monitoring, attack tests).
export default defineApiHandler(async () => {
  await useDb().raw('select 1')
  return { ok: true, demo: demoState.status, longestStallMs: longestStallSinceLastReading() }
})
