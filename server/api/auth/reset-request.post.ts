import { defineApiHandler } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { ResetRequestSchema } from '../../../shared/schemas/account'
import { findUserByEmail } from '../../utils/db/users'
import { useDb } from '../../utils/db/connection'
import { newToken } from '../../utils/tokens'
import { sendMail, appUrl } from '../../utils/mail'

const RESET_MINUTES = 60

// Always the same answer, whether or not the address has an account (no account discovery).
export default defineApiHandler(async (event) => {
  const { email } = await readJson(event, ResetRequestSchema)
  const user = await findUserByEmail(email)
  if (user) {
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
