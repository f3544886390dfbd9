import { defineApiHandler, created } from '../../../utils/http/apiHandler'
import { intParam, readJson } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404, publicTheory } from '../../../utils/db/theories'
import { createChildTheory } from '../../../utils/db/towers'
import { compute } from '../../../utils/compute/computePool'
import { IntegrateOutSchema } from '../../../../shared/schemas/scaleRequests'
import { once } from '../../../utils/http/requestKeys'

// Editors integrate heavy fields out at a threshold scale: the child theory joins the group,
// linked to its parent, with the threshold tags of the gauge kinetic terms the fields shift.
export default defineApiHandler(async (event) => {
  const body = await readJson(event, IntegrateOutSchema)
  const parent = await theoryOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, parent.group_id, 'editor')
  // The step (and the check that the theory left below is valid) is computed in the compute pool.
  const step = await compute('integrateOut', { parent: parent.definition, fields: body.fields, scale: body.scale }, user.id, parent.group_id)
  return once(event, user.id, body, async () => {
    const { child, tags } = await createChildTheory(parent, step, body.fields, user.id)
    created(event)
    return { theory: publicTheory(child), thresholdTags: tags, generatedClasses: step.generatedClasses, thresholdScale: step.thresholdScale }
  })
})
