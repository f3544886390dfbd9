import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam, readJson } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { saveLadder } from '../../../utils/db/scaleLadders'
import { computeLadder } from '../../../utils/scales/ladderEstimates'
import { LadderSaveSchema } from '../../../../shared/schemas/scaleRequests'
import { once } from '../../../utils/http/requestKeys'

// Editors save the scale ladder. The engine computes it first (a bad ratio or an unknown name
// is a 422 before anything is written); the version check turns a concurrent edit into a 409.
export default defineApiHandler(async (event) => {
  const body = await readJson(event, LadderSaveSchema)
  const theory = await theoryOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, theory.group_id, 'editor')
  const computed = computeLadder(body.ladder)
  return once(event, user.id, body, async () => ({ ladder: body.ladder, version: await saveLadder(theory.id, body.ladder, body.version, user.id), computed }))
})
