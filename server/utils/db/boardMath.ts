import type { Knex } from 'knex'
import { useDb } from './connection'
import { withBoardLock } from './boardLock'
import { compute } from '../compute/computePool'
import type { ClassOperator, Rewrite } from '../../engine/board/keptSet'
import type { CoverageMap } from '../../worker/boardTasks'

export type { Rewrite, CoverageMap }
/** Who asks for board math (counted against their limits in the compute pool); a share link asks as `share:<theory id>`. */
export interface BoardCaller {
  user: string | number
  group: number
}
export interface BoardOperatorRow extends ClassOperator {
  class_key: string
  order: number
  position: number
  version: number
}

const COLUMNS = ['id', 'latex', 'text', 'column', 'fingerprint', 'class_key', 'order', 'position', 'version']

/** The operators of one class (both columns), by column and position. */
export function classOperators(db: Knex, basisId: number, classKey: string): Promise<BoardOperatorRow[]> {
  return db('operators').where({ basis_id: basisId, class_key: classKey }).orderBy(['column', 'position']).select(COLUMNS)
}

/** Every operator of a basis, by order, column and position. */
export function basisOperators(db: Knex, basisId: number): Promise<BoardOperatorRow[]> {
  return db('operators').where({ basis_id: basisId }).orderBy(['order', 'column', 'position', 'id']).select(COLUMNS)
}

/** The number of independent operators a class needs (its rank in the stored basis). */
export async function requiredRank(db: Knex, basisId: number, classKey: string): Promise<number> {
  const { rows } = await db.raw("select (c->>'rank')::int as rank from bases b, jsonb_array_elements(b.classes) c where b.id = ? and c->>'key' = ?", [basisId, classKey])
  return rows[0]?.rank ?? 0
}

/** The operator written in terms of the kept operators of its class (a read; see keptSet.ts), computed in the compute pool. */
export async function rewriteOntoKept(basisId: number, classKey: string, operatorId: number, caller: BoardCaller): Promise<Rewrite | null> {
  const ops = await classOperators(useDb(), basisId, classKey)
  return compute('rewriteOnto', { ops, operatorId }, caller.user, caller.group)
}

/** A class as bases.classes stores it (the parts the board's math reads). */
/** A class as stored with its basis: every class carries its order (migration 021 added it to old ones). */
export interface StoredClass {
  key: string
  rank: number
  order: number
  dimension?: number | null
}

/** Coverage of every class of a basis, keyed by class key: stored, or computed (compute pool) and stored. */
export async function coverageOfClasses(basisId: number, classes: StoredClass[], caller: BoardCaller): Promise<CoverageMap> {
  const row = await useDb()('bases').where({ id: basisId }).first('coverage')
  const stored = (row?.coverage ?? {}) as CoverageMap
  if (classes.every((c) => stored[c.key])) return stored
  return withBoardLock(basisId, ordersOfClasses(classes), (trx) => recomputeCoverage(trx, basisId, classes, caller))
}

/** The distinct orders of the given classes (stored with their order, or a mass dimension). */
export function ordersOfClasses(classes: StoredClass[]): number[] {
  return [...new Set(classes.map((c) => c.order))]
}

/**
 * Recompute (compute pool) and store the coverage of the given classes, inside the caller's
 * transaction under the board lock: the math runs before the write, off the event loop.
 */
export async function recomputeCoverage(db: Knex, basisId: number, classes: { key: string; rank: number }[], caller: BoardCaller): Promise<CoverageMap> {
  const out = await compute('coverage', { ops: await basisOperators(db, basisId), classes }, caller.user, caller.group)
  await storeCoverage(db, basisId, out)
  return out
}

/**
 * Merge class coverages into the stored map and bump the basis version (a board cached
 * before this change must not survive it). Call it last in a transaction: it locks the basis row.
 */
export async function storeCoverage(db: Knex, basisId: number, part: CoverageMap) {
  await db('bases')
    .where({ id: basisId })
    .update({ coverage: db.raw('coverage || ?::jsonb', [JSON.stringify(part)]), version: db.raw('version + 1') })
}
