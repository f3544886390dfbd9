import { describe, it, expect, beforeAll } from 'vitest'
import { mutatingRoutes } from '../support/routes'
import { ROUTE_CASES, type RouteCase } from '../support/routeCases'
import { buildWorld, type World, type Actor } from '../support/fixtures'
import { rowCounts } from '../support/db'
import { messageOf, type ApiClient } from '../support/client'
import { GROUP_ROLES, roleAtLeast } from '../../shared/types/roles'
import { forbiddenIn } from '../support/forbiddenMessages'

// Role enforcement on every mutating route, listed from the server/api folder (no sampling):
// signed out → 401, stranger → 403, every group role below the floor → 403 with nothing
// written; every role at or above the floor succeeds.
let world: World

async function attempt(c: RouteCase, route: string, client: ApiClient, actor: Actor) {
  const method = route.split(' ')[0]!
  const req = await c.prepare(world, actor)
  return client.request(method, req.path, req.body)
}

async function expectDenied(route: string, client: ApiClient, actor: Actor, status: number) {
  const c = ROUTE_CASES[route]!
  const method = route.split(' ')[0]!
  const req = await c.prepare(world, actor)
  const before = await rowCounts()
  const res = await client.request(method, req.path, req.body)
  expect(res.status, `${route} as ${actor.email}: ${JSON.stringify(res.body)}`).toBe(status)
  expect(messageOf(res).length, 'a denied request says why').toBeGreaterThan(5)
  expect(forbiddenIn(messageOf(res)), messageOf(res)).toEqual([])
  expect(await rowCounts(), `${route} wrote rows while denied`).toEqual(before)
}

beforeAll(async () => {
  world = await buildWorld()
})

describe('every mutating route has an access rule', () => {
  it('the table covers exactly the route files', () => {
    expect(Object.keys(ROUTE_CASES).sort()).toEqual(mutatingRoutes())
  })
})

describe.each(mutatingRoutes().filter((r) => ROUTE_CASES[r]?.access.kind !== 'public'))('%s', (route) => {
  const c = ROUTE_CASES[route]!
  it('answers 401 when signed out and writes nothing', async () => {
    await expectDenied(route, world.anonymous, world.stranger, 401)
  })
  if (c.access.kind === 'group') {
    const min = c.access.min
    it('answers 403 to a signed-in stranger', async () => {
      await expectDenied(route, world.stranger.client, world.stranger, 403)
    })
    for (const role of GROUP_ROLES) {
      if (roleAtLeast(role, min)) {
        it(`succeeds for ${role}`, async () => {
          const res = await attempt(c, route, world.byRole[role].client, world.byRole[role])
          expect(res.status, JSON.stringify(res.body)).toBeLessThan(300)
        })
      } else {
        it(`answers 403 to ${role} (needs ${min})`, async () => {
          await expectDenied(route, world.byRole[role].client, world.byRole[role], 403)
        })
      }
    }
  }
  if (c.access.kind === 'admin') {
    it('answers 403 to a member who is not admin', async () => {
      await expectDenied(route, world.owner.client, world.owner, 403)
    })
    it('succeeds for an admin', async () => {
      const res = await attempt(c, route, world.admin.client, world.admin)
      expect(res.status, JSON.stringify(res.body)).toBeLessThan(300)
    })
  }
  if (c.access.kind === 'signedIn') {
    it('succeeds for any signed-in account', async () => {
      const res = await attempt(c, route, world.stranger.client, world.stranger)
      expect(res.status, JSON.stringify(res.body)).toBeLessThan(300)
    })
  }
})

describe('reads are guarded too', () => {
  it('group and theory pages need membership', async () => {
    for (const path of [`/api/groups/${world.slug}`, `/api/theories/${world.theoryId}`, `/api/theories/${world.theoryId}/annotations`, `/api/groups/${world.slug}/theories`]) {
      expect((await world.anonymous.get(path)).status, path).toBe(401)
      expect((await world.stranger.client.get(path)).status, path).toBe(403)
      expect((await world.byRole.viewer.client.get(path)).status, path).toBe(200)
    }
  })
  it('the mailbox and the account list are for admins only', async () => {
    for (const path of ['/api/admin/outbox', '/api/admin/users']) {
      expect((await world.anonymous.get(path)).status).toBe(401)
      expect((await world.owner.client.get(path)).status).toBe(403)
      expect((await world.admin.client.get(path)).status).toBe(200)
    }
  })
})

describe('notes belong to their authors', () => {
  it("a commenter cannot edit or delete another member's note; an editor may edit, only an owner may delete", async () => {
    const other = await world.byRole.editor.client.post(`/api/theories/${world.theoryId}/annotations`, { body: 'editor note' })
    const id = other.body.annotation.id
    const before = await rowCounts()
    expect((await world.byRole.commenter.client.patch(`/api/annotations/${id}`, { body: 'hijack' })).status).toBe(403)
    expect((await world.byRole.commenter.client.delete(`/api/annotations/${id}`)).status).toBe(403)
    expect(await rowCounts()).toEqual(before)
    const ownerEdit = await world.owner.client.patch(`/api/annotations/${id}`, { body: 'owner edit' })
    expect(ownerEdit.status).toBe(200)
  })
})
