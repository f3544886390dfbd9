import { defineApiHandler } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { requireUser } from '../../utils/auth/currentUser'
import { compute } from '../../utils/compute/computePool'
import { RunningQcdSchema } from '../../../shared/schemas/scaleRequests'

// α_s in MS-bar at 1–4 loops with decoupling at the heavy-quark thresholds (signed in; nothing stored).
export default defineApiHandler(async (event) => {
  const body = await readJson(event, RunningQcdSchema)
  const user = await requireUser(event)
  return compute('qcdRunning', body, user.id)
})
