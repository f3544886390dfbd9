import { useDb } from './connection'
import { fail } from '../http/apiHandler'

export interface TheoryRow {
  id: number
  group_id: number
  name: string
  definition: unknown
  version: number
  parent_id: number | null
  threshold: unknown
  created_by: number | null
  created_at: Date
  updated_at: Date
  deleted_at?: Date | null
}

export function theoriesOfGroup(groupId: number) {
  return useDb()('theories').where({ group_id: groupId }).whereNull('deleted_at').orderBy('name').select('id', 'name', 'version', 'parent_id as parentId', 'updated_at as updatedAt')
}

/** A theory of a group that is not deleted; the theory itself may be deleted only with `deleted` (for undo). */
export async function theoryOr404(id: number, opts: { deleted?: boolean } = {}): Promise<TheoryRow> {
  const q = useDb()('theories as t').join('groups as g', 'g.id', 't.group_id').whereNull('g.deleted_at').where('t.id', id)
  if (!opts.deleted) q.whereNull('t.deleted_at')
  const row = await q.first('t.*')
  if (!row) fail(404, `No theory with id ${id}`)
  return row
}

export function publicTheory(row: TheoryRow) {
  return {
    id: row.id,
    groupId: row.group_id,
    name: row.name,
    definition: row.definition,
    version: row.version,
    parentId: row.parent_id,
    threshold: row.threshold,
    updatedAt: row.updated_at,
  }
}
