import { useDb } from './connection'
import { fail } from '../http/apiHandler'

export interface TheoryRow {
  id: number, group_id: number, name: string, definition: unknown, version: number,
  parent_id: number | null, threshold: unknown, created_by: number | null, created_at: Date, updated_at: Date
}

export function theoriesOfGroup(groupId: number) {
  return useDb()('theories').where({ group_id: groupId }).orderBy('name')
    .select('id', 'name', 'version', 'parent_id as parentId', 'updated_at as updatedAt')
}

export async function theoryOr404(id: number): Promise<TheoryRow> {
  const row = await useDb()('theories').where({ id }).first()
  if (!row) fail(404, `No theory with id ${id}`)
  return row
}

export function publicTheory(row: TheoryRow) {
  return {
    id: row.id, groupId: row.group_id, name: row.name, definition: row.definition, version: row.version,
    parentId: row.parent_id, threshold: row.threshold, updatedAt: row.updated_at,
  }
}
