import { defineApiHandler } from '../../utils/http/apiHandler'

export default defineApiHandler(async (event) => {
  await clearUserSession(event)
  return { signedOut: true }
})
