import { useDb } from './connection'
import { fail } from '../http/apiHandler'
import { NOTES_PER_AUTHOR, NOTES_PER_TARGET } from '../../../shared/schemas/theoryRequests'
import { liveTheories } from './live'

/**
 * The notes of a theory that are not deleted, oldest first, with their author: the account's
 * name, or the name an imported file gave when it is no account here (`authorImported`).
 */
export function annotationsOfTheory(theoryId: number) {
  return useDb()('annotations as a')
    .leftJoin('users as u', 'u.id', 'a.author_id')
    .where('a.theory_id', theoryId)
    .whereNull('a.deleted_at')
    .orderBy('a.created_at')
    .select(
      'a.id',
      'a.operator_id as operatorId',
      'a.body',
      'a.created_at as createdAt',
      'a.updated_at as updatedAt',
      'a.author_id as authorId',
      useDb().raw('coalesce(u.display_name, a.author_name) as "authorName"'),
      useDb().raw('(a.author_id is null and a.author_name is not null) as "authorImported"'),
    )
}

/** A note of a visible theory; a deleted note only with `deleted` (for undo). */
export async function annotationOr404(id: number, opts: { deleted?: boolean } = {}) {
  const q = liveTheories(useDb()('annotations as a').join('theories as t', 't.id', 'a.theory_id')).where('a.id', id)
  if (!opts.deleted) q.whereNull('a.deleted_at')
  const row = await q.first('a.*', 't.group_id')
  if (!row) fail(404, `No note with id ${id}`)
  return row as { id: number; theory_id: number; operator_id: number | null; author_id: number | null; body: string; group_id: number; deleted_at: Date | null }
}

// Namespace of the two-key advisory locks taken per theory while its notes are counted.
const NOTES_LOCK = 12_001

/**
 * Write a note unless a cap is reached (409): NOTES_PER_AUTHOR by one member on the theory,
 * NOTES_PER_TARGET on one operator (or on the theory itself); deleted notes do not count. Counted and inserted under a
 * lock per theory, so parallel posts cannot pass a cap together.
 */
export async function addNote(input: { theoryId: number; operatorId: number | null; authorId: number; body: string }) {
  return useDb().transaction(async (trx) => {
    await trx.raw('select pg_advisory_xact_lock(?, ?)', [NOTES_LOCK, input.theoryId])
    const [counts] = await trx('annotations')
      .where({ theory_id: input.theoryId })
      .whereNull('deleted_at')
      .select(
        trx.raw('count(*) filter (where author_id = ?)::int as by_author', [input.authorId]),
        trx.raw('count(*) filter (where operator_id is not distinct from ?)::int as on_target', [input.operatorId]),
      )
    if (counts.by_author >= NOTES_PER_AUTHOR) fail(409, `You have written ${NOTES_PER_AUTHOR} notes on this theory, the most one member may; delete old ones first`)
    if (counts.on_target >= NOTES_PER_TARGET) {
      fail(409, `This ${input.operatorId ? 'operator' : 'theory'} already carries ${NOTES_PER_TARGET} notes, the most it may; edit or delete an old note instead`)
    }
    const [row] = await trx('annotations')
      .insert({ theory_id: input.theoryId, operator_id: input.operatorId, author_id: input.authorId, body: input.body })
      .returning(['id', 'body', 'operator_id as operatorId', 'created_at as createdAt', 'updated_at as updatedAt'])
    return row as { id: number; body: string; operatorId: number | null; createdAt: Date; updatedAt: Date }
  })
}
