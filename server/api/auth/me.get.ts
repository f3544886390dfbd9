import { defineApiHandler } from '../../utils/http/apiHandler'
import { requireUser } from '../../utils/auth/currentUser'

export default defineApiHandler(async (event) => ({ user: await requireUser(event) }))
