import { describe, it, expect, beforeAll } from 'vitest'
import { randomBytes } from 'node:crypto'
import { ROUTE_CASES } from '../support/routeCases'
import { buildWorld, addBasis, type World, type Actor } from '../support/fixtures'
import { rowCounts, testDb } from '../support/db'
import { messageOf, type Reply } from '../support/client'

// Double submission: every create action sent twice at once with the same Idempotency-Key (a
// double click, a retried connection) is done once, and both requests get the same answer.
let world: World
beforeAll(async () => {
  world = await buildWorld()
})

const ONCE_ROUTES = [
  'POST /api/theories/[id]/annotations',
  'POST /api/operators/[id]/tags',
  'POST /api/theories/[id]/share-links',
  'POST /api/theories/[id]/runs',
  'PATCH /api/theories/[id]',
  'POST /api/groups/[slug]/theories',
  'POST /api/theories/[id]/integrate-out',
  'POST /api/groups/[slug]/invitations',
  'POST /api/groups',
  'POST /api/groups/[slug]/members',
  'PUT /api/theories/[id]/scales',
]
const newKey = () => randomBytes(12).toString('base64url')

function actorFor(route: string): Actor {
  const access = ROUTE_CASES[route]!.access
  return access.kind === 'group' ? world.byRole[access.min] : world.stranger
}

/** Send the route's prepared request `times` times at once with one key; the rows it wrote. */
async function sendAtOnce(route: string, times: number, key = newKey()) {
  const actor = actorFor(route)
  const method = route.split(' ')[0]!
  const req = await ROUTE_CASES[route]!.prepare(world, actor)
  const before = await rowCounts()
  const replies = await Promise.all(Array.from({ length: times }, () => actor.client.request(method, req.path, req.body, { headers: { 'idempotency-key': key } })))
  const after = await rowCounts()
  const written = Object.fromEntries(
    Object.keys(after)
      .filter((t) => t !== 'request_keys' && after[t] !== before[t])
      .map((t) => [t, after[t]! - before[t]!]),
  )
  return { replies, written }
}
const summary = (r: Reply) => `${r.status} ${JSON.stringify(r.body).slice(0, 300)}`

describe.each(ONCE_ROUTES)('%s sent twice with one request key', (route) => {
  it('is done once, and both requests get the same answer', async () => {
    const single = await sendAtOnce(route, 1)
    expect(single.replies[0]!.status, summary(single.replies[0]!)).toBeLessThan(300)
    const double = await sendAtOnce(route, 2)
    const [a, b] = double.replies
    expect(a!.status, summary(a!)).toBeLessThan(300)
    expect(b!.status, summary(b!)).toBe(a!.status)
    expect(b!.body).toEqual(a!.body)
    expect(double.written).toEqual(single.written)
  })
})

describe('request keys', () => {
  it('without a key a double click writes twice (what the key prevents)', async () => {
    const { client } = world.byRole.commenter
    const before = (await rowCounts()).annotations!
    await Promise.all([1, 2].map(() => client.post(`/api/theories/${world.theoryId}/annotations`, { body: 'twice without a key' })))
    expect((await rowCounts()).annotations! - before).toBe(2)
  })

  it('a key names one request: other contents under a used key are refused, a malformed key too', async () => {
    const { client } = world.byRole.commenter
    const key = newKey()
    const path = `/api/theories/${world.theoryId}/annotations`
    expect((await client.request('POST', path, { body: 'first' }, { headers: { 'idempotency-key': key } })).status).toBe(201)
    const other = await client.request('POST', path, { body: 'something else' }, { headers: { 'idempotency-key': key } })
    expect(other.status).toBe(422)
    expect(messageOf(other)).toMatch(/already sent once with other contents/)
    const bad = await client.request('POST', path, { body: 'x' }, { headers: { 'idempotency-key': 'a b' } })
    expect(bad.status).toBe(400)
    expect(messageOf(bad)).toMatch(/^Idempotency-Key: /)
  })

  it('a failed attempt lets go of its key: sent again after the cause is gone, it is done', async () => {
    const { client } = world.byRole.commenter
    const { operatorIds } = await addBasis(world)
    const path = `/api/operators/${operatorIds.photon}/tags`
    const key = newKey()
    expect((await client.post(path, { kind: 'tree' })).status).toBe(201)
    expect((await client.request('POST', path, { kind: 'tree' }, { headers: { 'idempotency-key': key } })).status).toBe(409)
    await testDb()('tags').where({ operator_id: operatorIds.photon, kind: 'tree' }).delete()
    expect((await client.request('POST', path, { kind: 'tree' }, { headers: { 'idempotency-key': key } })).status).toBe(201)
  })

  it('a share link asked twice answers the same working address, and the token is stored only as a hash', async () => {
    const key = newKey()
    const ask = () => world.owner.client.request('POST', `/api/theories/${world.theoryId}/share-links`, { expiresInDays: 3 }, { headers: { 'idempotency-key': key } })
    const [a, b] = await Promise.all([ask(), ask()])
    expect(a!.body.link.url).toBe(b!.body.link.url)
    const stored = await testDb()('request_keys').where({ key }).first('response')
    expect(JSON.stringify(stored.response)).not.toContain(a!.body.link.token)
    expect((await world.anonymous.get(`/api/share/${a!.body.link.token}`)).status).not.toBe(404)
  })
})
