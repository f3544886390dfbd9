import type { Knex } from 'knex'
import { fail } from '../http/apiHandler'
import { withBoardLock } from './boardLock'
import { classOperators, requiredRank, storeCoverage, type BoardCaller } from './boardMath'
import { compute } from '../compute/computePool'

type Column = 'kept' | 'set_aside'
interface MoveRequest {
  column: Column
  position: number
  version: number
}
interface OperatorRef {
  id: number
  basis_id: number
  order: number
  class_key: string
  group_id: number
}

/**
 * Move an operator within its order, under the order's board lock (boardLock.ts): the version
 * check, the rank check of a keep, the new positions, the class's coverage and the set-aside
 * rewrite are all computed on the same stored state, before anything is committed. A
 * collaborator's move of the same operator is a reported conflict; moves of other operators
 * merge, since positions are recomputed from what is stored now. The rank check, coverage and
 * rewrite run in the compute pool (its board lane) while the lock is held and before the first
 * write, so the event loop stays free and a refusal (409, or 429/422 from the pool) changes nothing.
 */
export function moveOperator(op: OperatorRef, body: MoveRequest, userId: number) {
  const caller: BoardCaller = { user: userId, group: op.group_id }
  return withBoardLock(op.basis_id, [op.order], async (trx) => {
    const current = await trx('operators as o').leftJoin('users as u', 'u.id', 'o.moved_by').where('o.id', op.id).first('o.column', 'o.version', 'u.display_name as mover')
    if (current.version !== body.version) {
      fail(409, `${current.mover ?? 'A collaborator'} moved this operator meanwhile (to ${current.column === 'kept' ? 'kept' : 'set aside'}); the board shows it where it is now`)
    }
    const ops = (await classOperators(trx, op.basis_id, op.class_key)).map((o) => (o.id === op.id ? { ...o, column: body.column } : o))
    const required = await requiredRank(trx, op.basis_id, op.class_key)
    // Everything that can fail is computed before the first write: an error never follows a saved move.
    const keeping = body.column === 'kept' && current.column !== 'kept'
    const math = await compute('moveMath', { classKey: op.class_key, ops, movedId: op.id, keeping, settingAside: body.column === 'set_aside', required }, caller.user, caller.group)
    if (math.refusal !== null) fail(409, math.refusal)
    const { coverage, rewrite } = math
    const moved = await placeOperator(trx, op, current.column, body, userId)
    await storeCoverage(trx, op.basis_id, { [op.class_key]: { rank: coverage.rank, required, complete: coverage.complete } })
    return { operator: moved, coverage, rewrite }
  })
}

/**
 * Write the operator's new column and position, and renumber both columns it touches from 0
 * (one statement for the others); bumps its version. Returns the moved operator.
 */
async function placeOperator(trx: Knex.Transaction, op: OperatorRef, from: Column, body: MoveRequest, userId: number) {
  const rows = await trx('operators').where({ basis_id: op.basis_id, order: op.order }).whereIn('column', [from, body.column]).orderBy(['position', 'id']).select('id', 'column', 'position')
  const target = rows.filter((r) => r.column === body.column && r.id !== op.id).map((r) => r.id as number)
  target.splice(Math.min(body.position, target.length), 0, op.id)
  const source = from === body.column ? [] : rows.filter((r) => r.column === from && r.id !== op.id).map((r) => r.id as number)
  const wanted = new Map([...target.entries(), ...source.entries()].map(([i, id]) => [id, i]))
  const changed = rows.filter((r) => r.id !== op.id && wanted.get(r.id) !== r.position)
  if (changed.length) {
    await trx.raw('update operators o set position = x.pos from unnest(?::int[], ?::int[]) as x(id, pos) where o.id = x.id', [changed.map((r) => r.id), changed.map((r) => wanted.get(r.id)!)])
  }
  const [moved] = await trx('operators')
    .where({ id: op.id })
    .update({ column: body.column, position: wanted.get(op.id)!, version: trx.raw('version + 1'), moved_by: userId, moved_at: trx.fn.now() })
    .returning(['id', 'column', 'position', 'version', 'class_key as classKey', 'order'])
  return moved
}
