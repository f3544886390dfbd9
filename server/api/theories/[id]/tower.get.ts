import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { thresholdTagsOf, towerOf } from '../../../utils/db/towers'
import { applicableMatching } from '../../../utils/scales/applicableMatching'
import { generatedClassHints } from '../../../engine/scales/generatedClasses'
import type { Theory } from '../../../../shared/schemas/theory'

// The tower through a theory (root first), each step's threshold, threshold tags and the
// worked matching results that apply to it. Everyone in the group reads it.
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { role } = await requireGroupRole(event, theory.group_id, 'viewer')
  const nodes = await towerOf(theory)
  const tags = await thresholdTagsOf(nodes.map((n) => n.id))
  const byId = new Map(nodes.map((n) => [n.id, n]))
  return {
    theoryId: theory.id,
    role,
    nodes: nodes.map(({ definition, ...n }) => {
      const parent = n.parentId ? byId.get(n.parentId) : undefined
      const scaleText = n.threshold ? `${n.threshold.name ? `${n.threshold.name} = ` : ''}${n.threshold.scale} ${n.threshold.unit}` : ''
      return {
        ...n,
        fields: ((definition as Theory).fields ?? []).map((f) => f.name),
        thresholdTags: tags[n.id] ?? [],
        matching: parent && n.threshold ? applicableMatching(parent.definition as Theory, n.threshold.removedFields, scaleText) : [],
        generatedClasses: parent && n.threshold ? hints(parent.definition as Theory, n.threshold.removedFields) : [],
      }
    }),
  }
})

function hints(parent: Theory, removed: string[]) {
  return parent.fields.filter((f) => removed.includes(f.name)).flatMap((f) => generatedClassHints(f, parent.groups))
}
