import { COMPUTE_LANES } from '../utils/compute/computePool'
import { longestStallSinceLastReading } from '../utils/compute/eventLoopStalls'

// Boot the first compute thread at start-up, not during a user's request: loading the engine
// in a thread takes seconds of CPU, which requests would otherwise feel. The board lane's thread
// too: its math runs while a board lock is held, and a boot there would hold up other edits.
export default defineNitroPlugin(() => {
  COMPUTE_LANES.light.warm()
  COMPUTE_LANES.board.warm()
  longestStallSinceLastReading() // starts watching the event loop
})
