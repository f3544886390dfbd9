import { refuseForeignPage, refuseNonJsonBody } from '../utils/http/sameOrigin'

// Every state-changing API request (anything but GET, HEAD and OPTIONS) must come from the
// app's own pages and carry JSON; see server/utils/http/sameOrigin.ts.
const READS = new Set(['GET', 'HEAD', 'OPTIONS'])

export default defineEventHandler((event) => {
  if (READS.has(event.method) || !event.path.startsWith('/api/')) return
  refuseForeignPage(event)
  refuseNonJsonBody(event)
})
