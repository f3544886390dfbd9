import { useDb } from './connection'
import { fail } from '../http/apiHandler'
import type { LadderDocument } from '../../../shared/schemas/scaleRequests'

export interface StoredLadder {
  ladder: LadderDocument
  version: number
  updatedAt: Date | null
  updatedBy: string | null
}

/** The theory's stored scale ladder, or null when none was saved yet. */
export async function ladderOf(theoryId: number): Promise<StoredLadder | null> {
  const row = await useDb()('scale_ladders as s').leftJoin('users as u', 'u.id', 's.updated_by').where('s.theory_id', theoryId).first('s.ladder', 's.version', 's.updated_at', 'u.display_name')
  return row ? { ladder: row.ladder, version: row.version, updatedAt: row.updated_at, updatedBy: row.display_name ?? null } : null
}

/**
 * Save a ladder under optimistic concurrency: version 0 creates it (409 when a collaborator
 * created one meanwhile), version n replaces version n (409 naming the newer version otherwise).
 */
export async function saveLadder(theoryId: number, ladder: LadderDocument, version: number, userId: number): Promise<number> {
  const db = useDb()
  const json = JSON.stringify(ladder)
  if (version === 0) {
    const rows = await db('scale_ladders').insert({ theory_id: theoryId, ladder: json, version: 1, updated_by: userId }).onConflict('theory_id').ignore().returning('version')
    if (rows.length) return rows[0].version
  } else {
    const rows = await db('scale_ladders')
      .where({ theory_id: theoryId, version })
      .update({ ladder: json, version: version + 1, updated_by: userId, updated_at: db.fn.now() })
      .returning('version')
    if (rows.length) return rows[0].version
  }
  const current = await ladderOf(theoryId)
  if (!current) fail(409, `This theory has no scale ladder yet; save it as a new ladder (version 0), not version ${version}`)
  return fail(
    409,
    `The scale ladder changed meanwhile (now version ${current.version}${current.updatedBy ? `, saved by ${current.updatedBy}` : ''}; you edited version ${version}); reload and apply your change again`,
  )
}
