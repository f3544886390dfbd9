import { defineApiHandler, fail } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { ChangePasswordSchema } from '../../../shared/schemas/account'
import { requireUser } from '../../utils/auth/currentUser'
import { startSession } from '../../utils/auth/sessions'
import { refuseThrottledSignIn, recordFailedSignIn, clearFailedSignIns } from '../../utils/auth/throttle'
import { useDb } from '../../utils/db/connection'

// Change the password while signed in: the current one is checked (and throttled like a
// sign-in), every other session ends, and this browser gets a fresh session.
export default defineApiHandler(async (event) => {
  const body = await readJson(event, ChangePasswordSchema)
  const user = await requireUser(event)
  await refuseThrottledSignIn(event, user.email)
  const row = await useDb()('users').where({ id: user.id }).first('password_hash')
  if (!(await verifyPassword(row.password_hash, body.current))) {
    await recordFailedSignIn(event, user.email)
    fail(401, 'The current password is wrong')
  }
  await clearFailedSignIns(event, user.email)
  const passwordHash = await hashPassword(body.password)
  await useDb()('users').where({ id: user.id }).update({ password_hash: passwordHash, sessions_valid_from: new Date() })
  await startSession(event, user)
  return { message: 'Password changed; you stay signed in here and are signed out everywhere else.' }
})
