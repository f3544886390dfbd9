import { inject } from 'vitest'
import type { ApiClient, Reply } from './client'

// Helpers of the attack suite (tests/api/attacks): requests shaped the way a hostile page or
// script shapes them, and timing by medians (the machine is shared and noisy).

export interface RawOptions {
  /** The body as sent, byte for byte; with `contentType: null` no Content-Type header goes out. */
  body?: string
  contentType?: string | null
  origin?: string
  fetchSite?: 'same-origin' | 'same-site' | 'cross-site' | 'none'
  cookie?: string
}

/** One request with full control over the headers a browser would add (Origin, Sec-Fetch-Site). */
export async function rawRequest(method: string, path: string, opts: RawOptions = {}): Promise<Reply> {
  const headers: Record<string, string> = { accept: 'application/json' }
  if (opts.cookie) headers.cookie = opts.cookie
  if (opts.origin) headers.origin = opts.origin
  if (opts.fetchSite) headers['sec-fetch-site'] = opts.fetchSite
  if (opts.contentType) headers['content-type'] = opts.contentType
  // A Blob without a type is the one body fetch sends with no Content-Type at all.
  const body = opts.body === undefined ? undefined : opts.contentType === null ? new Blob([opts.body]) : opts.body
  const res = await fetch(`${inject('baseUrl')}${path}`, { method, headers, body, redirect: 'manual' })
  const text = await res.text()
  let parsed: unknown = text
  try {
    parsed = JSON.parse(text)
  } catch {
    /* not JSON */
  }
  return { status: res.status, body: parsed }
}

/** A client's request as another origin's page would send it (same cookie, foreign Origin). */
export function asForeignPage(client: ApiClient, method: string, path: string, body: unknown, origin = FOREIGN_ORIGIN) {
  return rawRequest(method, path, {
    cookie: client.cookie,
    origin,
    fetchSite: 'same-site',
    body: body === undefined ? undefined : JSON.stringify(body),
    contentType: body === undefined ? undefined : 'application/json',
  })
}

/** Another port of the same host: same-site for SameSite=Lax cookies, but not the same origin. */
export const FOREIGN_ORIGIN = 'http://127.0.0.1:1'

export function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b)
  return s.length % 2 ? s[s.length >> 1]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2
}

/** Wall time of one call in milliseconds (with its result). */
export async function timed<T>(call: () => Promise<T>): Promise<{ ms: number; result: T }> {
  const start = performance.now()
  const result = await call()
  return { ms: performance.now() - start, result }
}

/**
 * Medians of two kinds of request, alternated so that load on the machine falls on both alike.
 * `a(i)` and `b(i)` make the i-th request of each kind.
 */
export async function pairedMedians<T>(tries: number, a: (i: number) => Promise<T>, b: (i: number) => Promise<T>) {
  const ta: number[] = []
  const tb: number[] = []
  const answers: { a: T[]; b: T[] } = { a: [], b: [] }
  for (let i = 0; i < tries; i++) {
    const first = i % 2 === 0
    for (const which of first ? (['a', 'b'] as const) : (['b', 'a'] as const)) {
      const { ms, result } = await timed(() => (which === 'a' ? a(i) : b(i)))
      ;(which === 'a' ? ta : tb).push(ms)
      answers[which].push(result)
    }
  }
  return { a: median(ta), b: median(tb), answers }
}
