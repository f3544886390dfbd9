import type { Knex } from 'knex'
import { useDb } from './connection'
import { withBoardLock } from './boardLock'
import { coverageOf, rewriteOnto, type ClassOperator, type Rewrite } from '../../engine/board/keptSet'

export type { Rewrite }
export interface BoardOperatorRow extends ClassOperator { class_key: string, order: number, position: number, version: number }

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
  const { rows } = await db.raw('select (c->>\'rank\')::int as rank from bases b, jsonb_array_elements(b.classes) c where b.id = ? and c->>\'key\' = ?', [basisId, classKey])
  return rows[0]?.rank ?? 0
}

/** The operator written in terms of the kept operators of its class (a read; see keptSet.ts). */
export async function rewriteOntoKept(basisId: number, classKey: string, operatorId: number): Promise<Rewrite | null> {
  return rewriteOnto(await classOperators(useDb(), basisId, classKey), operatorId)
}

/** A class as bases.classes stores it (the parts the board's math reads). */
/** A class as stored with its basis: every class carries its order (migration 021 added it to old ones). */
export interface StoredClass { key: string, rank: number, order: number, dimension?: number | null }

export type CoverageMap = Record<string, { rank: number, required: number, complete: boolean }>

/** Coverage of every class of a basis, keyed by class key: stored, or computed and stored. */
export async function coverageOfClasses(basisId: number, classes: StoredClass[]): Promise<CoverageMap> {
  const row = await useDb()('bases').where({ id: basisId }).first('coverage')
  const stored = (row?.coverage ?? {}) as CoverageMap
  if (classes.every((c) => stored[c.key])) return stored
  return withBoardLock(basisId, ordersOfClasses(classes), (trx) => recomputeCoverage(trx, basisId, classes))
}

/** The distinct orders of the given classes (stored with their order, or a mass dimension). */
export function ordersOfClasses(classes: StoredClass[]): number[] {
  return [...new Set(classes.map((c) => c.order))]
}

/** Coverage of the given classes from the operators as stored now (one read for all). */
export function coverageFrom(ops: BoardOperatorRow[], classes: { key: string, rank: number }[]): CoverageMap {
  const byClass = new Map<string, BoardOperatorRow[]>()
  for (const o of ops) byClass.set(o.class_key, [...(byClass.get(o.class_key) ?? []), o])
  const out: CoverageMap = {}
  for (const c of classes) {
    const { rank, required, complete } = coverageOf(c.key, byClass.get(c.key) ?? [], c.rank)
    out[c.key] = { rank, required, complete }
  }
  return out
}

/** Recompute and store the coverage of the given classes (inside the caller's transaction). */
export async function recomputeCoverage(db: Knex, basisId: number, classes: { key: string, rank: number }[]): Promise<CoverageMap> {
  const out = coverageFrom(await basisOperators(db, basisId), classes)
  await storeCoverage(db, basisId, out)
  return out
}

/**
 * Merge class coverages into the stored map and bump the basis version (a board cached
 * before this change must not survive it). Call it last in a transaction: it locks the basis row.
 */
export async function storeCoverage(db: Knex, basisId: number, part: CoverageMap) {
  await db('bases').where({ id: basisId }).update({ coverage: db.raw('coverage || ?::jsonb', [JSON.stringify(part)]), version: db.raw('version + 1') })
}
