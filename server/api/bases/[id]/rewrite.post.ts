import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { useDb } from '../../../utils/db/connection'
import { typedRewriteOnto, type TypedClass } from '../../../utils/board/typedPrints'
import { TypedRewriteSchema } from '../../../../shared/schemas/boardRequests'

const TWO_FIELD_ROLES = new Set(['kinetic', 'gauge kinetic', 'theta', 'mass'])

// Any member rewrites a typed operator onto the kept operators of its class (reads only).
// The typed operator is placed at the class's points and solved for in the compute pool (count lane):
// utils/board/typedPrints.ts (Goldstone-frame orders up to p⁴, and every other class).
export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, basis.group_id, 'viewer')
  const body = await readJson(event, TypedRewriteSchema)
  const kept = await useDb()('operators').where({ basis_id: basis.id, class_key: body.classKey, column: 'kept' }).orderBy('position').select('id', 'latex', 'fingerprint', 'text')
  const cls = (basis.classes as TypedClass[]).find((c) => c.key === body.classKey)
  if (!cls) fail(404, `This basis has no class "${body.classKey}"; choose one of the classes shown on the board`)
  // Order 0's two-field classes (kinetic, gauge kinetic, θ and mass terms) are written by hand: no contact amplitude to compare.
  if (cls!.role && TWO_FIELD_ROLES.has(cls!.role))
    return {
      rewrite: null,
      message: `The class ${body.classKey} has two fields (its ${cls!.role} terms): a two-field operator has no contact amplitude, so the board writes these terms by hand and cannot rewrite a typed one; terms that differ by equations of motion and integration by parts are the same here`,
    }
  if (kept.some((k) => !k.fingerprint)) fail(409, 'This basis was stored without fingerprints; run it again to rewrite typed operators')
  // The run's frozen theory file fixed the sample points; the theory may have been edited since.
  const run = basis.run_id ? await useDb()('runs').where({ id: basis.run_id }).first('params') : null
  const theory = run?.params?.theory ?? basis.theory_definition
  const keptRows = kept.map((k) => ({ id: k.id as number, latex: k.latex as string, text: k.text as string, fingerprint: k.fingerprint }))
  const rewrite = await typedRewriteOnto({
    theory,
    cls: cls!,
    kept: keptRows,
    text: body.text,
    version: basis.fingerprint_version,
    priorities: run?.params?.priorities,
    userId: user.id,
    groupId: basis.group_id,
  })
  if (!rewrite) return { rewrite: null, message: 'Not a combination of the kept operators: the kept set does not cover it (coverage incomplete)' }
  return { rewrite }
})
