import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, addMember, type World } from '../../support/fixtures'
import { messageOf } from '../../support/client'
import { rowCounts, testDb } from '../../support/db'
import { mutatingRoutes } from '../../support/routes'
import { ROUTE_CASES } from '../../support/routeCases'
import { rawRequest, asForeignPage, FOREIGN_ORIGIN } from '../../support/attack'

// Same-site request forgery (issue 12, item 3). The tester's page on another port of the same
// host made an attacker a group owner and posted a note with the victim's cookie (SameSite=Lax
// lets same-site requests carry it): text/plain bodies were read as JSON and Origin was ignored.
let world: World
beforeAll(async () => {
  world = await buildWorld()
})

const notes = () => `/api/theories/${world.theoryId}/annotations`

describe('what the tester did, refused', () => {
  it('a text/plain body (a form with enctype text/plain, or a no-cors fetch) is refused with 415 and writes nothing', async () => {
    const before = await rowCounts()
    const res = await rawRequest('POST', notes(), { cookie: world.byRole.commenter.client.cookie, body: JSON.stringify({ body: 'planted' }), contentType: 'text/plain;charset=UTF-8' })
    expect(res.status).toBe(415)
    expect(messageOf(res)).toBe('Send the request body as JSON (Content-Type: application/json), not text/plain')
    expect(await rowCounts()).toEqual(before)
  })

  it('the other form encodings and a body without a type are refused too', async () => {
    const before = await rowCounts()
    for (const contentType of ['application/x-www-form-urlencoded', 'multipart/form-data; boundary=x', null]) {
      const res = await rawRequest('POST', notes(), { cookie: world.byRole.commenter.client.cookie, body: '{"body":"planted"}', contentType })
      expect(res.status, String(contentType)).toBe(415)
      expect(messageOf(res)).toMatch(/^Send the request body as JSON \(Content-Type: application\/json\)/)
    }
    expect(await rowCounts()).toEqual(before)
  })

  it("an owner's cookie used from a page of another origin cannot make anyone an owner", async () => {
    const target = await addMember(world, 'viewer')
    const before = await rowCounts()
    const res = await asForeignPage(world.owner.client, 'PATCH', `/api/groups/${world.slug}/members/${target.id}`, { role: 'owner' })
    expect(res.status).toBe(403)
    expect(messageOf(res)).toBe(`This request came from a page of another site (${FOREIGN_ORIGIN}); Scalewright accepts changes only from its own pages`)
    expect(await rowCounts()).toEqual(before)
    const member = await testDb()('memberships').where({ group_id: world.groupId, user_id: target.id }).first('role')
    expect(member.role).toBe('viewer')
  })

  it('Sec-Fetch-Site other than same-origin is refused, with or without Origin', async () => {
    for (const fetchSite of ['same-site', 'cross-site', 'none'] as const) {
      const res = await rawRequest('POST', notes(), { cookie: world.byRole.commenter.client.cookie, fetchSite, body: '{"body":"planted"}', contentType: 'application/json' })
      expect(res.status, fetchSite).toBe(403)
      expect(messageOf(res)).toBe('This request came from a page of another site; Scalewright accepts changes only from its own pages')
    }
  })

  it('a bodyless write (sign-out, delete) from another origin is refused', async () => {
    const note = await world.byRole.commenter.client.post(notes(), { body: 'mine' })
    const res = await asForeignPage(world.byRole.commenter.client, 'DELETE', `/api/annotations/${note.body.annotation.id}`, undefined)
    expect(res.status).toBe(403)
    expect((await asForeignPage(world.byRole.commenter.client, 'POST', '/api/auth/signout', undefined)).status).toBe(403)
    expect((await asForeignPage(world.byRole.commenter.client, 'DELETE', '/api/_auth/session', undefined)).status).toBe(403)
    expect((await world.byRole.commenter.client.get('/api/auth/me')).status).toBe(200)
  })
})

describe("the app's own requests still pass", () => {
  it('JSON from the same origin, as a browser sends it (Origin and Sec-Fetch-Site), is accepted', async () => {
    const origin = world.owner.client.baseUrl
    const res = await rawRequest('POST', notes(), {
      cookie: world.byRole.commenter.client.cookie,
      origin,
      fetchSite: 'same-origin',
      body: '{"body":"fine"}',
      contentType: 'application/json; charset=utf-8',
    })
    expect(res.status, JSON.stringify(res.body)).toBe(201)
  })

  it('a client that is not a browser (no Origin, no Sec-Fetch-Site) may still write with JSON', async () => {
    const res = await rawRequest('POST', notes(), { cookie: world.byRole.commenter.client.cookie, body: '{"body":"from a script"}', contentType: 'application/json' })
    expect(res.status).toBe(201)
  })
})

// Every mutating route, not a sample: a foreign page gets 403, a text/plain body 415, and
// nothing is written either way.
describe.each(mutatingRoutes())('%s', (route) => {
  const method = route.split(' ')[0]!
  const actorOf = () => {
    const access = ROUTE_CASES[route]!.access
    if (access.kind === 'group') return world.byRole[access.min]
    return access.kind === 'admin' ? world.admin : world.stranger
  }
  it('refuses a foreign origin (403) and a text/plain body (415), writing nothing', async () => {
    const actor = actorOf()
    const req = await ROUTE_CASES[route]!.prepare(world, actor)
    const before = await rowCounts()
    const foreign = await asForeignPage(actor.client, method, req.path, req.body)
    expect(foreign.status, JSON.stringify(foreign.body)).toBe(403)
    const plain = await rawRequest(method, req.path, { cookie: actor.client.cookie, body: JSON.stringify(req.body ?? {}), contentType: 'text/plain' })
    expect(plain.status, JSON.stringify(plain.body)).toBe(415)
    expect(await rowCounts()).toEqual(before)
  })
})
