import { COMPUTE_LANES } from '../utils/compute/computePool'

// Boot the first compute thread at start-up, not during a user's request: loading the engine
// in a thread takes seconds of CPU, which requests would otherwise feel.
export default defineNitroPlugin(() => {
  COMPUTE_LANES.light.warm()
})
