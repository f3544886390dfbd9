import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, type World, type Actor } from '../../support/fixtures'
import { messageOf } from '../../support/client'
import { rowCounts } from '../../support/db'
import { mutatingRoutes, listRoutes } from '../../support/routes'
import { ROUTE_CASES } from '../../support/routeCases'
import { forbiddenIn } from '../../support/forbiddenMessages'

// A NUL character in text (issue 12, item 6): PostgreSQL cannot store U+0000 in text or JSONB,
// so a note with one gave 500 on 7 routes. Every route now answers 400 naming where it was, in
// the user's words (the messages pass the forbidden list of tests/support/forbiddenMessages.ts).
let world: World
beforeAll(async () => {
  world = await buildWorld()
})

function actorFor(route: string): Actor {
  const access = ROUTE_CASES[route]!.access
  if (access.kind === 'group') return world.byRole[access.min]
  return access.kind === 'admin' ? world.admin : world.stranger
}

/** The body with a NUL inside every string it holds. */
function poisoned(value: unknown): unknown {
  if (typeof value === 'string') return `${value.slice(0, 1)}\u0000${value.slice(1)}`
  if (Array.isArray(value)) return value.map(poisoned)
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, poisoned(v)]))
  return value
}
const hasText = (value: unknown): boolean => typeof value === 'string' || (typeof value === 'object' && value !== null && Object.values(value).some(hasText))

describe.each(mutatingRoutes().filter((r) => ROUTE_CASES[r]?.body))('%s', (route) => {
  it("a NUL in the body's text (or, with no text, in a key) → 400 naming the field, nothing written", async () => {
    const actor = actorFor(route)
    const req = await ROUTE_CASES[route]!.prepare(world, actor)
    const body = hasText(req.body) ? poisoned(req.body) : { ...(req.body as object), 'extra\u0000': 1 }
    const before = await rowCounts()
    const res = await actor.client.request(route.split(' ')[0]!, req.path, body)
    expect(res.status, JSON.stringify(res.body)).toBe(400)
    expect(messageOf(res)).toMatch(/^[^:]+ (cannot contain|has a key containing) the NUL character \(U\+0000\); remove it$/)
    expect(forbiddenIn(messageOf(res))).toEqual([])
    expect(await rowCounts()).toEqual(before)
  })
})

describe('a NUL in the address', () => {
  it('in a route parameter or the query → 400 on every route, signed in or not', async () => {
    for (const route of listRoutes()) {
      const [method, path] = route.split(' ') as [string, string]
      const url = `${path.replace(/\[(\w+)\]/g, 'a%00b')}?q=%00`
      for (const client of [world.admin.client, world.anonymous]) {
        const res = await client.request(method, url, method === 'GET' || method === 'DELETE' ? undefined : {})
        expect(res.status, `${route}: ${JSON.stringify(res.body)}`).toBe(400)
        expect(messageOf(res)).toBe('The address contains a NUL character (%00); remove it')
      }
    }
  })

  it('a note whose body is only a NUL → 400, not 500', async () => {
    const res = await world.byRole.commenter.client.post(`/api/theories/${world.theoryId}/annotations`, { body: '\u0000' })
    expect(res.status).toBe(400)
    expect(messageOf(res)).toBe('Note cannot contain the NUL character (U+0000); remove it')
  })
})
