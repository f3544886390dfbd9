import { startSession } from '../../utils/auth/sessions'
import { defineApiHandler, created } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { SignUpConfirmSchema } from '../../../shared/schemas/account'
import { publicUser } from '../../utils/db/users'
import { confirmSignUp } from '../../utils/accounts/signUps'

// The e-mailed sign-up link, opened: the account is made and this browser signs in.
export default defineApiHandler(async (event) => {
  const { token } = await readJson(event, SignUpConfirmSchema)
  const user = await confirmSignUp(token)
  await startSession(event, publicUser(user))
  created(event)
  return { user: publicUser(user) }
})
