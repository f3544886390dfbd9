import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { operatorOr404 } from '../../../utils/db/bases'
import { moveOperator } from '../../../utils/db/moves'
import { classCoverage, rewriteOntoKept, storeCoverage } from '../../../utils/db/boardMath'
import { MoveSchema } from '../../../../shared/schemas/boardRequests'
import { basisOr404 } from '../../../utils/db/bases'

// Editors move an operator between kept and set aside. Moving into kept an operator that the
// kept ones already span is refused with the operators it depends on; moving one out answers
// with its rewrite in terms of those that stay.
export default defineApiHandler(async (event) => {
  const op = await operatorOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, op.group_id, 'editor')
  const body = await readJson(event, MoveSchema)
  if (body.column === 'kept' && op.column !== 'kept') {
    const dependsOn = await rewriteOntoKept(op.basis_id, op.class_key, op.id)
    if (dependsOn) fail(409, `Keeping this operator would make the kept set redundant: it ${dependsOn.vanishes ? 'vanishes modulo equations of motion' : `is a combination of ${dependsOn.terms.length} kept operator(s)`}. Set one of them aside first.`)
  }
  const moved = await moveOperator(op, body, user.id)
  const basis = await basisOr404(op.basis_id)
  const required = (basis.classes as { key: string, rank: number }[]).find((c) => c.key === op.class_key)?.rank ?? 0
  const coverage = await classCoverage(op.basis_id, op.class_key, required)
  await storeCoverage(op.basis_id, { [op.class_key]: { rank: coverage.rank, required: coverage.required, complete: coverage.complete } })
  return {
    operator: moved,
    coverage,
    rewrite: body.column === 'set_aside' ? await rewriteOntoKept(op.basis_id, op.class_key, op.id) : null,
  }
})
