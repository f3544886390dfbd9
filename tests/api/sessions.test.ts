import { describe, it, expect, beforeAll } from 'vitest'
import { ApiClient, TEST_PASSWORD, signedUpClient, messageOf } from '../support/client'
import { buildWorld, addBasis, type World } from '../support/fixtures'
import { makeAdmin } from '../support/db'

// Sessions are sealed cookies; the server remembers successful unseals per cookie text
// (server/utils/auth/sessions.ts). These checks hold with that memory warm.

let world: World
let basisId: number
beforeAll(async () => {
  world = await buildWorld()
  basisId = (await addBasis(world)).basisId
})

/** The same cookie with one character of the sealed value changed. */
function altered(cookie: string, at: number): string {
  const [name, value] = [cookie.slice(0, cookie.indexOf('=')), cookie.slice(cookie.indexOf('=') + 1)]
  const i = value.length - at
  const swapped = value[i] === 'A' ? 'B' : 'A'
  return `${name}=${value.slice(0, i)}${swapped}${value.slice(i + 1)}`
}

/** Every kind of authenticated read: account, group, hot theory and board reads. */
function reads() {
  return ['/api/auth/me', `/api/groups/${world.slug}`, `/api/theories/${world.theoryId}`, `/api/bases/${basisId}`]
}

describe('session cookies', () => {
  it('refuses an altered cookie on every kind of read, also after the genuine one was seen', async () => {
    const viewer = world.byRole.viewer.client
    for (const path of reads()) expect((await viewer.get(path)).status).toBe(200)
    for (const at of [3, 20, 60]) {
      const forger = new ApiClient()
      forger.cookie = altered(viewer.cookie, at)
      for (const path of reads()) expect((await forger.get(path)).status, `${path} (char ${at} from the end)`).toBe(401)
    }
    for (const path of reads()) expect((await viewer.get(path)).status).toBe(200)
  })

  it("lasts 30 days in the browser (the cookie's Expires)", async () => {
    const res = await fetch(`${world.owner.client.baseUrl}/api/auth/signin`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: world.owner.email, password: TEST_PASSWORD }),
    })
    expect(res.status).toBe(200)
    const expires = /Expires=([^;]+)/i.exec(res.headers.getSetCookie()[0]!)![1]!
    const days = (Date.parse(expires) - Date.now()) / 86_400_000
    expect(days).toBeGreaterThan(29.9)
    expect(days).toBeLessThanOrEqual(30)
  })

  it('a password reset ends every session signed in before it, on every kind of read', async () => {
    const thief = new ApiClient()
    expect((await thief.post('/api/auth/signin', { email: world.byRole.editor.email, password: TEST_PASSWORD })).status).toBe(200)
    for (const path of reads()) expect((await thief.get(path)).status).toBe(200) // now remembered
    const admin = await signedUpClient('resetadmin')
    await makeAdmin(admin.id)
    await new ApiClient().post('/api/auth/reset-request', { email: world.byRole.editor.email })
    const box = await admin.client.get(`/api/admin/outbox?to=${encodeURIComponent(world.byRole.editor.email)}`)
    const token = /\/reset\/([A-Za-z0-9_-]{40,})/.exec(box.body.messages[0].text)![1]! // the newest mail
    const newPassword = 'an entirely new password'
    expect((await new ApiClient().post('/api/auth/reset', { token, password: newPassword })).status).toBe(200)

    for (const stale of [thief, world.byRole.editor.client]) {
      const cookie = stale.cookie
      for (const path of reads()) {
        stale.cookie = cookie // each refusal also clears the cookie; try the same one everywhere
        const res = await stale.get(path)
        expect(res.status, path).toBe(401)
        expect(messageOf(res)).toBe('This session has ended (signed out, the password was changed, or all other sessions were signed out); sign in again')
      }
    }
    const fresh = new ApiClient()
    expect((await fresh.post('/api/auth/signin', { email: world.byRole.editor.email, password: newPassword })).status).toBe(200)
    for (const path of reads()) expect((await fresh.get(path)).status, path).toBe(200)
  })
})

describe('changing the password and ending other sessions, while signed in', () => {
  it('a password change keeps this browser signed in and ends every other session', async () => {
    const here = await signedUpClient('changer')
    const elsewhere = new ApiClient()
    expect((await elsewhere.post('/api/auth/signin', { email: here.email, password: TEST_PASSWORD })).status).toBe(200)
    const wrong = await here.client.post('/api/auth/password', { current: 'not my password', password: 'a new long password' })
    expect(wrong.status).toBe(401)
    expect(messageOf(wrong)).toBe('The current password is wrong')
    expect((await elsewhere.get('/api/auth/me')).status).toBe(200) // nothing changed

    const done = await here.client.post('/api/auth/password', { current: TEST_PASSWORD, password: 'a new long password' })
    expect(done.status, JSON.stringify(done.body)).toBe(200)
    expect((await here.client.get('/api/auth/me')).status).toBe(200)
    const out = await elsewhere.get('/api/auth/me')
    expect(out.status).toBe(401)
    expect(messageOf(out)).toBe('This session has ended (signed out, the password was changed, or all other sessions were signed out); sign in again')
    expect((await new ApiClient().post('/api/auth/signin', { email: here.email, password: TEST_PASSWORD })).status).toBe(401)
    expect((await new ApiClient().post('/api/auth/signin', { email: here.email, password: 'a new long password' })).status).toBe(200)
  })

  it('a wrong current password counts as a failed sign-in (no guessing through this form)', async () => {
    const { client, email } = await signedUpClient('guesser')
    for (let i = 0; i < 10; i++) expect((await client.post('/api/auth/password', { current: `guess ${i}`, password: 'a new long password' })).status).toBe(401)
    expect((await client.post('/api/auth/password', { current: TEST_PASSWORD, password: 'a new long password' })).status).toBe(429)
    expect((await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(429)
  })

  it('ending the other sessions keeps this one', async () => {
    const here = await signedUpClient('careful')
    const laptop = new ApiClient()
    await laptop.post('/api/auth/signin', { email: here.email, password: TEST_PASSWORD })
    expect((await here.client.post('/api/auth/end-other-sessions')).status).toBe(200)
    expect((await here.client.get('/api/auth/me')).status).toBe(200)
    const out = await laptop.get('/api/auth/me')
    expect(out.status).toBe(401)
    expect(messageOf(out)).toBe('This session has ended (signed out, the password was changed, or all other sessions were signed out); sign in again')
  })
})
