import type { Knex } from 'knex'
import { useDb } from './connection'
import { fail } from '../http/apiHandler'

// Namespace of the two-key advisory locks that make board edits of one order of one basis
// happen one after the other (the second key is a hash of basis and order).
const BOARD_LOCK = 12_090
// How long an edit waits for the edits ahead of it before it gives up with a 409.
const LOCK_WAIT = '10s'
// SQLSTATE lock_not_available (lock_timeout), deadlock_detected, serialization_failure.
const GAVE_UP = new Set(['55P03', '40P01', '40001'])

/** 32-bit FNV-1a of basis and order, as a signed int4 (the lock's second key). */
function lockKey(basisId: number, order: number): number {
  let h = 0x811c9dc5
  for (const ch of `${basisId}:${order}`) h = Math.imul(h ^ ch.charCodeAt(0), 0x01000193)
  return h | 0
}

/**
 * Run `work` in one transaction that first takes the board lock of each given order of the
 * basis. Every writer of operator columns and positions goes through here, and takes its locks
 * before any row lock, in ascending key order: so edits of one order are serialisable (the rank
 * check and the move see the same kept set) and cannot deadlock. A wait beyond LOCK_WAIT
 * answers 409 with nothing changed.
 */
export async function withBoardLock<T>(basisId: number, orders: number[], work: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
  const keys = [...new Set(orders.map((o) => lockKey(basisId, o)))].sort((a, b) => a - b)
  try {
    return await useDb().transaction(async (trx) => {
      await trx.raw("select set_config('lock_timeout', ?, true)", [LOCK_WAIT])
      for (const key of keys) await trx.raw('select pg_advisory_xact_lock(?, ?)', [BOARD_LOCK, key])
      return work(trx)
    })
  } catch (error) {
    if (GAVE_UP.has((error as { code?: string }).code ?? '')) {
      fail(
        409,
        `Many edits of ${orders.length === 1 ? `order ${orders[0]}` : 'this basis'} are being saved at once, and this one waited too long for its turn. Nothing was changed; try again in a moment.`,
      )
    }
    throw error
  }
}
