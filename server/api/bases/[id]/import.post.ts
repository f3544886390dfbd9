import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { useDb } from '../../../utils/db/connection'
import { ImportChoiceSchema, IMPORT_MAX_BYTES } from '../../../../shared/schemas/importChoice'
import { recomputeCoverage } from '../../../utils/db/boardMath'

// Editors apply a kept/set-aside choice from a JSON export. Operators are matched by class and
// text; one unmatched entry refuses the whole import (nothing is changed).
export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, basis.group_id, 'editor')
  const body = await readJson(event, ImportChoiceSchema, IMPORT_MAX_BYTES)
  return useDb().transaction(async (trx) => {
    const rows = await trx('operators').where({ basis_id: basis.id }).forUpdate().select('id', 'order', 'class_key', 'text', 'column')
    const byKey = new Map(rows.map((r) => [`${r.order}|${r.class_key}|${r.text}`, r]))
    const wanted = body.orders.flatMap((o) => o.classes.flatMap((c) => c.operators.map((op) => ({ key: `${o.order}|${c.key}|${op.text}`, column: op.column }))))
    const missing = wanted.filter((w) => !byKey.has(w.key))
    if (missing.length) fail(422, `${missing.length} operator(s) of the file are not in this basis, e.g. ${missing[0]!.key.split('|').slice(1).join(': ')}`)
    let changed = 0
    const position = new Map<string, number>()
    for (const w of wanted) {
      const row = byKey.get(w.key)!
      const slot = `${row.order}|${w.column}`
      const pos = position.get(slot) ?? 0
      position.set(slot, pos + 1)
      if (row.column !== w.column) changed++
      await trx('operators').where({ id: row.id }).update({ column: w.column, position: pos, version: trx.raw('version + 1'), moved_by: user.id, moved_at: trx.fn.now() })
    }
    await trx('bases').where({ id: basis.id }).increment('version', 1)
    return { matched: wanted.length, changed }
  }).then(async (result) => {
    await recomputeCoverage(basis.id, basis.classes as { key: string, rank: number }[])
    return result
  })
})
