import { defineApiHandler } from '../../utils/http/apiHandler'
import { readJson } from '../../utils/http/readJson'
import { requireUser } from '../../utils/auth/currentUser'
import { qedRunning } from '../../utils/scales/runningCurves'
import { RunningQedSchema } from '../../../shared/schemas/scaleRequests'

// α(μ) at one loop through the charged-fermion thresholds, and α(M_Z) with Δα_had as input (signed in; nothing stored).
export default defineApiHandler(async (event) => {
  const body = await readJson(event, RunningQedSchema)
  await requireUser(event)
  return qedRunning(body)
})
