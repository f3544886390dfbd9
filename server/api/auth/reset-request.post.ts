import { defineApiHandler } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { ResetRequestSchema } from '../../../shared/schemas/account'
import { requestReset } from '../../utils/accounts/resets'

// Always the same answer, whether or not the address has an account (no account discovery)
// and whether or not this hour's mails for it are used up (no inbox flooding).
export default defineApiHandler(async (event) => {
  const { email } = await readJson(event, ResetRequestSchema)
  await requestReset(email)
  return { message: 'If an account exists for that address, a reset link is on its way.' }
})
