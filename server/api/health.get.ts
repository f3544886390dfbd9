import { defineApiHandler } from '../utils/http/apiHandler'
import { useDb } from '../utils/db/connection'
import { demoState } from '../utils/demoState'

// Liveness plus readiness: the database answers and the demo seed (if asked for) is done.
export default defineApiHandler(async () => {
  await useDb().raw('select 1')
  return { ok: true, demo: demoState.status }
})
