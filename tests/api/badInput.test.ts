import { describe, it, expect, beforeAll } from 'vitest'
import { mutatingRoutes } from '../support/routes'
import { ROUTE_CASES } from '../support/routeCases'
import { buildWorld, type World, type Actor } from '../support/fixtures'
import { rowCounts } from '../support/db'
import { messageOf } from '../support/client'

// Bad input on every mutating route that takes a body: malformed JSON, wrong types, missing
// fields and oversized bodies all get a clear 4xx, and no table changes.
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
  async function send(mutate: (body: Record<string, unknown>) => { body?: unknown, raw?: string }) {
    const actor = actorFor(route)
    const req = await ROUTE_CASES[route]!.prepare(world, actor)
    const variant = mutate(req.body as Record<string, unknown>)
    const before = await rowCounts()
    const res = await actor.client.request(method, req.path, variant.body, { raw: variant.raw })
    expect(await rowCounts(), 'a rejected request wrote rows').toEqual(before)
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
  it('each field with a wrong type → 400 naming it', async () => {
    const actor = actorFor(route)
    const keys = Object.keys(((await ROUTE_CASES[route]!.prepare(world, actor)).body ?? {}) as object)
    for (const key of keys) {
      const res = await send((b) => ({ body: { ...b, [key]: wrongTyped(b[key]) } }))
      expect(res.status, `${key}: ${JSON.stringify(res.body)}`).toBe(400)
      expect(messageOf(res), `message names ${key}`).toContain(key)
    }
  })
  it('unknown extra fields → 400', async () => {
    expect((await send((b) => ({ body: { ...b, sneaky: true } }))).status).toBe(400)
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
      definition: { name: 'Bad', frame: 'relativistic', groups: [{ name: 'U', type: 'U1', gauge: true }], fields: [{ name: 'phi', lorentz: 'S', real: true, charges: { U: '1/3' } }] },
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
