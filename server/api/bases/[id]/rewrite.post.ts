import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { useDb } from '../../../utils/db/connection'
import { compute } from '../../../utils/compute/computePool'
import { expressIn, type Fingerprint } from '../../../engine/board/fingerprints'
import { typedRewritePlan } from '../../../engine/board/fingerprintVersion'
import { toString as ratString, isZero } from '../../../engine/exact/rational'
import { TypedRewriteSchema } from '../../../../shared/schemas/boardRequests'

// Any member rewrites a typed operator onto the kept operators of its class (reads only).
// The class basis is recomputed in the compute pool (count lane) to place the operator at the stored points;
// when the basis's fingerprints came from sampling code that differs from the current one, its
// kept operators are fingerprinted again from their texts (engine/board/fingerprintVersion.ts).
export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, basis.group_id, 'viewer')
  const body = await readJson(event, TypedRewriteSchema)
  const kept = await useDb()('operators').where({ basis_id: basis.id, class_key: body.classKey, column: 'kept' }).orderBy('position').select('id', 'latex', 'fingerprint', 'text')
  if (!(basis.classes as { key: string }[]).some((c) => c.key === body.classKey)) fail(404, `This basis has no class "${body.classKey}"; choose one of the classes shown on the board`)
  if (kept.some((k) => !k.fingerprint)) fail(409, 'This basis was stored without fingerprints; run it again to rewrite typed operators')
  // The run's frozen theory file fixed the sample points; the theory may have been edited since.
  const run = basis.run_id ? await useDb()('runs').where({ id: basis.run_id }).first('params') : null
  const theory = run?.params?.theory ?? basis.theory_definition
  const plan = typedRewritePlan(basis.fingerprint_version, kept.map((k) => k.text as string), body.text)
  const prints = await compute('typedFingerprints', { theory, classKey: body.classKey, texts: plan.texts, priorities: run?.params?.priorities }, user.id) as Fingerprint[]
  const keptPrints = plan.useStored ? kept.map((k) => k.fingerprint as Fingerprint) : prints.slice(0, -1)
  const combo = expressIn(keptPrints, prints[prints.length - 1]!)
  if (!combo) return { rewrite: null, message: 'Not a combination of the kept operators: the kept set does not cover it (coverage incomplete)' }
  const terms = combo.coefficients.map((c, i) => ({ c, k: kept[i]! })).filter(({ c }) => !isZero(c))
    .map(({ c, k }) => ({ operatorId: k.id, latex: k.latex, coefficient: ratString(c) }))
  return { rewrite: { vanishes: terms.length === 0, terms } }
})
