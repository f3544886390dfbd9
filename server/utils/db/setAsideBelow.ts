import { useDb } from './connection'

/** The distinct orders that have operators in a basis, ascending. */
export async function ordersOfBasis(basisId: number): Promise<number[]> {
  const rows = await useDb()('operators').where({ basis_id: basisId }).distinct('order').orderBy('order')
  return rows.map((r) => r.order as number)
}

/**
 * Move every kept operator of the given orders to set aside, in one transaction: each moved
 * operator goes to the end of its order's set-aside column and its version is bumped, and the
 * basis version is bumped once. Returns how many moved and the new basis version.
 */
export async function setAsideOrders(basisId: number, orders: number[], userId: number) {
  return useDb().transaction(async (trx) => {
    const basis = await trx('bases').where({ id: basisId }).forUpdate().first('version')
    if (!orders.length) return { count: 0, basisVersion: basis.version as number }
    const kept = await trx('operators').where({ basis_id: basisId, column: 'kept' }).whereIn('order', orders)
      .orderBy(['order', 'position']).forUpdate().select('id', 'order')
    if (!kept.length) return { count: 0, basisVersion: basis.version as number }
    const ends = await trx('operators').where({ basis_id: basisId, column: 'set_aside' }).whereIn('order', orders)
      .groupBy('order').select('order').max('position as last')
    const next = new Map<number, number>(ends.map((e) => [e.order, Number(e.last) + 1]))
    for (const op of kept) {
      const position = next.get(op.order) ?? 0
      next.set(op.order, position + 1)
      await trx('operators').where({ id: op.id })
        .update({ column: 'set_aside', position, version: trx.raw('version + 1'), moved_by: userId, moved_at: trx.fn.now() })
    }
    const [row] = await trx('bases').where({ id: basisId }).increment('version', 1).returning('version')
    return { count: kept.length, basisVersion: row.version as number }
  })
}
