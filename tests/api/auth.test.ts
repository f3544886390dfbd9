import { describe, it, expect } from 'vitest'
import { ApiClient, uniqueEmail, TEST_PASSWORD, signedUpClient, messageOf, mailedToken } from '../support/client'
import { rowCounts, makeAdmin, testDb } from '../support/db'

describe('accounts', () => {
  it('signs up, reads itself, signs out and in again', async () => {
    const client = new ApiClient()
    const email = uniqueEmail('alice')
    const asked = await client.post('/api/auth/signup', { email: email.toUpperCase(), password: TEST_PASSWORD, displayName: 'Alice' })
    expect(asked.status).toBe(202)
    expect(client.cookie).toBe('')
    const up = await client.post('/api/auth/signup-confirm', { token: await mailedToken(email, 'welcome') })
    expect(up.status).toBe(201)
    expect(up.body.user).toMatchObject({ email, displayName: 'Alice', siteRole: 'member' })
    expect((await client.get('/api/auth/me')).body.user.email).toBe(email)
    expect((await client.post('/api/auth/signout')).status).toBe(200)
    const me = await client.get('/api/auth/me')
    expect(me.status).toBe(401)
    expect(messageOf(me)).toBe('Sign in to continue')
    expect((await client.post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
    expect((await client.get('/api/auth/me')).status).toBe(200)
  })

  it('stores a scrypt hash, never the password', async () => {
    const { email } = await signedUpClient('hash')
    const row = await testDb()('users').where({ email }).first()
    expect(row.password_hash).not.toContain(TEST_PASSWORD)
    expect(row.password_hash).toMatch(/^\$scrypt\$/)
  })

  it('a second sign-up on a known address makes no account, changes nothing of the first, and mails its owner', async () => {
    const { email, id } = await signedUpClient('dup')
    const before = await rowCounts()
    const account = await testDb()('users').where({ id }).first()
    const again = await new ApiClient().post('/api/auth/signup', { email, password: 'another long password', displayName: 'Dup' })
    expect(again.status).toBe(202)
    expect(await rowCounts()).toEqual({ ...before, outbox: before.outbox! + 1, account_mails: before.account_mails! + 1 })
    expect(await testDb()('users').where({ id }).first()).toEqual(account)
    const mail = await testDb()('outbox').where({ to_address: email }).orderBy('id', 'desc').first('subject')
    expect(mail.subject).toBe('Someone tried to create a Scalewright account with your address')
  })

  it('a sign-up link works once, and not after it expires', async () => {
    const email = uniqueEmail('once')
    await new ApiClient().post('/api/auth/signup', { email, password: TEST_PASSWORD, displayName: 'Once' })
    const token = await mailedToken(email, 'welcome')
    expect((await new ApiClient().post('/api/auth/signup-confirm', { token })).status).toBe(201)
    const again = await new ApiClient().post('/api/auth/signup-confirm', { token })
    expect(again.status).toBe(400)
    expect(messageOf(again)).toBe('This sign-up link is invalid, used or expired; sign up again')
    const late = uniqueEmail('late')
    await new ApiClient().post('/api/auth/signup', { email: late, password: TEST_PASSWORD, displayName: 'Late' })
    await testDb()('sign_up_requests')
      .where({ email: late })
      .update({ expires_at: new Date(Date.now() - 1000) })
    expect((await new ApiClient().post('/api/auth/signup-confirm', { token: await mailedToken(late, 'welcome') })).status).toBe(400)
  })

  it('gives one message for a wrong password and an unknown address', async () => {
    const { email } = await signedUpClient('wrong')
    const a = await new ApiClient().post('/api/auth/signin', { email, password: 'not the password' })
    const b = await new ApiClient().post('/api/auth/signin', { email: uniqueEmail('ghost'), password: 'whatever' })
    expect([a.status, b.status]).toEqual([401, 401])
    expect(messageOf(a)).toBe('E-mail or password is wrong')
    expect(messageOf(b)).toBe(messageOf(a))
  })
})

describe('password reset through the e-mailed one-time token', () => {
  it('mails a link, sets the new password once, and the token cannot be reused', async () => {
    const { email } = await signedUpClient('forgetful')
    const admin = await signedUpClient('mailadmin')
    await makeAdmin(admin.id)
    const ask = await new ApiClient().post('/api/auth/reset-request', { email })
    expect(ask.status).toBe(200)
    const box = await admin.client.get(`/api/admin/outbox?to=${encodeURIComponent(email)}`)
    expect(box.status).toBe(200)
    expect(box.body.messages.map((m: { subject: string }) => m.subject)).toEqual(['Reset your Scalewright password', 'Finish creating your Scalewright account'])
    const token = /\/reset\/([A-Za-z0-9_-]{40,})/.exec(box.body.messages[0].text)![1]!
    const raw = await testDb()('outbox').where({ to_address: email }).orderBy('id', 'desc').first()
    expect(raw.raw).toContain('Subject: Reset your Scalewright password') // built by nodemailer

    const newPassword = 'a brand new password'
    expect((await new ApiClient().post('/api/auth/reset', { token, password: newPassword })).status).toBe(200)
    expect((await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(401)
    expect((await new ApiClient().post('/api/auth/signin', { email, password: newPassword })).status).toBe(200)
    const reuse = await new ApiClient().post('/api/auth/reset', { token, password: 'yet another password' })
    expect(reuse.status).toBe(400)
    expect(messageOf(reuse)).toMatch(/invalid, used or expired/)
  })

  it('answers the same for an unknown address, makes no reset link, and tells the address no account uses it', async () => {
    const email = uniqueEmail('nobody')
    const before = await rowCounts()
    const res = await new ApiClient().post('/api/auth/reset-request', { email })
    expect(res.status).toBe(200)
    expect(res.body.message).toMatch(/If an account exists/)
    expect(await rowCounts()).toEqual({ ...before, outbox: before.outbox! + 1, account_mails: before.account_mails! + 1 })
    const mail = await testDb()('outbox').where({ to_address: email }).first('subject', 'text_body')
    expect(mail.subject).toBe('Scalewright password reset: no account uses this address')
    expect(mail.text_body).not.toMatch(/\/reset\//)
  })

  it('refuses an expired token', async () => {
    const { email } = await signedUpClient('late')
    await new ApiClient().post('/api/auth/reset-request', { email })
    const admin = await signedUpClient('mailadmin2')
    await makeAdmin(admin.id)
    const box = await admin.client.get(`/api/admin/outbox?to=${encodeURIComponent(email)}`)
    const token = /\/reset\/([A-Za-z0-9_-]{40,})/.exec(box.body.messages[0].text)![1]!
    await testDb()('password_resets').update({ expires_at: new Date(Date.now() - 1000) })
    expect((await new ApiClient().post('/api/auth/reset', { token, password: 'another long password' })).status).toBe(400)
  })
})

describe('throttling of password guessing and reset mails', () => {
  it('after 10 failed sign-ins an address is refused for 15 minutes, even with the right password', async () => {
    const { email } = await signedUpClient('guessed')
    const other = await signedUpClient('bystander')
    for (let i = 0; i < 10; i++) {
      expect((await new ApiClient().post('/api/auth/signin', { email, password: `guess number ${i}` })).status).toBe(401)
    }
    const refused = await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })
    expect(refused.status).toBe(429)
    expect(messageOf(refused)).toBe('Too many failed sign-ins for this address; try again in 15 minutes, or reset the password')
    // Another address from the same client is not affected.
    expect((await new ApiClient().post('/api/auth/signin', { email: other.email, password: TEST_PASSWORD })).status).toBe(200)
    // Once the failures are older than the window, the right password works and clears them.
    await testDb()('sign_in_failures')
      .where('key', 'like', `${email}|%`)
      .update({ created_at: new Date(Date.now() - 16 * 60_000) })
    expect((await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
    expect(await testDb()('sign_in_failures').where('key', 'like', `${email}|%`).count('id as n').first()).toEqual({ n: '0' })
  })

  it('a successful sign-in clears the count of failures', async () => {
    const { email } = await signedUpClient('forgetful2')
    for (let i = 0; i < 9; i++) await new ApiClient().post('/api/auth/signin', { email, password: `typo ${i}` })
    expect((await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
    for (let i = 0; i < 9; i++) expect((await new ApiClient().post('/api/auth/signin', { email, password: `typo again ${i}` })).status).toBe(401)
  })

  it('sends at most 3 reset mails per account and hour, with the same answer every time', async () => {
    const { email } = await signedUpClient('flooded')
    const answers = new Set<string>()
    for (let i = 0; i < 5; i++) {
      const res = await new ApiClient().post('/api/auth/reset-request', { email })
      expect(res.status).toBe(200)
      answers.add(res.body.message)
    }
    expect([...answers]).toEqual(['If an account exists for that address, a reset link is on its way.'])
    expect(await testDb()('outbox').where({ to_address: email, subject: 'Reset your Scalewright password' }).count('id as n').first()).toEqual({ n: '3' })
  })
})
