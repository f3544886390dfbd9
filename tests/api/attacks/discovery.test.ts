import { describe, it, expect, beforeAll } from 'vitest'
import { randomBytes } from 'node:crypto'
import { ApiClient, TEST_PASSWORD, signedUpClient, uniqueEmail, messageOf, type Reply } from '../../support/client'
import { buildWorld, type World } from '../../support/fixtures'
import { testDb } from '../../support/db'
import { pairedMedians } from '../../support/attack'

// Account discovery (issue 12, item 4). The tester told known addresses from unknown ones by
// the answers (sign-up 409, add-member 404 vs 201) and by the time taken (sign-in 6 vs 56 ms,
// reset 3.7 vs 12.5 ms). Timings are compared as medians of alternating requests; the bound
// (25 % of the slower median, at least 3 ms) is far below the gaps the tester measured.
const TRIES = 30
let world: World
let known: string[]
let sharedHash: string
beforeAll(async () => {
  world = await buildWorld()
  known = await knownAccounts(4 * TRIES)
})

/** Accounts that exist (sharing one real scrypt hash, so a sign-in check costs what it costs). */
async function knownAccounts(n: number): Promise<string[]> {
  const { email } = await signedUpClient('known')
  const { password_hash: hash } = await testDb()('users').where({ email }).first('password_hash')
  sharedHash = hash
  const tag = randomBytes(4).toString('hex')
  const rows = Array.from({ length: n }, (_, i) => ({ email: `known-${tag}-${i}@example.test`, display_name: `Known ${i}`, password_hash: hash }))
  await testDb()('users').insert(rows)
  return rows.map((r) => r.email)
}
const knownFor = (use: number, i: number) => known[use * TRIES + i]!

function expectSameTime(what: string, m: { a: number; b: number }) {
  console.info(`[timing] ${what}: known ${m.a.toFixed(1)} ms, unknown ${m.b.toFixed(1)} ms (medians of ${TRIES})`)
  expect(Math.abs(m.a - m.b), `${what}: known ${m.a} ms vs unknown ${m.b} ms`).toBeLessThan(Math.max(3, 0.25 * Math.max(m.a, m.b)))
}
const bodies = (replies: Reply[]) => new Set(replies.map((r) => `${r.status} ${JSON.stringify(r.body)}`))

describe('sign-in', () => {
  it('answers a wrong password and an unknown address alike, in the same time', async () => {
    const m = await pairedMedians(
      TRIES,
      (i) => new ApiClient().post('/api/auth/signin', { email: knownFor(0, i), password: 'not the password' }),
      () => new ApiClient().post('/api/auth/signin', { email: uniqueEmail('ghost'), password: 'not the password' }),
    )
    expect(bodies(m.answers.a).size).toBe(1)
    expect(messageOf(m.answers.a[0]!)).toBe('E-mail or password is wrong')
    expect(bodies(m.answers.a)).toEqual(bodies(m.answers.b))
    expectSameTime('sign-in', m)
  })
})

describe('sign-up', () => {
  it('answers a known address exactly as a new one, in the same time, and mails the owner instead', async () => {
    const fresh: string[] = []
    const m = await pairedMedians(
      TRIES,
      (i) => new ApiClient().post('/api/auth/signup', { email: knownFor(1, i), password: TEST_PASSWORD, displayName: 'Someone' }),
      () => {
        fresh.push(uniqueEmail('newcomer'))
        return new ApiClient().post('/api/auth/signup', { email: fresh.at(-1), password: TEST_PASSWORD, displayName: 'Someone' })
      },
    )
    expect(bodies(m.answers.a)).toEqual(bodies(m.answers.b))
    expect(m.answers.a[0]!.status).toBe(202)
    expectSameTime('sign-up', m)
    const toOwner = await testDb()('outbox')
      .where({ to_address: knownFor(1, 0) })
      .first('subject', 'text_body')
    expect(toOwner.subject).toBe('Someone tried to create a Scalewright account with your address')
    expect(toOwner.text_body).not.toMatch(/\/welcome\//)
    const toNew = await testDb()('outbox').where({ to_address: fresh[0] }).first('subject', 'text_body')
    expect(toNew.subject).toBe('Finish creating your Scalewright account')
    expect(toNew.text_body).toMatch(/\/welcome\/[A-Za-z0-9_-]{40,}/)
  })

  it('no account exists until the link in the mail is opened; the known account is untouched', async () => {
    const email = uniqueEmail('pending')
    const client = new ApiClient()
    expect((await client.post('/api/auth/signup', { email, password: TEST_PASSWORD, displayName: 'Pending' })).status).toBe(202)
    expect(client.cookie).toBe('')
    expect(await testDb()('users').where({ email }).first()).toBeUndefined()
    const owner = await testDb()('users')
      .where({ email: knownFor(1, 0) })
      .first('password_hash', 'display_name')
    expect(owner).toEqual({ password_hash: sharedHash, display_name: 'Known 30' })
  })
})

describe('password reset', () => {
  it('answers alike and in the same time for a known and an unknown address', async () => {
    const m = await pairedMedians(
      TRIES,
      (i) => new ApiClient().post('/api/auth/reset-request', { email: knownFor(2, i) }),
      () => new ApiClient().post('/api/auth/reset-request', { email: uniqueEmail('nobody') }),
    )
    expect(bodies(m.answers.a)).toEqual(bodies(m.answers.b))
    expectSameTime('reset request', m)
  })
})

describe('adding a member', () => {
  it('sends an invitation whether or not the address has an account: same answer, same time, nobody joins without accepting', async () => {
    const strangers: string[] = []
    const m = await pairedMedians(
      TRIES,
      (i) => world.owner.client.post(`/api/groups/${world.slug}/members`, { email: knownFor(3, i), role: 'editor' }),
      () => {
        strangers.push(uniqueEmail('outsider'))
        return world.owner.client.post(`/api/groups/${world.slug}/members`, { email: strangers.at(-1), role: 'editor' })
      },
    )
    const shape = (r: Reply) =>
      `${r.status} ${Object.keys(r.body.invitation ?? {})
        .sort()
        .join(',')} ${r.body.message}`
    expect(new Set(m.answers.a.map(shape))).toEqual(new Set(m.answers.b.map(shape)))
    expect(m.answers.a[0]!.status).toBe(201)
    expectSameTime('add member', m)
    const joined = await testDb()('memberships as m').join('users as u', 'u.id', 'm.user_id').whereIn('u.email', known).andWhere('m.group_id', world.groupId).count('* as n').first()
    expect(Number(joined!.n)).toBe(0)
  })

  it('the invited account joins when it accepts', async () => {
    const person = await signedUpClient('accepts')
    expect((await world.owner.client.post(`/api/groups/${world.slug}/members`, { email: person.email, role: 'commenter' })).status).toBe(201)
    expect((await person.client.get(`/api/groups/${world.slug}`)).status).toBe(403)
    const mail = await testDb()('outbox').where({ to_address: person.email }).orderBy('id', 'desc').first('text_body')
    const token = /\/join\/([A-Za-z0-9_-]{40,})/.exec(mail.text_body)![1]!
    expect((await person.client.post('/api/invitations/accept', { token })).status).toBe(200)
    expect((await person.client.get(`/api/groups/${world.slug}`)).body.role).toBe('commenter')
  })
})
