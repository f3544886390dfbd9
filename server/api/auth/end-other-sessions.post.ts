import { defineApiHandler } from '../../utils/http/apiHandler'
import { requireUser } from '../../utils/auth/currentUser'
import { startSession } from '../../utils/auth/sessions'
import { useDb } from '../../utils/db/connection'

// Sign out on every other browser (a lost laptop, a shared computer): sessions signed in
// before now stop working; this browser gets a fresh session.
export default defineApiHandler(async (event) => {
  const user = await requireUser(event)
  await useDb()('users').where({ id: user.id }).update({ sessions_valid_from: new Date() })
  await startSession(event, user)
  return { message: 'Signed out on every other browser.' }
})
