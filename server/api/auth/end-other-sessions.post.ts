import { defineApiHandler } from '../../utils/http/apiHandler'
import { requireUser } from '../../utils/auth/currentUser'
import { sessionFacts, endOtherSessions } from '../../utils/auth/sessions'

// Sign out on every other browser (a lost laptop, a shared computer): their session rows go;
// this browser's session stays.
export default defineApiHandler(async (event) => {
  const user = await requireUser(event)
  await endOtherSessions(user.id, (await sessionFacts(event)).sessionId)
  return { message: 'Signed out on every other browser.' }
})
