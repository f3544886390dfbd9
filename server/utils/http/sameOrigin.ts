import { getRequestHeader, getRequestHost, type H3Event } from 'h3'
import { fail } from './apiHandler'

// Request forgery from other pages. SameSite=Lax keeps the session cookie off cross-site
// requests, but a page of the same site (another port or subdomain of the host) still sends
// it. Browsers mark every request with Origin (all writes) and Sec-Fetch-Site, and a page can
// send only form encodings or text/plain without the server's consent (CORS), so a write is
// taken only when it comes from our own origin and carries JSON. Clients that are not
// browsers (scripts, tests) send neither header and are unaffected.

/** 403 unless the request comes from this app's own pages (or from no browser page at all). */
export function refuseForeignPage(event: H3Event) {
  const origin = getRequestHeader(event, 'origin')
  if (origin !== undefined && !isOwnOrigin(event, origin)) {
    fail(403, `This request came from a page of another site (${origin}); Scalewright accepts changes only from its own pages`)
  }
  const site = getRequestHeader(event, 'sec-fetch-site')
  if (site !== undefined && site !== 'same-origin') fail(403, 'This request came from a page of another site; Scalewright accepts changes only from its own pages')
}

/**
 * Whether an Origin header names this server: the host the request was sent to, or the public
 * address of the app (NUXT_PUBLIC_APP_URL, for a proxy that rewrites the Host header).
 */
function isOwnOrigin(event: H3Event, origin: string): boolean {
  let host: string
  try {
    host = new URL(origin).host
  } catch {
    return false // "null" (sandboxed frames, files) and anything malformed
  }
  if (host === getRequestHost(event, { xForwardedHost: false })) return true
  const app = process.env.NUXT_PUBLIC_APP_URL || process.env.APP_URL
  return !!app && new URL(app).origin === origin
}

/** 415 unless a request body is JSON: the form encodings and text/plain are what a foreign page can send. */
export function refuseNonJsonBody(event: H3Event) {
  const type = getRequestHeader(event, 'content-type')
  const length = Number(getRequestHeader(event, 'content-length') ?? 0)
  const hasBody = type !== undefined || length > 0 || getRequestHeader(event, 'transfer-encoding') !== undefined
  if (!hasBody) return
  const media = (type ?? '').split(';')[0]!.trim().toLowerCase()
  if (media !== 'application/json') {
    fail(415, `Send the request body as JSON (Content-Type: application/json), not ${media || 'a body without a type'}`)
  }
}
