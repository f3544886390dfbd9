import type { Knex } from 'knex'
import { useDb } from '../db/connection'
import { newToken } from '../tokens'
import { sendMail, appUrl } from '../mail'
import { takeMailQuota } from './mailQuota'

export const RESET_MINUTES = 60

/**
 * A reset request. An address with an account gets a one-time link; an address without one
 * gets a notice that no account uses it (useful to someone who forgot which address they
 * signed up with). Both run the same statements (a quota row, one insert that stores a link
 * only for an account, one mail), so neither the answer nor its time tells whether the
 * address has an account.
 */
export async function requestReset(email: string) {
  await useDb().transaction(async (trx) => {
    if (!(await takeMailQuota(trx, email, 'reset'))) return
    const { token, hash } = newToken()
    if (!(await storeResetLink(trx, email, hash))) {
      return sendMail(
        {
          to: email,
          subject: 'Scalewright password reset: no account uses this address',
          text: `Someone asked to reset the Scalewright password of this address, but no account uses it.\n\nIf you have an account, it is under another address. To make one: ${appUrl('/signup')}\n\nIf it was not you, ignore this message.`,
        },
        { db: trx },
      )
    }
    await sendMail(
      {
        to: email,
        subject: 'Reset your Scalewright password',
        text: `Someone asked to reset the password of this Scalewright account.\n\nChoose a new password here (valid for ${RESET_MINUTES} minutes, once):\n${appUrl(`/reset/${token}`)}\n\nIf it was not you, ignore this message.`,
      },
      { db: trx },
    )
  })
}

/** Store a reset link for the account of `email`, in one statement that runs alike without one; whether it stored one. */
async function storeResetLink(trx: Knex.Transaction, email: string, tokenHash: string): Promise<boolean> {
  const expires = new Date(Date.now() + RESET_MINUTES * 60_000)
  const { rows } = await trx.raw('insert into password_resets (user_id, token_hash, expires_at) select id, ?, ?::timestamptz from users where email = ? returning id', [tokenHash, expires, email])
  return rows.length > 0
}
