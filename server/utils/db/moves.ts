import type { Knex } from 'knex'
import { fail } from '../http/apiHandler'
import { withBoardLock } from './boardLock'
import { classOperators, requiredRank, storeCoverage, type BoardOperatorRow } from './boardMath'
import { coverageOf, keptRank, rewriteOnto } from '../../engine/board/keptSet'

type Column = 'kept' | 'set_aside'
interface MoveRequest { column: Column, position: number, version: number }
interface OperatorRef { id: number, basis_id: number, order: number, class_key: string }

/**
 * Move an operator within its order, under the order's board lock (boardLock.ts): the version
 * check, the rank check of a keep, the new positions, the class's coverage and the set-aside
 * rewrite are all computed on the same stored state, before anything is committed. A
 * collaborator's move of the same operator is a reported conflict; moves of other operators
 * merge, since positions are recomputed from what is stored now.
 */
export function moveOperator(op: OperatorRef, body: MoveRequest, userId: number) {
  return withBoardLock(op.basis_id, [op.order], async (trx) => {
    const current = await trx('operators as o').leftJoin('users as u', 'u.id', 'o.moved_by').where('o.id', op.id).first('o.column', 'o.version', 'u.display_name as mover')
    if (current.version !== body.version) {
      fail(409, `${current.mover ?? 'A collaborator'} moved this operator meanwhile (to ${current.column === 'kept' ? 'kept' : 'set aside'}); the board shows it where it is now`)
    }
    const ops = (await classOperators(trx, op.basis_id, op.class_key)).map((o) => (o.id === op.id ? { ...o, column: body.column } : o))
    const required = await requiredRank(trx, op.basis_id, op.class_key)
    if (body.column === 'kept' && current.column !== 'kept') refuseRedundantKeep(ops, op, required)
    // Everything that can fail is computed before the first write: an error never follows a saved move.
    const coverage = coverageOf(op.class_key, ops, required)
    const rewrite = body.column === 'set_aside' ? rewriteOnto(ops, op.id) : null
    const moved = await placeOperator(trx, op, current.column, body, userId)
    await storeCoverage(trx, op.basis_id, { [op.class_key]: { rank: coverage.rank, required, complete: coverage.complete } })
    return { operator: moved, coverage, rewrite }
  })
}

/** 409 when the operator depends on the class's other kept operators (or the class has enough); says why. */
function refuseRedundantKeep(ops: BoardOperatorRow[], op: OperatorRef, required: number) {
  const others = ops.filter((o) => o.column === 'kept' && o.id !== op.id)
  const withIt = [...others, ops.find((o) => o.id === op.id)!]
  const printed = withIt.every((o) => o.fingerprint)
  if (printed ? keptRank(withIt) > keptRank(others) : others.length < required) return
  const named = others.slice(0, 3).map((o) => o.text || `#${o.id}`).join(', ') + (others.length > 3 ? ', …' : '')
  const why = !printed ? `the class needs ${required} kept operator${required === 1 ? '' : 's'} and has ${others.length} already`
    : others.length ? `it is a combination of the kept operator${others.length === 1 ? '' : 's'} ${named}` : 'it vanishes modulo equations of motion and integration by parts'
  fail(409, `Keeping this operator would make the kept set of class ${op.class_key} redundant: ${why}. Set one of them aside first.`)
}

/**
 * Write the operator's new column and position, and renumber both columns it touches from 0
 * (one statement for the others); bumps its version. Returns the moved operator.
 */
async function placeOperator(trx: Knex.Transaction, op: OperatorRef, from: Column, body: MoveRequest, userId: number) {
  const rows = await trx('operators').where({ basis_id: op.basis_id, order: op.order }).whereIn('column', [from, body.column])
    .orderBy(['position', 'id']).select('id', 'column', 'position')
  const target = rows.filter((r) => r.column === body.column && r.id !== op.id).map((r) => r.id as number)
  target.splice(Math.min(body.position, target.length), 0, op.id)
  const source = from === body.column ? [] : rows.filter((r) => r.column === from && r.id !== op.id).map((r) => r.id as number)
  const wanted = new Map([...target.entries(), ...source.entries()].map(([i, id]) => [id, i]))
  const changed = rows.filter((r) => r.id !== op.id && wanted.get(r.id) !== r.position)
  if (changed.length) {
    await trx.raw('update operators o set position = x.pos from unnest(?::int[], ?::int[]) as x(id, pos) where o.id = x.id',
      [changed.map((r) => r.id), changed.map((r) => wanted.get(r.id)!)])
  }
  const [moved] = await trx('operators').where({ id: op.id })
    .update({ column: body.column, position: wanted.get(op.id)!, version: trx.raw('version + 1'), moved_by: userId, moved_at: trx.fn.now() })
    .returning(['id', 'column', 'position', 'version', 'class_key as classKey', 'order'])
  return moved
}
