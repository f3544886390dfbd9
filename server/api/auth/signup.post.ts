import { setResponseStatus } from 'h3'
import { startSession } from '../../utils/auth/sessions'
import { defineApiHandler, created } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { SignUpSchema } from '../../../shared/schemas/account'
import { publicUser } from '../../utils/db/users'
import { acceptInvitation, openInvitation } from '../../utils/db/invitations'
import { useDb } from '../../utils/db/connection'
import { requestSignUp, createAccountOnce, SIGN_UP_SENT } from '../../utils/accounts/signUps'

// Create an account. Without an invitation the account is made when the e-mailed link is
// opened (202, the same answer for every address). With an invitation, which was mailed to
// the address and so proves it, the account is made at once, joins the group and signs in.
export default defineApiHandler(async (event) => {
  const body = await readJson(event, SignUpSchema)
  const passwordHash = await hashPassword(body.password)
  if (!body.invitation) {
    await requestSignUp(body, passwordHash)
    setResponseStatus(event, 202)
    return { message: SIGN_UP_SENT }
  }
  const token = body.invitation
  const user = await useDb().transaction(async (trx) => {
    await openInvitation(trx, token, body.email)
    const row = await createAccountOnce(trx, { email: body.email, displayName: body.displayName, passwordHash })
    await acceptInvitation(trx, token, row.id, row.email)
    return row
  })
  await startSession(event, publicUser(user))
  created(event)
  return { user: publicUser(user) }
})
