import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { startStack, groupWithTheory, waitUntil, type Stack } from './support/stack'
import type { ApiClient } from '../support/client'

// PostgreSQL stopped and started again while the app serves: users read that the database is
// unavailable (503, Retry-After), never "Internal error", and the app recovers by itself.
const MESSAGE = 'The database is unavailable at the moment (it may be restarting); retrying. This request may not have been saved: check, and try again in a few seconds.'
let stack: Stack
let owner: ApiClient
let theoryId: number
let slug: string

beforeAll(async () => {
  stack = await startStack('restart')
  ;({ owner, theoryId, slug } = await groupWithTheory(stack))
})
afterAll(async () => {
  await stack?.stop()
})

async function raw(path: string, init: RequestInit = {}) {
  const res = await fetch(`${stack.baseUrl}${path}`, { ...init, headers: { accept: 'application/json', 'content-type': 'application/json', cookie: owner.cookie, ...init.headers } })
  const text = await res.text()
  let body: any = text
  try {
    body = JSON.parse(text)
  } catch {
    /* a page */
  }
  return { status: res.status, retryAfter: res.headers.get('retry-after'), body, text }
}

describe('PostgreSQL stopped while the app serves', () => {
  it('reads, writes and the health check answer 503 "database unavailable, retrying" with Retry-After', async () => {
    expect((await raw(`/api/theories/${theoryId}`)).status).toBe(200)
    stack.cluster.stop()
    for (const [path, init] of [
      ['/api/health', {}],
      [`/api/theories/${theoryId}`, {}],
      [`/api/groups/${slug}`, {}],
      [`/api/theories/${theoryId}/annotations`, { method: 'POST', body: JSON.stringify({ body: 'written while the database is down' }) }],
      ['/api/auth/signin', { method: 'POST', body: JSON.stringify({ email: 'nobody@example.test', password: 'whatever it is' }) }],
    ] as const) {
      const res = await raw(path, init)
      expect({ path, status: res.status, retryAfter: res.retryAfter, message: res.body?.data?.message ?? res.body?.message }).toEqual({ path, status: 503, retryAfter: '5', message: MESSAGE })
    }
  })

  it('recovers by itself once PostgreSQL is back: same server process, reads and writes work', async () => {
    const pid = stack.app.pid
    await stack.cluster.start()
    await waitUntil(
      async () => (await raw('/api/health')).status === 200,
      30_000,
      () => 'health did not recover',
    )
    expect((await raw(`/api/theories/${theoryId}`)).status).toBe(200)
    const note = await raw(`/api/theories/${theoryId}/annotations`, { method: 'POST', body: JSON.stringify({ body: 'written after the restart' }) })
    expect(note.status).toBe(201)
    expect(stack.app.pid).toBe(pid)
    expect(stack.app.exitCode).toBeNull()
  })

  it('the worker carries on too: a run started after the restart finishes', async () => {
    const start = await raw(`/api/theories/${theoryId}/runs`, { method: 'POST', body: JSON.stringify({ kind: 'count', maxDim: 6 }) })
    expect(start.status).toBe(201)
    let last: any
    await waitUntil(
      async () => {
        last = (await raw(`/api/runs/${start.body.run.id}`)).body.run
        return last.status === 'done'
      },
      60_000,
      () => `run did not finish: ${JSON.stringify(last)}`,
    )
  })
})
