import { describe, it, expect, beforeAll } from 'vitest'
import { createHash } from 'node:crypto'
import { buildWorld, addBasis, type World } from '../../support/fixtures'
import { ApiClient, messageOf, signedUpClient } from '../../support/client'
import { rowCounts, testDb } from '../../support/db'
import { listRoutes } from '../../support/routes'
import { ROUTE_CASES } from '../../support/routeCases'

// The smaller findings of issue 12 (item 6), each reproduced, then refused.
let world: World
let ops: Awaited<ReturnType<typeof addBasis>>['operatorIds']
beforeAll(async () => {
  world = await buildWorld()
  ops = (await addBasis(world)).operatorIds
})

describe('signed-out requests get 401 before any 404', () => {
  // Reads anyone may make: health, presets and what a share link opens.
  const publicRoute = (route: string) => /^GET \/api\/(health|presets|share\/)/.test(route) || ROUTE_CASES[route]?.access.kind === 'public'
  it('on every route that needs an account, an id that does not exist is not revealed', async () => {
    for (const route of listRoutes().filter((r) => !publicRoute(r))) {
      const [method, path] = route.split(' ') as [string, string]
      const url = path.replace('[slug]', 'no-such-group').replace(/\[\w+\]/g, '2147483000')
      const res = await world.anonymous.request(method, url, method === 'GET' || method === 'DELETE' ? undefined : {})
      expect(res.status, `${route}: ${JSON.stringify(res.body)}`).toBe(401)
      expect(messageOf(res)).toBe('Sign in to continue')
    }
  })
})

describe('tags belong to their authors, as notes do', () => {
  it("a commenter cannot delete another member's tag; the author and an owner can", async () => {
    const byEditor = await world.byRole.editor.client.post(`/api/operators/${ops.photon}/tags`, { kind: 'custom', label: 'editor tag' })
    const before = await rowCounts()
    const refused = await world.byRole.commenter.client.delete(`/api/tags/${byEditor.body.tag.id}`)
    expect(refused.status).toBe(403)
    expect(messageOf(refused)).toBe('Only the author or an owner may delete this tag')
    expect(await rowCounts()).toEqual(before)
    const own = await world.byRole.commenter.client.post(`/api/operators/${ops.photon}/tags`, { kind: 'custom', label: 'my tag' })
    expect((await world.byRole.commenter.client.delete(`/api/tags/${own.body.tag.id}`)).status).toBe(200)
    expect((await world.owner.client.delete(`/api/tags/${byEditor.body.tag.id}`)).status).toBe(200)
  })
})

describe('notes are limited', () => {
  const post = (operatorId: number | undefined, client = world.byRole.commenter.client) => client.post(`/api/theories/${world.theoryId}/annotations`, { body: 'one more', operatorId })

  it('a note longer than 10000 characters is refused with the limit named', async () => {
    const res = await world.byRole.commenter.client.post(`/api/theories/${world.theoryId}/annotations`, { body: 'x'.repeat(10_001) })
    expect(res.status).toBe(400)
    expect(messageOf(res)).toBe('Note must have at most 10000 characters')
  })

  it('one operator carries at most 100 notes', async () => {
    await insertNotes(99, world.byRole.editor.id, () => ops.sextic)
    expect((await post(ops.sextic)).status).toBe(201)
    const before = await rowCounts()
    const res = await post(ops.sextic, world.owner.client)
    expect(res.status).toBe(409)
    expect(messageOf(res)).toBe('This operator already carries 100 notes, the most it may; edit or delete an old note instead')
    expect(await rowCounts()).toEqual(before)
  })

  it('one member writes at most 500 notes on a theory', async () => {
    const author = world.byRole.viewer.id // any account; the cap counts notes by author
    const targets = (await testDb()('operators as o').join('bases as b', 'b.id', 'o.basis_id').where('b.theory_id', world.theoryId).pluck('o.id')) as number[]
    const spread = [null, ...targets.filter((id) => id !== ops.sextic)]
    expect(spread.length * 99).toBeGreaterThan(500)
    await testDb()('memberships').where({ group_id: world.groupId, user_id: author }).update({ role: 'commenter' })
    await insertNotes(500, author, (i) => spread[i % spread.length]!)
    const res = await world.byRole.viewer.client.post(`/api/theories/${world.theoryId}/annotations`, { body: 'too many' })
    expect(res.status).toBe(409)
    expect(messageOf(res)).toBe('You have written 500 notes on this theory, the most one member may; delete old ones first')
  })
})

