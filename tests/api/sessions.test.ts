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

  it('lasts 30 days in the browser (the cookie\'s Expires)', async () => {
    const res = await fetch(`${world.owner.client.baseUrl}/api/auth/signin`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: world.owner.email, password: TEST_PASSWORD }) })
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
    const token = /\/reset\/([A-Za-z0-9_-]{40,})/.exec(box.body.messages.at(-1).text)![1]!
    const newPassword = 'an entirely new password'
    expect((await new ApiClient().post('/api/auth/reset', { token, password: newPassword })).status).toBe(200)

    for (const stale of [thief, world.byRole.editor.client]) {
      const cookie = stale.cookie
      for (const path of reads()) {
        stale.cookie = cookie // each refusal also clears the cookie; try the same one everywhere
        const res = await stale.get(path)
        expect(res.status, path).toBe(401)
        expect(messageOf(res)).toBe('The password was changed since you signed in; sign in again')
      }
    }
    const fresh = new ApiClient()
    expect((await fresh.post('/api/auth/signin', { email: world.byRole.editor.email, password: newPassword })).status).toBe(200)
    for (const path of reads()) expect((await fresh.get(path)).status, path).toBe(200)
  })
})
