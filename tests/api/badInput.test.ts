import { describe, it, expect, beforeAll } from 'vitest'
import { listRoutes, mutatingRoutes } from '../support/routes'
import { ROUTE_CASES } from '../support/routeCases'
import { buildWorld, type World, type Actor } from '../support/fixtures'
import { rowCounts } from '../support/db'
import { messageOf, type Reply } from '../support/client'
import { forbiddenIn } from '../support/forbiddenMessages'
import { KEY_WORDS } from '../../shared/schemas/fieldWords'

// Bad input on every mutating route that takes a body: malformed JSON, wrong types, missing
// fields and oversized bodies all get a clear 4xx, and no table changes. Every 4xx message is
// checked against the forbidden list (no code names, zod texts, internal keys, …).

/** A 4xx reply whose message a user may read. */
function expectReadable4xx(res: Reply, what: string) {
  expect(res.status, `${what}: ${JSON.stringify(res.body)}`).toBeGreaterThanOrEqual(400)
  expect(res.status, `${what}: ${JSON.stringify(res.body)}`).toBeLessThan(500)
  expect(forbiddenIn(messageOf(res)), `${what}: ${messageOf(res)}`).toEqual([])
}
let world: World

function actorFor(route: string): Actor {
  const access = ROUTE_CASES[route]!.access
  if (access.kind === 'group') return world.byRole[access.min]
  if (access.kind === 'admin') return world.admin
  return world.stranger
}

function wrongTyped(value: unknown): unknown {
  if (typeof value === 'string') return 12345
  if (typeof value === 'number') return 'not a number'
  if (typeof value === 'boolean') return 'yes'
  return 'not an object'
}

beforeAll(async () => {
  world = await buildWorld()
})

const withBody = mutatingRoutes().filter((r) => ROUTE_CASES[r]?.body)

describe.each(withBody)('%s', (route) => {
  const method = route.split(' ')[0]!
  async function send(mutate: (body: Record<string, unknown>) => { body?: unknown; raw?: string }) {
    const actor = actorFor(route)
    const req = await ROUTE_CASES[route]!.prepare(world, actor)
    const variant = mutate(req.body as Record<string, unknown>)
    const before = await rowCounts()
    const res = await actor.client.request(method, req.path, variant.body, { raw: variant.raw })
    expect(await rowCounts(), 'a rejected request wrote rows').toEqual(before)
    expectReadable4xx(res, route)
    return res
  }

  it('malformed JSON → 400', async () => {
    const res = await send(() => ({ raw: '{"oops": ' }))
    expect(res.status).toBe(400)
    expect(messageOf(res)).toBe('Request body is not valid JSON')
  })
  it('a JSON array instead of an object → 400', async () => {
    expect((await send(() => ({ body: [] }))).status).toBe(400)
  })
  if (ROUTE_CASES[route]!.body === 'required') {
    it('missing fields → 400 naming a field', async () => {
      const res = await send(() => ({ body: {} }))
      expect(res.status).toBe(400)
      expect(messageOf(res)).toMatch(/\w+/)
    })
  }
  it("each field with a wrong type → 400 naming it in the user's words", async () => {
    const actor = actorFor(route)
    const keys = Object.keys(((await ROUTE_CASES[route]!.prepare(world, actor)).body ?? {}) as object)
    for (const key of keys) {
      const res = await send((b) => ({ body: { ...b, [key]: wrongTyped(b[key]) } }))
      expect(res.status, `${key}: ${JSON.stringify(res.body)}`).toBe(400)
      expect(KEY_WORDS[key], `shared/schemas/fieldWords.ts has words for "${key}"`).toBeDefined()
      expect(messageOf(res).toLowerCase(), `message names ${key}`).toContain(KEY_WORDS[key]!.toLowerCase())
    }
  })
  it('each field missing, or null → 400 with a readable message', async () => {
    const actor = actorFor(route)
    const keys = Object.keys(((await ROUTE_CASES[route]!.prepare(world, actor)).body ?? {}) as object)
    for (const key of keys) {
      await send((b) => ({ body: { ...b, [key]: null } }))
      // Without the key an optional field may succeed; a refusal must still be readable.
      const req = await ROUTE_CASES[route]!.prepare(world, actor)
      const { [key]: _dropped, ...rest } = req.body as Record<string, unknown>
      const res = await actor.client.request(method, req.path, rest)
      if (res.status >= 400) expectReadable4xx(res, `${route} without ${key}`)
    }
  })
  it('unknown extra fields → 400 naming the key', async () => {
    const res = await send((b) => ({ body: { ...b, sneaky: true } }))
    expect(res.status).toBe(400)
    expect(messageOf(res)).toContain('"sneaky"')
  })
  it('an oversized body → 413', async () => {
    const limit = ROUTE_CASES[route]!.maxBodyBytes ?? 512 * 1024
    const res = await send((b) => ({ body: { ...b, padding: 'x'.repeat(limit + 100 * 1024) } }))
    expect(res.status).toBe(413)
    expect(messageOf(res)).toMatch(/too large/)
  })
})

describe('theory files', () => {
  it('a bad theory file names the field and the key at fault, and nothing is written', async () => {
    const before = await rowCounts()
    const res = await world.owner.client.post(`/api/groups/${world.slug}/theories`, {
      definition: { name: 'Bad', frame: 'relativistic', groups: [{ name: 'U', type: 'U1', gauge: true }], fields: [{ name: 'phi', lorentz: 'scalar', real: true, charges: { U: '1/3' } }] },
    })
    expect(res.status).toBe(400)
    expect(messageOf(res)).toMatch(/phi/)
    expect(await rowCounts()).toEqual(before)
  })
  it('a concurrent edit is refused with the newer version named (no lost update)', async () => {
    const t = await world.owner.client.get(`/api/theories/${world.theoryId}`)
    const def = t.body.theory.definition
    const v = t.body.theory.version
    expect((await world.byRole.editor.client.patch(`/api/theories/${world.theoryId}`, { definition: def, version: v })).status).toBe(200)
    const stale = await world.owner.client.patch(`/api/theories/${world.theoryId}`, { definition: def, version: v })
    expect(stale.status).toBe(409)
    expect(messageOf(stale)).toContain(`now version ${v + 1}`)
  })
})

// Every route, with addresses that name nothing (a word where a number belongs, a zero):
// a readable 4xx, never a 500, for the signed-out, a stranger and an owner.
describe('every route with a bad address', () => {
  const addresses = (pattern: string) => ['not-a-number', '0'].map((v) => pattern.replace(/\[[^\]]+\]/g, v))
  it.each(listRoutes().filter((r) => r.includes('[')))('%s', async (route) => {
    const [method, pattern] = route.split(' ') as [string, string]
    for (const path of addresses(pattern)) {
      for (const client of [world.anonymous, world.stranger.client, world.owner.client]) {
        const res = await client.request(method, path, method === 'GET' || method === 'DELETE' ? undefined : {})
        expectReadable4xx(res, `${method} ${path}`)
      }
    }
  })
})
