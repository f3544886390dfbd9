import type { Knex } from 'knex'
import { useDb } from '../db/connection'
import { createUser, type UserRow } from '../db/users'
import { fail } from '../http/apiHandler'
import { newToken, hashToken } from '../tokens'
import { sendMail, appUrl } from '../mail'
import { takeMailQuota } from './mailQuota'
import { lockKey } from '../auth/throttle'

export const SIGN_UP_HOURS = 24
export const SIGN_UP_SENT = 'Check your mailbox: a link to finish creating the account is on its way. (If the address already has an account, the mail says so instead.)'

/**
 * A sign-up without an invitation: the account is made only when the e-mailed link is opened.
 * A new address gets the link; an address that has an account gets a notice instead. Either
 * way the work is the same (one password hash, the same statements, one mail) and so is the
 * answer, so a sign-up does not tell whether an address has an account.
 */
export async function requestSignUp(input: { email: string; displayName: string }, passwordHash: string) {
  await useDb().transaction(async (trx) => {
    if (!(await takeMailQuota(trx, input.email, 'sign-up'))) return
    await trx('sign_up_requests').where('expires_at', '<', new Date()).delete()
    const { token, hash } = newToken()
    if (!(await storeSignUpRequest(trx, input, passwordHash, hash))) return sendMail(accountExistsMail(input.email), { db: trx })
    await sendMail(
      {
        to: input.email,
        subject: 'Finish creating your Scalewright account',
        text: `Someone (you, we hope) asked for a Scalewright account with this address.\n\nOpen this link within ${SIGN_UP_HOURS} hours to finish:\n${appUrl(`/welcome/${token}`)}\n\nIf it was not you, ignore this message; no account is made.`,
      },
      { db: trx },
    )
  })
}

/**
 * Store a sign-up request unless the address has an account, in one statement that runs alike
 * either way (so the time does not tell); whether it stored one.
 */
async function storeSignUpRequest(trx: Knex.Transaction, input: { email: string; displayName: string }, passwordHash: string, tokenHash: string): Promise<boolean> {
  const expires = new Date(Date.now() + SIGN_UP_HOURS * 3_600_000)
  const { rows } = await trx.raw(
    `insert into sign_up_requests (email, display_name, password_hash, token_hash, expires_at)
    select ?, ?, ?, ?, ?::timestamptz where not exists (select 1 from users where email = ?) returning id`,
    [input.email, input.displayName, passwordHash, tokenHash, expires, input.email],
  )
  return rows.length > 0
}

function accountExistsMail(to: string) {
  return {
    to,
    subject: 'Someone tried to create a Scalewright account with your address',
    text: `Someone asked for a new Scalewright account with this address, but you already have one; nothing was changed.\n\nSign in here: ${appUrl('/signin')}\nForgot the password? ${appUrl('/forgot')}\n\nIf it was not you, ignore this message.`,
  }
}

/** Open an e-mailed sign-up link: the account is made (once) and every pending link of the address is spent. */
export async function confirmSignUp(token: string): Promise<UserRow> {
  return useDb().transaction(async (trx: Knex.Transaction) => {
    const request = await trx('sign_up_requests')
      .where({ token_hash: hashToken(token) })
      .forUpdate()
      .first()
    if (!request || new Date(request.expires_at) < new Date()) fail(400, 'This sign-up link is invalid, used or expired; sign up again')
    await trx('sign_up_requests').where({ email: request.email }).delete()
    return createAccountOnce(trx, { email: request.email, displayName: request.display_name, passwordHash: request.password_hash })
  })
}

/**
 * Create an account unless the address has one (409), under a lock on the address, so that two
 * links opened at once, or a link and an invitation, cannot both make it.
 */
export async function createAccountOnce(trx: Knex.Transaction, input: { email: string; displayName: string; passwordHash: string }): Promise<UserRow> {
  await lockKey(trx, `account|${input.email}`)
  if (await trx('users').where({ email: input.email }).first('id')) fail(409, 'An account with this address exists already; sign in with it, or reset the password')
  return createUser(input, trx)
}
