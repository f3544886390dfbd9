import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam, readJson } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { saveLadder } from '../../../utils/db/scaleLadders'
import { compute } from '../../../utils/compute/computePool'
import { frameOfDefinition } from '../../../utils/scales/ladderFrame'
import { LadderSaveSchema } from '../../../../shared/schemas/scaleRequests'
import { once } from '../../../utils/http/requestKeys'

// Editors save the scale ladder. The schema refuses numbers over the size budget; the engine
// computes the rest in the compute pool first (a bad ratio or an unknown name
// is a 422 before anything is written); the version check turns a concurrent edit into a 409.
export default defineApiHandler(async (event) => {
  const body = await readJson(event, LadderSaveSchema)
  const theory = await theoryOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, theory.group_id, 'editor')
  const computed = await compute('ladder', { doc: body.ladder, frame: frameOfDefinition(theory.definition) }, user.id)
  return once(event, user.id, body, async () => ({ ladder: body.ladder, version: await saveLadder(theory.id, body.ladder, body.version, user.id), computed }))
})
