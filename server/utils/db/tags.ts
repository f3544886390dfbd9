import type { Knex } from 'knex'
import { useDb } from './connection'
import { fail } from '../http/apiHandler'
import { liveTheories } from './live'

/**
 * The tags of the given operators that are not deleted, with their author (the account's name,
 * or the name an imported file gave when it is no account here) and date.
 */
export function tagsOfOperators(operatorIds: number[]) {
  return useDb()('tags as g')
    .leftJoin('users as u', 'u.id', 'g.created_by')
    .whereIn('g.operator_id', operatorIds)
    .whereNull('g.deleted_at')
    .orderBy('g.id')
    .select(
      'g.id',
      'g.operator_id as operatorId',
      'g.kind',
      'g.label',
      'g.created_by as authorId',
      'g.created_at as createdAt',
      useDb().raw('coalesce(u.display_name, g.author_name) as "authorName"'),
      useDb().raw('(g.created_by is null and g.author_name is not null) as "authorImported"'),
    )
}

export interface NewTag {
  operatorId: number
  kind: string
  label: string
  createdBy: number | null
  authorName?: string | null
  createdAt?: Date
}

/**
 * Put a tag on an operator; a deleted identical tag comes back instead of a second row. Returns
 * null when the operator already carries it. `db` may be the caller's transaction.
 */
export async function addTag(tag: NewTag, db: Knex = useDb()) {
  const { rows } = await db.raw(
    `insert into tags (operator_id, kind, label, created_by, author_name, created_at) values (?, ?, ?, ?, ?, coalesce(?, now()))
    on conflict (operator_id, kind, label) do update set deleted_at = null, deleted_by = null, created_by = excluded.created_by,
      author_name = excluded.author_name, created_at = excluded.created_at
    where tags.deleted_at is not null
    returning id, operator_id as "operatorId", kind, label, created_by as "authorId", created_at as "createdAt"`,
    [tag.operatorId, tag.kind, tag.label, tag.createdBy, tag.authorName ?? null, tag.createdAt ?? null],
  )
  return (rows[0] ?? null) as { id: number; operatorId: number; kind: string; label: string; authorId: number | null; createdAt: Date } | null
}

/** A tag of a visible operator; a deleted tag only with `deleted` (for undo). */
export async function tagOr404(id: number, opts: { deleted?: boolean } = {}) {
  const q = liveTheories(useDb()('tags as tg').join('operators as o', 'o.id', 'tg.operator_id').join('bases as b', 'b.id', 'o.basis_id').join('theories as t', 't.id', 'b.theory_id'))
    .where('tg.id', id)
    .whereNull('b.deleted_at')
  if (!opts.deleted) q.whereNull('tg.deleted_at')
  const row = await q.first('tg.id', 'tg.operator_id', 'tg.created_by', 't.group_id')
  if (!row) fail(404, `No tag with id ${id}`)
  return row as { id: number; operator_id: number; created_by: number | null; group_id: number }
}
