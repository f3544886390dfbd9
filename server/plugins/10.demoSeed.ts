import { seedDemo } from '../../seeds/demo'
import { useDb } from '../utils/db/connection'
import { demoState } from '../utils/demoState'
import { useQueue, RUN_QUEUE } from '../utils/jobs/queue'

// With SCALEWRIGHT_DEMO=1 (set by `npm start`), an empty database receives the demo group.
// Seeding runs here because passwords are hashed with nuxt-auth-utils' own scrypt helper.
export default defineNitroPlugin(() => {
  if (process.env.SCALEWRIGHT_DEMO !== '1') return
  demoState.status = 'seeding'
  const enqueue = async (runId: number) => (await useQueue()).send(RUN_QUEUE, { runId })
  seedDemo(useDb(), (password) => hashPassword(password), enqueue)
    .then(() => {
      demoState.status = 'ready'
    })
    .catch((error) => {
      demoState.status = 'failed'
      console.error('[demo] seeding failed', error)
    })
})
