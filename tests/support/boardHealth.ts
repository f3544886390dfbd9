import type { Knex } from 'knex'
import { coverageRank, type Fingerprint } from '../../server/engine/board/fingerprints'

/**
 * What the board's invariants say about a stored basis, read straight from the tables: the
 * classes whose kept operators are linearly dependent (rank below their number, or more kept
 * than the class needs), and the classes whose stored coverage differs from the kept set.
 * No vitest here: the board-writes benchmark uses it too.
 */
export async function boardHealth(db: Knex, basisId: number) {
  const basis = await db('bases').where({ id: basisId }).first('classes', 'coverage')
  const kept = await db('operators').where({ basis_id: basisId, column: 'kept' }).select('class_key', 'fingerprint')
  const redundant: string[] = []
  const staleCoverage: string[] = []
  for (const c of basis.classes as { key: string; rank: number }[]) {
    const ops = kept.filter((o) => o.class_key === c.key)
    const prints = ops.map((o) => o.fingerprint as Fingerprint | null)
    const rank = prints.every((p) => p) ? coverageRank(prints as Fingerprint[]) : ops.length
    if (rank < ops.length || ops.length > c.rank) redundant.push(c.key)
    const stored = (basis.coverage as Record<string, { rank: number; required: number; complete: boolean }>)[c.key]
    if (stored && (stored.rank !== rank || stored.required !== c.rank || stored.complete !== (rank === c.rank))) staleCoverage.push(c.key)
  }
  return { redundant, staleCoverage }
}
