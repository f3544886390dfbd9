import { endSession } from '../../utils/auth/sessions'
import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { ResetSchema } from '../../../shared/schemas/account'
import { useDb } from '../../utils/db/connection'
import { hashToken } from '../../utils/tokens'

// Set a new password with a one-time e-mailed token; the token is spent in the same transaction.
export default defineApiHandler(async (event) => {
  const body = await readJson(event, ResetSchema)
  const passwordHash = await hashPassword(body.password)
  await useDb().transaction(async (trx) => {
    const reset = await trx('password_resets').where({ token_hash: hashToken(body.token) }).forUpdate().first()
    if (!reset || reset.used_at || new Date(reset.expires_at) < new Date()) fail(400, 'This reset link is invalid, used or expired; ask for a new one')
    await trx('password_resets').where({ id: reset.id }).update({ used_at: trx.fn.now() })
    // Every session signed in before now stops working (a thief's included).
    await trx('users').where({ id: reset.user_id }).update({ password_hash: passwordHash, sessions_valid_from: new Date() })
  })
  await endSession(event)
  return { message: 'Password changed; sign in with the new one.' }
})
