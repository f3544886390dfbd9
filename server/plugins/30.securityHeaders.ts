import { setResponseHeaders, setResponseHeader } from 'h3'
import { pageCsp, COMMON_HEADERS, API_CSP } from '../utils/http/pageCsp'

// Security headers: nosniff, a same-origin referrer policy (share links carry their token in
// the address) and no framing on every answer; a hash-based Content-Security-Policy on pages.
// Not in development, where Vite's client injects scripts of its own.
export default defineNitroPlugin((nitroApp) => {
  if (import.meta.dev) return
  nitroApp.hooks.hook('request', (event) => {
    setResponseHeaders(event, COMMON_HEADERS)
    if (event.path.startsWith('/api/')) setResponseHeader(event, 'content-security-policy', API_CSP)
  })
  nitroApp.hooks.hook('render:response', (response) => {
    const type = String(response.headers?.['content-type'] ?? '')
    if (!type.startsWith('text/html') || typeof response.body !== 'string') return
    response.headers = { ...response.headers, 'content-security-policy': pageCsp(response.body) }
  })
})
