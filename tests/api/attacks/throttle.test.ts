import { describe, it, expect } from 'vitest'
import { ApiClient, TEST_PASSWORD, signedUpClient } from '../../support/client'
import { testDb } from '../../support/db'

// Password guessing in parallel (issue 12, item 4). The tester sent 200 guesses for one address
// at once: all were checked, the right one among them got a session, and no 429 appeared,
// because each request read the failure count before any failure was written.
const LIMIT = 10

function statuses(replies: { status: number }[]) {
  const count = new Map<number, number>()
  for (const r of replies) count.set(r.status, (count.get(r.status) ?? 0) + 1)
  return Object.fromEntries(count)
}

describe('the sign-in throttle counts atomically', () => {
  it('200 parallel wrong guesses: exactly the limit is checked, the rest get 429', async () => {
    const { email } = await signedUpClient('parallel')
    const replies = await Promise.all(Array.from({ length: 200 }, (_, i) => new ApiClient().post('/api/auth/signin', { email, password: `guess number ${i}` })))
    expect(statuses(replies)).toEqual({ 401: LIMIT, 429: 200 - LIMIT })
  })

  it('past the limit, the right password among parallel guesses gets no session', async () => {
    const { email } = await signedUpClient('parallel2')
    for (let i = 0; i < LIMIT; i++) await new ApiClient().post('/api/auth/signin', { email, password: `typo ${i}` })
    const clients = Array.from({ length: 50 }, () => new ApiClient())
    const replies = await Promise.all(clients.map((c, i) => c.post('/api/auth/signin', { email, password: i === 25 ? TEST_PASSWORD : `guess ${i}` })))
    expect(statuses(replies)).toEqual({ 429: 50 })
    expect(clients.every((c) => c.cookie === '')).toBe(true)
  })

  it('a mix of right and wrong passwords in parallel never checks more than the limit between two successes', async () => {
    const { email } = await signedUpClient('parallel3')
    const replies = await Promise.all(Array.from({ length: 100 }, (_, i) => new ApiClient().post('/api/auth/signin', { email, password: i % 10 === 9 ? TEST_PASSWORD : `guess ${i}` })))
    const checked = replies.filter((r) => r.status !== 429).length
    // A success clears the count, so up to LIMIT wrong guesses may follow each success.
    const successes = replies.filter((r) => r.status === 200).length
    expect(checked).toBeLessThanOrEqual((successes + 1) * LIMIT)
    expect(replies.every((r) => [200, 401, 429].includes(r.status))).toBe(true)
  })

  it('the password form shares the limit: parallel wrong current passwords get 429 past it', async () => {
    const { client, email } = await signedUpClient('parallel4')
    const replies = await Promise.all(Array.from({ length: 40 }, (_, i) => client.post('/api/auth/password', { current: `guess ${i}`, password: 'a new long password' })))
    expect(statuses(replies)).toEqual({ 401: LIMIT, 429: 40 - LIMIT })
    const failures = await testDb()('sign_in_failures').where('key', 'like', `${email}|%`).count('id as n').first()
    expect(Number(failures!.n)).toBe(LIMIT)
  })
})
