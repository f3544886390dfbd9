import { defineApiHandler } from '../utils/http/apiHandler'
import { readJson } from '../utils/http/readJson'
import { engineResultWithin } from '../utils/http/engineWithin'
import { requireUser } from '../utils/auth/currentUser'
import { startEngineTask } from '../worker/engineTask'
import { QuickCountSchema } from '../../shared/schemas/runRequests'
import type { CountResult } from '../engine/counting/countOperators'

const QUICK_LIMIT_MS = 10_000

// A quick count for the editor (up to dimension 8), computed in a worker thread with a time
// limit; anything bigger belongs in a background run.
export default defineApiHandler(async (event) => {
  await requireUser(event)
  const body = await readJson(event, QuickCountSchema)
  const handle = startEngineTask<CountResult>({ kind: 'count', theory: body.theory, maxDim: body.maxDim, nf: body.nf }, () => {})
  return engineResultWithin(handle, QUICK_LIMIT_MS, `This count takes longer than ${QUICK_LIMIT_MS / 1000} s; start a background run instead`)
})
