import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, addBasis, type World } from '../support/fixtures'
import { ApiClient, messageOf, TEST_PASSWORD, uniqueEmail } from '../support/client'
import { rowCounts, testDb } from '../support/db'
import { mutatingRoutes } from '../support/routes'
import { ROUTE_CASES } from '../support/routeCases'

let world: World
let token: string
let linkId: number
beforeAll(async () => {
  world = await buildWorld()
  await addBasis(world)
  const res = await world.owner.client.post(`/api/theories/${world.theoryId}/share-links`, { expiresInDays: 30 })
  expect(res.status).toBe(201)
  token = res.body.link.token
  linkId = res.body.link.id
  expect(res.body.link.url).toContain(`/share/${token}`)
})

describe('read-only share links', () => {
  it('show the theory and its basis with tags and notes to someone without an account', async () => {
    const res = await new ApiClient().get(`/api/share/${token}`)
    expect(res.status).toBe(200)
    expect(res.body.theory.id).toBe(world.theoryId)
    expect(res.body.board.operators.length).toBeGreaterThan(0)
    expect(res.body.role).toBe('share')
    const tex = await new ApiClient().get(`/api/share/${token}/export?format=latex`)
    expect(tex.status).toBe(200)
    expect(String(tex.body)).toContain('\\begin{longtable}')
  })

  it('stores only a hash of the token', async () => {
    const rows = await testDb()('share_links').where({ id: linkId })
    expect(JSON.stringify(rows)).not.toContain(token)
  })

  // Every mutating route, with the token offered every way a client might: as a cookie, a
  // header, a bearer credential and a query parameter. None may write.
  it.each(mutatingRoutes())('%s cannot be used with the share token', async (route) => {
    const c = ROUTE_CASES[route]!
    const req = await c.prepare(world, world.byRole.editor)
    const before = await rowCounts()
    const client = new ApiClient()
    const method = route.split(' ')[0]!
    const sep = req.path.includes('?') ? '&' : '?'
    const res = await client.request(method, `${req.path}${sep}share=${token}&token=${token}`, req.body, {
      headers: { 'x-share-token': token, authorization: `Bearer ${token}`, cookie: `share=${token}; nuxt-session=${token}` },
    })
    if (c.access.kind === 'public') {
      // Public routes (sign-up, sign-in, …) act only on their own input, never on the shared theory.
      expect(res.status).not.toBe(500)
      return
    }
    expect(res.status, JSON.stringify(res.body)).toBe(401)
    expect(await rowCounts()).toEqual(before)
  })

  it('stop working when revoked, and expire', async () => {
    const second = await world.owner.client.post(`/api/theories/${world.theoryId}/share-links`, {})
    const t2 = second.body.link.token
    expect((await new ApiClient().get(`/api/share/${t2}`)).status).toBe(200)
    expect((await world.byRole.editor.client.delete(`/api/share-links/${second.body.link.id}`)).status).toBe(403)
    expect((await world.owner.client.delete(`/api/share-links/${second.body.link.id}`)).status).toBe(200)
    const gone = await new ApiClient().get(`/api/share/${t2}`)
    expect(gone.status).toBe(404)
    expect(messageOf(gone)).toBe('This share link does not exist, was revoked or has expired')

    const third = await world.owner.client.post(`/api/theories/${world.theoryId}/share-links`, { expiresInDays: 1 })
    await testDb()('share_links')
      .where({ id: third.body.link.id })
      .update({ expires_at: new Date(Date.now() - 1000) })
    expect((await new ApiClient().get(`/api/share/${third.body.link.token}`)).status).toBe(404)
    expect((await new ApiClient().get('/api/share/not-a-token')).status).toBe(404)
  })
})

describe('invitations by e-mail', () => {
  it('the e-mailed link signs a newcomer up into the group with the role', async () => {
    const email = uniqueEmail('invitee')
    const inv = await world.owner.client.post(`/api/groups/${world.slug}/invitations`, { email, role: 'commenter' })
    expect(inv.status).toBe(201)
    const mail = await testDb()('outbox').where({ to_address: email }).first()
    expect(mail.subject).toContain('invites you to')
    const inviteToken = /\/join\/([A-Za-z0-9_-]{40,})/.exec(mail.text_body)![1]!
    const look = await new ApiClient().post('/api/invitations/lookup', { token: inviteToken })
    expect(look.body.invitation).toMatchObject({ email, role: 'commenter' })

    const newcomer = new ApiClient()
    const up = await newcomer.post('/api/auth/signup', { email, password: TEST_PASSWORD, displayName: 'Newcomer', invitation: inviteToken })
    expect(up.status).toBe(201)
    const group = await newcomer.get(`/api/groups/${world.slug}`)
    expect(group.status).toBe(200)
    expect(group.body.role).toBe('commenter')
    const again = await new ApiClient().post('/api/invitations/lookup', { token: inviteToken })
    expect(again.status).toBe(404)
  })

  it('an invitation only works for the address it was sent to, and a failed sign-up writes nothing', async () => {
    const inv = await world.owner.client.post(`/api/groups/${world.slug}/invitations`, { email: uniqueEmail('addressee'), role: 'viewer' })
    const mail = await testDb()('outbox').where({ to_address: inv.body.invitation.email }).first()
    const inviteToken = /\/join\/([A-Za-z0-9_-]{40,})/.exec(mail.text_body)![1]!
    const before = await rowCounts()
    const res = await new ApiClient().post('/api/auth/signup', { email: uniqueEmail('other'), password: TEST_PASSWORD, displayName: 'Other', invitation: inviteToken })
    expect(res.status).toBe(403)
    expect(messageOf(res)).toMatch(/was sent to/)
    expect(await rowCounts()).toEqual(before)
  })
})
