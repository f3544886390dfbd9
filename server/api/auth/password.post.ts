import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { ChangePasswordSchema } from '../../../shared/schemas/account'
import { requireUser } from '../../utils/auth/currentUser'
import { sessionFacts } from '../../utils/auth/sessions'
import { takeSignInAttempt, clearFailedSignIns } from '../../utils/auth/throttle'
import { passwordMatches } from '../../utils/auth/passwordCheck'
import { useDb } from '../../utils/db/connection'
import { setPassword } from '../../utils/db/users'

// Change the password while signed in: the current one is checked (and throttled like a
// sign-in); every other session ends and every reset link sent before is spent.
export default defineApiHandler(async (event) => {
  const body = await readJson(event, ChangePasswordSchema)
  const user = await requireUser(event)
  await takeSignInAttempt(event, user.email)
  const row = await useDb()('users').where({ id: user.id }).first('password_hash')
  if (!(await passwordMatches(row.password_hash, body.current))) fail(401, 'The current password is wrong')
  await clearFailedSignIns(event, user.email)
  const passwordHash = await hashPassword(body.password)
  const keep = (await sessionFacts(event)).sessionId
  await useDb().transaction((trx) => setPassword(trx, user.id, passwordHash, keep))
  return { message: 'Password changed; you stay signed in here and are signed out everywhere else.' }
})
