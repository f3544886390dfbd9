import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { useDb } from '../../../utils/db/connection'
import { compute } from '../../../utils/compute/computePool'
import { ListCheckSchema } from '../../../../shared/schemas/listCheck'

// Any member checks a pasted list of operators against one order of the basis (reads only):
// complete, independent, the exact translation into the run's kept operators, and exports.
// The classes are rebuilt in the compute pool from the run's frozen theory and priorities.
export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, basis.group_id, 'viewer')
  const body = await readJson(event, ListCheckSchema)
  const texts = body.operators.split('\n').filter((l) => l.trim() !== '')
  if (texts.length === 0) fail(422, 'The list is empty: paste one operator per line')
  if (texts.length > 400) fail(422, `The list has ${texts.length} operators; check at most 400 at a time (one order)`)
  const run = basis.run_id ? await useDb()('runs').where({ id: basis.run_id }).first('params') : null
  const theory = run?.params?.theory ?? basis.theory_definition
  if (theory?.frame && theory.frame !== 'relativistic') fail(422, 'A list check needs a relativistic theory (classes of contact amplitudes); this basis uses another frame')
  const ordersHere = (basis.classes as { order?: number }[]).map((c) => c.order)
  if (!ordersHere.includes(body.order)) fail(422, `This basis has no order ${body.order}; choose one of the orders shown on the board`)
  return await compute('checkOperatorList', { theory, dimension: body.order + 4, texts, aliases: body.aliases, priorities: run?.params?.priorities }, user.id)
})
