import { useDb } from './connection'
import { withBoardLock } from './boardLock'
import { storeCoverage, type CoverageMap, type StoredClass } from './boardMath'

/** The distinct orders that have operators in a basis, ascending. */
export async function ordersOfBasis(basisId: number): Promise<number[]> {
  const rows = await useDb()('operators').where({ basis_id: basisId }).distinct('order').orderBy('order')
  return rows.map((r) => r.order as number)
}

/**
 * Move every kept operator of the given orders to set aside, in one transaction under the
 * board locks of those orders: each moved operator goes to the end of its order's set-aside
 * column and its version is bumped; the coverage of the orders' classes is recomputed and the
 * basis version bumped. Returns how many moved and the new basis version.
 */
export async function setAsideOrders(basisId: number, orders: number[], userId: number, classes: StoredClass[]) {
  return withBoardLock(basisId, orders, async (trx) => {
    const kept = orders.length ? await trx('operators').where({ basis_id: basisId, column: 'kept' }).whereIn('order', orders).orderBy(['order', 'position']).select('id', 'order') : []
    if (kept.length) {
      const ends = await trx('operators').where({ basis_id: basisId, column: 'set_aside' }).whereIn('order', orders).groupBy('order').select('order').max('position as last')
      const next = new Map<number, number>(ends.map((e) => [e.order, Number(e.last) + 1]))
      const positions = kept.map((op) => {
        const position = next.get(op.order) ?? 0
        next.set(op.order, position + 1)
        return position
      })
      await trx.raw(
        `update operators o set "column" = 'set_aside', position = x.pos, version = o.version + 1, moved_by = ?, moved_at = now()
        from unnest(?::int[], ?::int[]) as x(id, pos) where o.id = x.id`,
        [userId, kept.map((k) => k.id), positions],
      )
      await storeCoverage(trx, basisId, emptyCoverage(classes.filter((c) => orders.includes(c.order))))
    }
    const basis = await trx('bases').where({ id: basisId }).first('version')
    return { count: kept.length, basisVersion: basis.version as number }
  })
}

/** Coverage of classes that keep no operator: rank 0, complete only where the class needs none (no engine call needed). */
function emptyCoverage(classes: StoredClass[]): CoverageMap {
  return Object.fromEntries(classes.map((c) => [c.key, { rank: 0, required: c.rank, complete: c.rank === 0 }]))
}
