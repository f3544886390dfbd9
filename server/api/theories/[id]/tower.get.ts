import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { thresholdTagsOf, towerOf } from '../../../utils/db/towers'
import { compute } from '../../../utils/compute/computePool'
import type { Theory } from '../../../../shared/schemas/theory'

// The tower through a theory (root first), each step's threshold, threshold tags and the
// worked matching results that apply to it. Everyone in the group reads it. The matching
// results and generated classes are found in the compute pool (remembered by input).
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { role, user } = await requireGroupRole(event, theory.group_id, 'viewer')
  const nodes = await towerOf(theory)
  const tags = await thresholdTagsOf(nodes.map((n) => n.id))
  const byId = new Map(nodes.map((n) => [n.id, n]))
  const below = nodes
    .map((n) => ({ n, parent: n.parentId ? byId.get(n.parentId) : undefined }))
    .filter(({ n, parent }) => parent && n.threshold)
    .map(({ n, parent }) => ({ id: n.id, parent: parent!.definition, removed: n.threshold!.removedFields, scaleText: scaleText(n.threshold!) }))
  const hints = await compute(
    'towerHints',
    below.map(({ id: _id, ...step }) => step),
    user.id,
    theory.group_id,
  )
  const hintOf = new Map(below.map((b, i) => [b.id, hints[i]!]))
  return {
    theoryId: theory.id,
    role,
    nodes: nodes.map(({ definition, ...n }) => ({
      ...n,
      fields: ((definition as Theory).fields ?? []).map((f) => f.name),
      thresholdTags: tags[n.id] ?? [],
      matching: hintOf.get(n.id)?.matching ?? [],
      generatedClasses: hintOf.get(n.id)?.generatedClasses ?? [],
    })),
  }
})

function scaleText(t: { name?: string | null; scale: unknown; unit: string }) {
  return `${t.name ? `${t.name} = ` : ''}${t.scale} ${t.unit}`
}
