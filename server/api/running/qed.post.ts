import { defineApiHandler } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { requireUser } from '../../utils/auth/currentUser'
import { compute } from '../../utils/compute/computePool'
import { RunningQedSchema } from '../../../shared/schemas/scaleRequests'

// α(μ) at one loop through the charged-fermion thresholds, and α(M_Z) with Δα_had as input (signed in; nothing stored).
export default defineApiHandler(async (event) => {
  const body = await readJson(event, RunningQedSchema)
  const user = await requireUser(event)
  return compute('qedRunning', body, user.id)
})
