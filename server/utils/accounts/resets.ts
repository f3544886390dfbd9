import { useDb } from '../db/connection'
import { newToken } from '../tokens'
import { sendMail, appUrl } from '../mail'
import { takeMailQuota } from './mailQuota'

export const RESET_MINUTES = 60

/**
 * A reset request. An address with an account gets a one-time link; an address without one
 * gets a notice that no account uses it (useful to someone who forgot which address they
 * signed up with). Both cost one quota row, one lookup and one mail, so neither the answer nor
 * its time tells whether the address has an account.
 */
export async function requestReset(email: string) {
  await useDb().transaction(async (trx) => {
    if (!(await takeMailQuota(trx, email, 'reset'))) return
    const user = await trx('users').where({ email }).first('id')
    if (!user) {
      return sendMail({
        to: email,
        subject: 'Scalewright password reset: no account uses this address',
        text: `Someone asked to reset the Scalewright password of this address, but no account uses it.\n\nIf you have an account, it is under another address. To make one: ${appUrl('/signup')}\n\nIf it was not you, ignore this message.`,
      }, { db: trx })
    }
    const { token, hash } = newToken()
    await trx('password_resets').insert({ user_id: user.id, token_hash: hash, expires_at: new Date(Date.now() + RESET_MINUTES * 60_000) })
    await sendMail({
      to: email,
      subject: 'Reset your Scalewright password',
      text: `Someone asked to reset the password of this Scalewright account.\n\nChoose a new password here (valid for ${RESET_MINUTES} minutes, once):\n${appUrl(`/reset/${token}`)}\n\nIf it was not you, ignore this message.`,
    }, { db: trx })
  })
}
