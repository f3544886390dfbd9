import { endSession } from '../../utils/auth/sessions'
import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { ResetSchema } from '../../../shared/schemas/account'
import { useDb } from '../../utils/db/connection'
import { setPassword } from '../../utils/db/users'
import { hashToken } from '../../utils/tokens'

// Set a new password with a one-time e-mailed token. In one transaction: the token and every
// other reset link of the account are spent, and every session ends (a thief's included).
export default defineApiHandler(async (event) => {
  const body = await readJson(event, ResetSchema)
  const passwordHash = await hashPassword(body.password)
  await useDb().transaction(async (trx) => {
    const reset = await trx('password_resets')
      .where({ token_hash: hashToken(body.token) })
      .forUpdate()
      .first()
    if (!reset || reset.used_at || new Date(reset.expires_at) < new Date()) fail(400, 'This reset link is invalid, used or expired; ask for a new one')
    await setPassword(trx, reset.user_id, passwordHash, null)
  })
  await endSession(event)
  return { message: 'Password changed; sign in with the new one.' }
})
