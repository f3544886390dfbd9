import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { startStack, groupWithTheory, waitUntil, type Stack } from './support/stack'
import { ApiClient } from '../support/client'
import { SMALL_THEORY } from '../support/fixtures'

// kill -9 of the PostgreSQL postmaster while four clients add notes through the app. Every
// note the app acknowledged (201) must be in the database after the restart. Trials:
// FAULT_TRIALS (default 3). The figures are printed per trial. A theory carries at most 100
// notes (the notes cap against flooding), so each writer moves to a fresh theory of the group
// every NOTES_PER_THEORY notes.
const TRIALS = Number(process.env.FAULT_TRIALS || 3)
const CLIENTS = 4
const NOTES_PER_THEORY = 90
let stack: Stack
let theoryIds: number[]
let nextTheory = 0
let clients: ApiClient[]

/** A theory of the group no writer has used yet (made when the prepared ones run out). */
async function freshTheory(owner: ApiClient, slug: string): Promise<number> {
  if (nextTheory < theoryIds.length) return theoryIds[nextTheory++]!
  const t = await owner.post(`/api/groups/${slug}/theories`, { definition: { ...SMALL_THEORY, name: `T-${slug}-${theoryIds.length}` } })
  if (t.status !== 201) throw new Error(`theory create failed ${JSON.stringify(t.body)}`)
  theoryIds.push(t.body.theory.id as number)
  nextTheory = theoryIds.length
  return t.body.theory.id as number
}
let world: Awaited<ReturnType<typeof groupWithTheory>>

beforeAll(async () => {
  stack = await startStack('crash')
  world = await groupWithTheory(stack)
  theoryIds = [world.theoryId]
  for (let i = 1; i < TRIALS * CLIENTS * 3; i++) await freshTheory(world.owner, world.slug)
  nextTheory = 0
  // Four browser sessions of the group's owner.
  clients = [world.owner]
  for (let i = 1; i < CLIENTS; i++) {
    const c = new ApiClient(stack.baseUrl)
    c.cookie = world.owner.cookie
    clients.push(c)
  }
})
afterAll(async () => {
  await stack?.stop()
})

interface Outcome {
  acknowledged: string[]
  statuses: Map<number, number>
  retryAfter: Set<string>
  messages: Set<string>
}

/** One client adding notes until `until` resolves; records what was acknowledged. */
async function writer(client: ApiClient, trial: number, index: number, stopAt: () => boolean, out: Outcome) {
  let theoryId = await freshTheory(world.owner, world.slug)
  let onTheory = 0
  for (let n = 0; !stopAt(); n++) {
    if (onTheory >= NOTES_PER_THEORY) {
      theoryId = await freshTheory(world.owner, world.slug)
      onTheory = 0
    }
    const body = `trial ${trial} client ${index} note ${n}`
    const res = await fetch(`${stack.baseUrl}/api/theories/${theoryId}/annotations`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', accept: 'application/json', cookie: client.cookie },
      body: JSON.stringify({ body }),
    }).catch((e: Error) => {
      out.messages.add(`no answer: ${e.message} ${String((e as { cause?: unknown }).cause)}`)
      return null
    })
    if (!res) {
      out.statuses.set(0, (out.statuses.get(0) ?? 0) + 1)
      continue
    }
    out.statuses.set(res.status, (out.statuses.get(res.status) ?? 0) + 1)
    const json = await res.json().catch(() => ({}))
    if (res.status === 201) {
      out.acknowledged.push(body)
      onTheory++
    } else {
      out.retryAfter.add(res.headers.get('retry-after') ?? 'none')
      out.messages.add(json?.data?.message ?? json?.message ?? '')
      await new Promise((r) => setTimeout(r, 100))
    }
  }
}

describe('PostgreSQL killed (kill -9) during acknowledged writes', () => {
  it(`loses no acknowledged note in ${TRIALS} crashes, and the app answers 503 meanwhile, then recovers by itself`, async () => {
    const lost: number[] = []
    for (let trial = 1; trial <= TRIALS; trial++) {
      const out: Outcome = { acknowledged: [], statuses: new Map(), retryAfter: new Set(), messages: new Set() }
      let stopping = false
      const writers = clients.map((c, i) => writer(c, trial, i, () => stopping, out))
      await new Promise((r) => setTimeout(r, 1500 + Math.random() * 1500))
      stack.cluster.kill9()
      await new Promise((r) => setTimeout(r, 1500))
      await stack.cluster.start()
      // The app reconnects by itself: writes succeed again without restarting anything.
      const ackedBefore = out.acknowledged.length
      await waitUntil(
        () => out.acknowledged.length > ackedBefore + 8,
        60_000,
        () => `no acknowledged write after the restart (statuses ${JSON.stringify([...out.statuses])})`,
      )
      stopping = true
      await Promise.all(writers)
      const rows = await stack.db('annotations').whereIn('theory_id', theoryIds).andWhere('body', 'like', `trial ${trial} %`).select('body')
      const stored = new Set((rows as { body: string }[]).map((r) => r.body))
      const missing = out.acknowledged.filter((b) => !stored.has(b))
      lost.push(missing.length)
      console.log(`[faults] crash trial ${trial}: ${out.acknowledged.length} acknowledged, ${missing.length} lost; answers ${JSON.stringify(Object.fromEntries(out.statuses))}`)
      // While the database was away the app said so: 503 with Retry-After, never a 500.
      const failures = [...out.statuses.keys()].filter((s) => s !== 201)
      expect(
        failures.every((s) => s === 503),
        `statuses ${JSON.stringify([...out.statuses])} ${[...out.messages].join(' | ')}\n${stack.log().slice(-3000)}`,
      ).toBe(true)
      if (failures.length) {
        expect([...out.retryAfter]).toEqual(['5'])
        expect([...out.messages]).toEqual(['The database is unavailable at the moment (it may be restarting); retrying. This request may not have been saved: check, and try again in a few seconds.'])
      }
    }
    console.log(`[faults] lost acknowledged writes per crash trial: ${lost.join(', ')}`)
    expect(lost).toEqual(Array.from({ length: TRIALS }, () => 0))
    expect(stack.app.exitCode).toBeNull()
  })
})
