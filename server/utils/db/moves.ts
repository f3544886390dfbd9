import { useDb } from './connection'
import { fail } from '../http/apiHandler'

/**
 * Move an operator within its class and order (one transaction, row locks). The version check
 * makes a collaborator's move of the same operator a reported conflict; moves of other
 * operators merge, since positions are recomputed from what is stored now.
 */
export async function moveOperator(op: { id: number, basis_id: number, order: number, class_key: string }, body: { column: 'kept' | 'set_aside', position: number, version: number }, userId: number) {
  return useDb().transaction(async (trx) => {
    const current = await trx('operators as o').leftJoin('users as u', 'u.id', 'o.moved_by').where('o.id', op.id).forUpdate('o').first('o.*', 'u.display_name as mover')
    if (current.version !== body.version) {
      fail(409, `${current.mover ?? 'A collaborator'} moved this operator meanwhile (to ${current.column === 'kept' ? 'kept' : 'set aside'}); the board shows it where it is now`)
    }
    const scope = { basis_id: op.basis_id, order: op.order }
    const siblings = await trx('operators').where(scope).andWhere({ column: body.column }).whereNot({ id: op.id }).orderBy('position').forUpdate().select('id')
    const ids = siblings.map((s) => s.id)
    ids.splice(Math.min(body.position, ids.length), 0, op.id)
    for (const [i, id] of ids.entries()) {
      if (id !== op.id) await trx('operators').where({ id }).update({ position: i })
    }
    const [moved] = await trx('operators').where({ id: op.id })
      .update({ column: body.column, position: ids.indexOf(op.id), version: current.version + 1, moved_by: userId, moved_at: trx.fn.now() })
      .returning(['id', 'column', 'position', 'version', 'class_key as classKey', 'order'])
    await trx('bases').where({ id: op.basis_id }).increment('version', 1)
    return moved
  })
}
