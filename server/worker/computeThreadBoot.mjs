// Compute-pool thread bootstrap: teach this thread TypeScript (tsx), then load the task loop.
import { register } from 'tsx/esm/api'

register()
await import('./computeThread.ts')
