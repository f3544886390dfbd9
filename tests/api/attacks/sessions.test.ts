import { describe, it, expect, beforeAll } from 'vitest'
import { ApiClient, TEST_PASSWORD, signedUpClient, messageOf } from '../../support/client'
import { buildWorld, addBasis, type World } from '../../support/fixtures'
import { testDb } from '../../support/db'

// Sessions and reset links (issue 12, item 4). The tester signed out and kept using the old
// cookie (GET /api/auth/me 200, a tag write 201), and reset a password with a link requested
// before a password change.
let world: World
let basisId: number
let photonId: number
beforeAll(async () => {
  world = await buildWorld()
  const basis = await addBasis(world)
  basisId = basis.basisId
  photonId = basis.operatorIds.photon
})

const ENDED = 'This session has ended (signed out, the password was changed, or all other sessions were signed out); sign in again'

/** A second copy of a signed-in client's cookie, as a thief who copied it would hold. */
function copyOf(client: ApiClient): ApiClient {
  const copy = new ApiClient()
  copy.cookie = client.cookie
  return copy
}

async function resetToken(email: string): Promise<string> {
  expect((await new ApiClient().post('/api/auth/reset-request', { email })).status).toBe(200)
  const mail = await testDb()('outbox').where({ to_address: email }).orderBy('id', 'desc').first('text_body')
  return /\/reset\/([A-Za-z0-9_-]{40,})/.exec(mail.text_body)![1]!
}

describe('signing out ends the session on the server', () => {
  it('the old cookie is refused at once for reads and writes, also on the hot reads whose unseal is remembered', async () => {
    const editor = new ApiClient()
    expect((await editor.post('/api/auth/signin', { email: world.byRole.editor.email, password: TEST_PASSWORD })).status).toBe(200)
    const reads = ['/api/auth/me', `/api/groups/${world.slug}`, `/api/theories/${world.theoryId}`, `/api/bases/${basisId}`]
    for (const path of reads) expect((await editor.get(path)).status, path).toBe(200)
    const stolen = copyOf(editor)

    expect((await editor.post('/api/auth/signout')).status).toBe(200)
    for (const path of reads) {
      const res = await copyOf(stolen).get(path)
      expect(res.status, path).toBe(401)
      expect(messageOf(res)).toBe(ENDED)
    }
    const before = await testDb()('tags').where({ operator_id: photonId }).count('id as n').first()
    const write = await copyOf(stolen).post(`/api/operators/${photonId}/tags`, { kind: 'custom', label: 'after sign-out' })
    expect(write.status).toBe(401)
    expect(await testDb()('tags').where({ operator_id: photonId }).count('id as n').first()).toEqual(before)
    // The page's own session read says nobody is signed in.
    const read = await copyOf(stolen).get('/api/_auth/session')
    expect(read.status).toBe(200)
    expect(read.body.user).toBeUndefined()
  })

  it('signing out in one browser leaves the other browsers signed in', async () => {
    const here = await signedUpClient('twobrowsers')
    const there = new ApiClient()
    expect((await there.post('/api/auth/signin', { email: here.email, password: TEST_PASSWORD })).status).toBe(200)
    expect((await here.client.post('/api/auth/signout')).status).toBe(200)
    expect((await there.get('/api/auth/me')).status).toBe(200)
  })

  it('signing in again on the same browser ends its previous session', async () => {
    const { client, email, id } = await signedUpClient('again')
    const earlier = copyOf(client)
    expect((await client.post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
    expect(client.cookie).not.toBe(earlier.cookie)
    expect((await client.get('/api/auth/me')).status).toBe(200)
    expect((await earlier.get('/api/auth/me')).status).toBe(401)
    expect(await testDb()('sessions').where({ user_id: id }).count('id as n').first()).toEqual({ n: '1' })
  })

  it("the page's session read reflects the account as it is now", async () => {
    const { client, id } = await signedUpClient('renamed')
    await testDb()('users').where({ id }).update({ display_name: 'Renamed Since' })
    const res = await client.get('/api/_auth/session')
    expect(res.status).toBe(200)
    expect(res.body.user).toMatchObject({ id, displayName: 'Renamed Since' })
  })
})

describe('reset links die when the password changes', () => {
  it('a link requested before a password change no longer resets the password', async () => {
    const { client, email } = await signedUpClient('changes')
    const early = await resetToken(email)
    expect((await client.post('/api/auth/password', { current: TEST_PASSWORD, password: 'a second long password' })).status).toBe(200)
    const late = await new ApiClient().post('/api/auth/reset', { token: early, password: 'the attacker password' })
    expect(late.status).toBe(400)
    expect(messageOf(late)).toBe('This reset link is invalid, used or expired; ask for a new one')
    expect((await new ApiClient().post('/api/auth/signin', { email, password: 'a second long password' })).status).toBe(200)
  })

  it('using one reset link spends every other link of the account', async () => {
    const { email } = await signedUpClient('tworesets')
    const first = await resetToken(email)
    const second = await resetToken(email)
    expect((await new ApiClient().post('/api/auth/reset', { token: second, password: 'the owner new password' })).status).toBe(200)
    expect((await new ApiClient().post('/api/auth/reset', { token: first, password: 'the attacker password' })).status).toBe(400)
    expect((await new ApiClient().post('/api/auth/signin', { email, password: 'the owner new password' })).status).toBe(200)
  })

  it("a reset ends every session of the account, this browser's included", async () => {
    const { client, email } = await signedUpClient('resetall')
    const token = await resetToken(email)
    expect((await copyOf(client).post('/api/auth/reset', { token, password: 'a fresh long password' })).status).toBe(200)
    const res = await client.get('/api/auth/me')
    expect(res.status).toBe(401)
    expect(messageOf(res)).toBe(ENDED)
  })
})
