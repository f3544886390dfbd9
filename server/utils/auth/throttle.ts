import { getRequestIP, type H3Event } from 'h3'
import { useDb } from '../db/connection'
import { fail } from '../http/apiHandler'

// Guessing passwords: after SIGN_IN_LIMIT failed sign-ins for one address from one client
// address within the window, every sign-in for that pair is refused (429) until the oldest
// failure leaves the window. Keyed by the pair so that a stranger elsewhere cannot lock the
// owner out. Kept in PostgreSQL so that every server process sees the same count.
export const SIGN_IN_LIMIT = 10
export const SIGN_IN_WINDOW_MIN = 15
// Reset mails: at most this many per account per hour (more requests get the same answer).
export const RESET_MAILS_PER_HOUR = 3

function signInKey(event: H3Event, email: string) {
  return `${email.toLowerCase()}|${getRequestIP(event) ?? 'unknown'}`
}

const windowStart = () => new Date(Date.now() - SIGN_IN_WINDOW_MIN * 60_000)

/** 429 with the wait in minutes when this address and client have used up their attempts. */
export async function refuseThrottledSignIn(event: H3Event, email: string) {
  const rows = await useDb()('sign_in_failures').where({ key: signInKey(event, email) }).andWhere('created_at', '>', windowStart())
    .orderBy('created_at').select('created_at')
  if (rows.length < SIGN_IN_LIMIT) return
  const freeAt = new Date(rows[rows.length - SIGN_IN_LIMIT]!.created_at).getTime() + SIGN_IN_WINDOW_MIN * 60_000
  const minutes = Math.max(1, Math.ceil((freeAt - Date.now()) / 60_000))
  fail(429, `Too many failed sign-ins for this address; try again in ${minutes} minute${minutes === 1 ? '' : 's'}, or reset the password`)
}

export async function recordFailedSignIn(event: H3Event, email: string) {
  const key = signInKey(event, email)
  await useDb()('sign_in_failures').insert({ key })
  // Expired failures of every key go too: the table never holds more than one window's worth,
  // even when someone tries many addresses.
  await useDb()('sign_in_failures').where('created_at', '<', windowStart()).delete()
}

export async function clearFailedSignIns(event: H3Event, email: string) {
  await useDb()('sign_in_failures').where({ key: signInKey(event, email) }).delete()
}
