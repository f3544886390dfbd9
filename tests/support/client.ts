import { inject } from 'vitest'
import { randomBytes } from 'node:crypto'

export interface Reply {
  status: number
  body: any
}

/** A tiny HTTP client that keeps the session cookie, like a browser tab. */
export class ApiClient {
  cookie = ''
  constructor(readonly baseUrl = inject('baseUrl')) {}

  async request(method: string, path: string, body?: unknown, opts: { raw?: string; headers?: Record<string, string> } = {}): Promise<Reply> {
    const headers: Record<string, string> = { accept: 'application/json', ...opts.headers }
    if (this.cookie) headers.cookie = this.cookie
    let payload: string | undefined
    if (opts.raw !== undefined) payload = opts.raw
    else if (body !== undefined) payload = JSON.stringify(body)
    if (payload !== undefined) headers['content-type'] ??= 'application/json'
    const res = await fetch(`${this.baseUrl}${path}`, { method, headers, body: payload, redirect: 'manual' })
    const setCookie = res.headers.getSetCookie?.() ?? []
    for (const c of setCookie) {
      const pair = c.split(';')[0]!
      this.cookie = pair.endsWith('=') ? '' : pair
    }
    const text = await res.text()
    let parsed: unknown = text
    try {
      parsed = JSON.parse(text)
    } catch {
      /* not JSON */
    }
    return { status: res.status, body: parsed }
  }

  get(path: string) {
    return this.request('GET', path)
  }
  post(path: string, body?: unknown) {
    return this.request('POST', path, body)
  }
  patch(path: string, body?: unknown) {
    return this.request('PATCH', path, body)
  }
  delete(path: string) {
    return this.request('DELETE', path)
  }
}

export function uniqueEmail(prefix = 'user'): string {
  return `${prefix}-${randomBytes(5).toString('hex')}@example.test`
}

export const TEST_PASSWORD = 'correct horse battery'

/** The token of the last mail to `email` whose link goes to `/${page}/<token>` (the outbox stands in for SMTP). */
export async function mailedToken(email: string, page: 'welcome' | 'reset' | 'join'): Promise<string> {
  const { testDb } = await import('./db')
  const mail = await testDb()('outbox').where({ to_address: email.toLowerCase() }).andWhere('text_body', 'like', `%/${page}/%`).orderBy('id', 'desc').first('text_body')
  if (!mail) throw new Error(`no ${page} mail to ${email}`)
  return new RegExp(`/${page}/([A-Za-z0-9_-]{40,})`).exec(mail.text_body)![1]!
}

/** Sign a fresh account up (the e-mailed link opened, as its owner would) and return a client signed in as it. */
export async function signedUpClient(prefix = 'user'): Promise<{ client: ApiClient; email: string; id: number }> {
  const client = new ApiClient()
  const email = uniqueEmail(prefix)
  const asked = await client.post('/api/auth/signup', { email, password: TEST_PASSWORD, displayName: prefix })
  if (asked.status !== 202) throw new Error(`signup failed: ${asked.status} ${JSON.stringify(asked.body)}`)
  const res = await client.post('/api/auth/signup-confirm', { token: await mailedToken(email, 'welcome') })
  if (res.status !== 201) throw new Error(`signup confirmation failed: ${res.status} ${JSON.stringify(res.body)}`)
  return { client, email, id: res.body.user.id }
}

/** The JSON message of an error reply (h3 puts ours in data.message and message). */
export function messageOf(reply: Reply): string {
  return reply.body?.data?.message ?? reply.body?.message ?? ''
}
