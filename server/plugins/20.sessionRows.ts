import { isError } from 'h3'
import { deleteSessionRow } from '../utils/auth/sessions'
import { requireUser } from '../utils/auth/currentUser'

// nuxt-auth-utils' own routes (GET and DELETE /api/_auth/session) know nothing of session rows:
// - clearing a cookie (its DELETE, and our endSession) deletes the row the cookie named;
// - the page's session read (its GET, which the app's pages use to know who is signed in)
//   checks the row and the account like every API route and answers with the account as it
//   is now, or, when the session has ended, with no one signed in (the cookie is cleared).
export default defineNitroPlugin(() => {
  sessionHooks.hook('clear', (data) => deleteSessionRow(data))
  sessionHooks.hook('fetch', async (session, event) => {
    if (!session.user) return
    try {
      session.user = await requireUser(event)
    } catch (error) {
      if (!isError(error) || error.statusCode !== 401) throw error
      for (const key of Object.keys(session)) delete (session as Record<string, unknown>)[key]
    }
  })
})
