import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { useDb } from '../../../utils/db/connection'
import { typedPrints, type TypedClass } from '../../../utils/board/typedPrints'
import { expressIn } from '../../../engine/board/fingerprints'
import { toString as ratString, isZero } from '../../../engine/exact/rational'
import { TypedRewriteSchema } from '../../../../shared/schemas/boardRequests'

const TWO_FIELD_ROLES = new Set(['kinetic', 'gauge kinetic', 'theta', 'mass'])

// Any member rewrites a typed operator onto the kept operators of its class (reads only).
// The class's points are recomputed in the compute pool (count lane) to place the operator there
// (utils/board/typedPrints.ts: Goldstone-frame orders up to p⁴, and every other class).
export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, basis.group_id, 'viewer')
  const body = await readJson(event, TypedRewriteSchema)
  const kept = await useDb()('operators').where({ basis_id: basis.id, class_key: body.classKey, column: 'kept' }).orderBy('position').select('id', 'latex', 'fingerprint', 'text')
  const cls = (basis.classes as (TypedClass & { role?: string })[]).find((c) => c.key === body.classKey)
  if (!cls) fail(404, `This basis has no class "${body.classKey}"; choose one of the classes shown on the board`)
  // Order 0's two-field classes (kinetic, gauge kinetic, θ and mass terms) are written by hand: no contact amplitude to compare.
  if (cls!.role && TWO_FIELD_ROLES.has(cls!.role)) return { rewrite: null, message: `The class ${body.classKey} has two fields (its ${cls!.role} terms): a two-field operator has no contact amplitude, so the board writes these terms by hand and cannot rewrite a typed one; terms that differ by equations of motion and integration by parts are the same here` }
  if (kept.some((k) => !k.fingerprint)) fail(409, 'This basis was stored without fingerprints; run it again to rewrite typed operators')
  // The run's frozen theory file fixed the sample points; the theory may have been edited since.
  const run = basis.run_id ? await useDb()('runs').where({ id: basis.run_id }).first('params') : null
  const theory = run?.params?.theory ?? basis.theory_definition
  const prints = await typedPrints({ theory, cls: cls!, kept, text: body.text, version: basis.fingerprint_version, priorities: run?.params?.priorities, userId: user.id })
  const combo = expressIn(prints.kept, prints.typed)
  if (!combo) return { rewrite: null, message: 'Not a combination of the kept operators: the kept set does not cover it (coverage incomplete)' }
  const terms = combo.coefficients.map((c, i) => ({ c, k: kept[i]! })).filter(({ c }) => !isZero(c))
    .map(({ c, k }) => ({ operatorId: k.id, latex: k.latex, coefficient: ratString(c) }))
  // timesI: the typed operator's amplitude is i times the combination (a dual, σ^{μν} or an explicit i).
  return { rewrite: { vanishes: terms.length === 0, terms, timesI: (prints.typed as { timesI?: boolean }).timesI === true } }
})
