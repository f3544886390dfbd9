import { defineApiHandler } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { ResetRequestSchema } from '../../../shared/schemas/account'
import { findUserByEmail } from '../../utils/db/users'
import { useDb } from '../../utils/db/connection'
import { newToken } from '../../utils/tokens'
import { sendMail, appUrl } from '../../utils/mail'
import { RESET_MAILS_PER_HOUR } from '../../utils/auth/throttle'

const RESET_MINUTES = 60

async function resetMailsLastHour(userId: number): Promise<number> {
  const rows = await useDb()('password_resets').where({ user_id: userId }).andWhere('created_at', '>', new Date(Date.now() - 3_600_000)).count<{ count: string }[]>('id as count')
  return Number(rows[0]!.count)
}

// Always the same answer, whether or not the address has an account (no account discovery)
// and whether or not this hour's mails for it are used up (no inbox flooding).
export default defineApiHandler(async (event) => {
  const { email } = await readJson(event, ResetRequestSchema)
  const user = await findUserByEmail(email)
  if (user && await resetMailsLastHour(user.id) < RESET_MAILS_PER_HOUR) {
    const { token, hash } = newToken()
    await useDb()('password_resets').insert({ user_id: user.id, token_hash: hash, expires_at: new Date(Date.now() + RESET_MINUTES * 60_000) })
    await sendMail({
      to: user.email,
      subject: 'Reset your Scalewright password',
      text: `Someone asked to reset the password of this Scalewright account.\n\nChoose a new password here (valid for ${RESET_MINUTES} minutes, once):\n${appUrl(`/reset/${token}`)}\n\nIf it was not you, ignore this message.`,
    })
  }
  return { message: 'If an account exists for that address, a reset link is on its way.' }
})
