import { defineApiHandler } from '../utils/http/apiHandler'
import { readJson } from '../utils/http/readJson'
import { requireUser } from '../utils/auth/currentUser'
import { compute } from '../utils/compute/computePool'
import { QuickCountSchema } from '../../shared/schemas/runRequests'
import type { CountResult } from '../engine/counting/countOperators'

// A quick count for the editor (up to dimension 8), computed in the compute pool's count lane
// (a few threads, a few per user, 429 beyond) with a time budget; anything bigger belongs in a
// background run.
export default defineApiHandler(async (event) => {
  const user = await requireUser(event)
  const body = await readJson(event, QuickCountSchema)
  return (await compute('quickCount', { theory: body.theory, maxDim: body.maxDim, nf: body.nf }, user.id)) as CountResult
})
