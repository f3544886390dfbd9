import { deleteSessionRow } from '../utils/auth/sessions'
import { requireUser } from '../utils/auth/currentUser'

// nuxt-auth-utils' own routes (GET and DELETE /api/_auth/session) know nothing of session rows:
// - clearing a cookie (its DELETE, and our endSession) deletes the row the cookie named;
// - the page's session read (its GET, which the app's pages use to know who is signed in)
//   checks the row and the account like every API route, and answers with the account as it
//   is now, or 401 when the session has ended.
export default defineNitroPlugin(() => {
  sessionHooks.hook('clear', (data) => deleteSessionRow(data))
  sessionHooks.hook('fetch', async (session, event) => {
    session.user = await requireUser(event)
  })
})
