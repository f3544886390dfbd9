// Worker-thread bootstrap: teach this thread TypeScript (tsx), then load the engine entry.
import { register } from 'tsx/esm/api'

register()
await import('./engineThread.ts')
