import { describe, it, expect, beforeAll, inject } from 'vitest'
import { buildWorld, addBasis, type World } from '../support/fixtures'
import { testDb } from '../support/db'
import { messageOf, signedUpClient } from '../support/client'
import { chunkedPost, hostileLadder, p95, timed } from '../support/hostile'

// Attack suite, issue 12 items 1–2: no request computes on the event loop, work is bounded per
// user, bodies are cut while they stream. Each case is the tester's attack, then the fix.
let world: World
let basisId: number
const boardRead = () => world.byRole.viewer.client.get(`/api/bases/${basisId}`)

beforeAll(async () => {
  world = await buildWorld()
  basisId = (await addBasis(world)).basisId
})

describe('the scale-ladder freeze', () => {
  it('the hostile save is refused by the size budget with a message, and 20 board reads meanwhile stay under 200 ms (p95)', async () => {
    const body = { ladder: hostileLadder(), version: 0 }
    const save = world.byRole.editor.client.request('PUT', `/api/theories/${world.theoryId}/scales`, body)
    const reads = await Promise.all(Array.from({ length: 20 }, () => timed(boardRead)))
    const res = await save
    expect(res.status).toBe(400)
    expect(messageOf(res)).toMatch(/parameter "a" would be an exact number of about 10,001 digits; the limit is 2,000/)
    expect(await testDb()('scale_ladders').where({ theory_id: world.theoryId }).first()).toBeUndefined()
    expect(p95(reads)).toBeLessThan(200)
  })

  it('a hostile ladder stored before the budget: reads show the problem, stay fast, and do not block board reads', async () => {
    await testDb()('scale_ladders').insert({ theory_id: world.theoryId, ladder: JSON.stringify(hostileLadder()), version: 1, updated_by: world.byRole.editor.id })
    try {
      const ladderReads = Array.from({ length: 5 }, () => world.byRole.viewer.client.get(`/api/theories/${world.theoryId}/scales`))
      const reads = await Promise.all(Array.from({ length: 20 }, () => timed(boardRead)))
      for (const r of await Promise.all(ladderReads)) {
        expect(r.status).toBe(200)
        expect(r.body.computed).toBeNull()
        expect(r.body.problem).toMatch(/would be an exact number of about 10,001 digits/)
      }
      expect(p95(reads)).toBeLessThan(200)
    } finally {
      await testDb()('scale_ladders').where({ theory_id: world.theoryId }).delete()
    }
  })
})

describe('quick counts are bounded per user', () => {
  it('20 parallel quick counts from one account: 2 are computed, the rest get 429 naming the limit, with Retry-After', async () => {
    const { client } = await signedUpClient('counter')
    const theory = (await testDb()('theories').where({ id: world.theoryId }).first('definition')).definition
    const replies = await Promise.all(Array.from({ length: 20 }, (_, i) => client.request('POST', '/api/count', { theory: { ...theory, name: `count ${i}` }, maxDim: 6 })))
    const statuses = replies.map((r) => r.status)
    expect(statuses.filter((s) => s === 200)).toHaveLength(2)
    expect(statuses.filter((s) => s === 429)).toHaveLength(18)
    expect(messageOf(replies.find((r) => r.status === 429)!)).toMatch(/You already have 2 quick counts in progress \(the limit is 2 at a time\)/)
  })
})

describe('request bodies are capped while they stream', () => {
  it('a 50 MB chunked body without Content-Length, signed out, is answered 413 after at most a few MB', async () => {
    const results = await Promise.all(Array.from({ length: 3 }, () => chunkedPost(inject('baseUrl'), '/api/auth/signin', 50 * 1024 * 1024)))
    for (const r of results) {
      expect(r.status).toBe(413)
      // The cap is 512 KB; socket buffers on both sides hold a few MB more at most.
      expect(r.sentBytes).toBeLessThan(8 * 1024 * 1024)
    }
  })
})