async function insertNotes(n: number, authorId: number, target: (i: number) => number | null) {
  const rows = Array.from({ length: n }, (_, i) => ({ theory_id: world.theoryId, operator_id: target(i), author_id: authorId, body: `note ${i}` }))
  await testDb().batchInsert('annotations', rows, 500)
}

describe('invitation mails with long names', () => {
  it('a 120-character group name and an 80-character display name: the invitation and its mail are both stored', async () => {
    const owner = await signedUpClient('long')
    await testDb()('users')
      .where({ id: owner.id })
      .update({ display_name: 'D'.repeat(80) })
    const slug = `long-${Date.now().toString(36)}`
    expect((await owner.client.post('/api/groups', { slug, name: 'G'.repeat(120) })).status).toBe(201)
    const email = `invitee-${Date.now().toString(36)}@example.test`
    const res = await owner.client.post(`/api/groups/${slug}/invitations`, { email, role: 'viewer' })
    expect(res.status, JSON.stringify(res.body)).toBe(201)
    const mail = await testDb()('outbox').where({ to_address: email }).first('subject', 'text_body')
    expect(mail.subject.length).toBeLessThanOrEqual(200)
    expect(mail.subject.endsWith('…')).toBe(true)
    expect(mail.text_body).toContain('G'.repeat(120))
    expect(await testDb()('invitations').where({ email }).count('id as n').first()).toEqual({ n: '1' })
  })

  it('when the mail cannot be sent, no invitation is left behind and the owner is told', async () => {
    const email = `unmailable-${Date.now().toString(36)}@example.test`
    // A real failure of the mail store, for this one address only.
    await testDb().raw(`alter table outbox add constraint test_unmailable check (to_address <> '${email}')`)
    try {
      const before = await rowCounts()
      const res = await world.owner.client.post(`/api/groups/${world.slug}/invitations`, { email, role: 'viewer' })
      expect(res.status).toBe(503)
      expect(messageOf(res)).toBe('The invitation mail could not be sent, so no invitation was made; try again later')
      expect(await rowCounts()).toEqual(before)
    } finally {
      await testDb().raw('alter table outbox drop constraint test_unmailable')
    }
  })

  it('an address longer than 254 characters is refused before anything is written', async () => {
    const res = await world.owner.client.post(`/api/groups/${world.slug}/invitations`, {
      email: `${'a'.repeat(60)}@${'b'.repeat(60)}.${'c'.repeat(60)}.${'d'.repeat(60)}.example.test`,
      role: 'viewer',
    })
    expect(res.status).toBe(400)
    expect(messageOf(res)).toBe('E-mail address is too long (254 characters at most)')
  })
})

describe('security headers', () => {
  it('pages carry a Content-Security-Policy whose script hashes match the page, frame-ancestors none, a referrer policy and nosniff', async () => {
    const res = await fetch(`${world.anonymous.baseUrl}/signin`)
    const html = await res.text()
    const csp = res.headers.get('content-security-policy')!
    expect(csp).toContain("frame-ancestors 'none'")
    expect(csp).toContain("object-src 'none'")
    const scriptSrc = /script-src ([^;]+)/.exec(csp)![1]!
    expect(scriptSrc).not.toContain('unsafe-inline')
    expect(scriptSrc).not.toContain('unsafe-eval')
    const inline = [...html.matchAll(/<script(?![^>]*\bsrc=)([^>]*)>([\s\S]*?)<\/script>/g)].filter((m) => !/type="application\/json"/.test(m[1]!))
    expect(inline.length).toBeGreaterThan(0)
    for (const m of inline) expect(scriptSrc).toContain(`'sha256-${createHash('sha256').update(m[2]!).digest('base64')}'`)
    expect(res.headers.get('referrer-policy')).toBe('same-origin')
    expect(res.headers.get('x-content-type-options')).toBe('nosniff')
    expect(res.headers.get('x-frame-options')).toBe('DENY')
  })

  it('API answers and exports cannot be framed or sniffed either', async () => {
    const res = await fetch(`${world.anonymous.baseUrl}/api/health`)
    expect(res.headers.get('x-content-type-options')).toBe('nosniff')
    expect(res.headers.get('content-security-policy')).toBe("default-src 'none'; frame-ancestors 'none'")
  })

  it('a share page (a token in its address) does not leak the address to other sites', async () => {
    const res = await new ApiClient().request('GET', '/share/not-a-real-token')
    expect(res.status).toBeLessThan(500)
    const head = await fetch(`${world.anonymous.baseUrl}/share/not-a-real-token`)
    expect(head.headers.get('referrer-policy')).toBe('same-origin')
  })
})
