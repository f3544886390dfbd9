import { sessionFacts } from '../utils/auth/sessions'

// Every API route needs a session cookie except these, checked before the route runs, so that
// a signed-out request gets 401 before any lookup could answer 404 (no id is revealed). The
// route itself then checks the session, the account and the role (currentUser.ts).
const PUBLIC = [
  /^\/api\/(health|presets)$/,
  /^\/api\/share\//,
  /^\/api\/auth\/(signup|signup-confirm|signin|signout|reset-request|reset)$/,
  /^\/api\/invitations\/lookup$/,
  /^\/api\/_auth\/session$/, // nuxt-auth-utils: who is signed in (nobody is an answer)
]

export default defineEventHandler(async (event) => {
  if (!event.path.startsWith('/api/')) return
  const path = event.path.split('?')[0]!
  if (PUBLIC.some((p) => p.test(path))) return
  await sessionFacts(event)
})
