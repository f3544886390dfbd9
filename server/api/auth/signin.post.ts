import { startSession } from '../../utils/auth/sessions'
import { takeSignInAttempt, clearFailedSignIns } from '../../utils/auth/throttle'
import { passwordMatches } from '../../utils/auth/passwordCheck'
import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { SignInSchema } from '../../../shared/schemas/account'
import { findUserByEmail, publicUser } from '../../utils/db/users'

export default defineApiHandler(async (event) => {
  const body = await readJson(event, SignInSchema)
  await takeSignInAttempt(event, body.email)
  const user = await findUserByEmail(body.email)
  // Same message and the same work (one scrypt check) for an unknown address and a wrong
  // password: no account discovery.
  const matches = await passwordMatches(user?.password_hash, body.password)
  if (!user || !matches) fail(401, 'E-mail or password is wrong')
  await clearFailedSignIns(event, body.email)
  await startSession(event, publicUser(user))
  return { user: publicUser(user) }
})
