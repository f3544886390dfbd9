import { defineApiHandler } from '../../utils/http/apiHandler'
import { endSession } from '../../utils/auth/sessions'

export default defineApiHandler(async (event) => {
  await endSession(event)
  return { signedOut: true }
})
