import { getRequestIP, type H3Event } from 'h3'
import type { Knex } from 'knex'
import { useDb } from '../db/connection'
import { fail } from '../http/apiHandler'

// Guessing passwords: at most SIGN_IN_LIMIT password checks for one address from one client
// address within the window; past that, every sign-in for that pair is refused (429) until the
// oldest failure leaves the window. Keyed by the pair so that a stranger elsewhere cannot lock
// the owner out. Kept in PostgreSQL so that every server process sees the same count.
export const SIGN_IN_LIMIT = 10
export const SIGN_IN_WINDOW_MIN = 15

function signInKey(event: H3Event, email: string) {
  return `${email.toLowerCase()}|${getRequestIP(event) ?? 'unknown'}`
}

const windowStart = () => new Date(Date.now() - SIGN_IN_WINDOW_MIN * 60_000)

/**
 * Serialise the transactions that hold the same key (a transaction-scoped advisory lock on a
 * 64-bit hash of it), so that a count and the insert that follows it act as one step.
 */
export async function lockKey(trx: Knex.Transaction, key: string) {
  await trx.raw('select pg_advisory_xact_lock(hashtextextended(?, 0))', [key])
}

/**
 * Take one password check for this address and client, or answer 429 with the wait. The
 * attempt is written as a failure before the password is checked, under a lock on the key, so
 * that parallel guesses cannot all read a count below the limit; a success clears the count.
 */
export async function takeSignInAttempt(event: H3Event, email: string) {
  const key = signInKey(event, email)
  await useDb().transaction(async (trx) => {
    await lockKey(trx, `sign-in|${key}`)
    const rows = await trx('sign_in_failures').where({ key }).andWhere('created_at', '>', windowStart()).orderBy('created_at').select('created_at')
    if (rows.length >= SIGN_IN_LIMIT) refuse(new Date(rows[rows.length - SIGN_IN_LIMIT]!.created_at))
    await trx('sign_in_failures').insert({ key })
  })
  // Expired failures of every key go too: the table never holds more than one window's worth,
  // even when someone tries many addresses.
  await useDb()('sign_in_failures').where('created_at', '<', windowStart()).delete()
}

function refuse(oldestCounted: Date): never {
  const freeAt = oldestCounted.getTime() + SIGN_IN_WINDOW_MIN * 60_000
  const minutes = Math.max(1, Math.ceil((freeAt - Date.now()) / 60_000))
  fail(429, `Too many failed sign-ins for this address; try again in ${minutes} minute${minutes === 1 ? '' : 's'}, or reset the password`)
}

export async function clearFailedSignIns(event: H3Event, email: string) {
  await useDb()('sign_in_failures')
    .where({ key: signInKey(event, email) })
    .delete()
}
