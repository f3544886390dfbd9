import { startSession } from '../../utils/auth/sessions'
import { defineApiHandler, fail, created } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { SignUpSchema } from '../../../shared/schemas/account'
import { createUser, findUserByEmail, publicUser } from '../../utils/db/users'
import { acceptInvitation } from '../../utils/db/invitations'
import { useDb } from '../../utils/db/connection'

// Create an account and sign in. With an invitation token the new account joins its group.
export default defineApiHandler(async (event) => {
  const body = await readJson(event, SignUpSchema)
  if (await findUserByEmail(body.email)) fail(409, 'An account with this e-mail address already exists; sign in or reset the password')
  const passwordHash = await hashPassword(body.password)
  const user = await useDb().transaction(async (trx) => {
    const row = await createUser({ email: body.email, displayName: body.displayName, passwordHash }, trx)
    if (body.invitation) await acceptInvitation(trx, body.invitation, row.id, row.email)
    return row
  })
  await startSession(event, publicUser(user))
  created(event)
  return { user: publicUser(user) }
})
