import { startSession } from '../../utils/auth/sessions'
import { refuseThrottledSignIn, recordFailedSignIn, clearFailedSignIns } from '../../utils/auth/throttle'
import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { SignInSchema } from '../../../shared/schemas/account'
import { findUserByEmail, publicUser } from '../../utils/db/users'

export default defineApiHandler(async (event) => {
  const body = await readJson(event, SignInSchema)
  await refuseThrottledSignIn(event, body.email)
  const user = await findUserByEmail(body.email)
  // Same message for unknown e-mail and wrong password: no account discovery.
  if (!user || !(await verifyPassword(user.password_hash, body.password))) {
    await recordFailedSignIn(event, body.email)
    fail(401, 'E-mail or password is wrong')
  }
  await clearFailedSignIns(event, body.email)
  await startSession(event, publicUser(user))
  return { user: publicUser(user) }
})
