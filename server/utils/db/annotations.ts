import { useDb } from './connection'
import { fail } from '../http/apiHandler'

export function annotationsOfTheory(theoryId: number) {
  return useDb()('annotations as a')
    .leftJoin('users as u', 'u.id', 'a.author_id')
    .where('a.theory_id', theoryId)
    .orderBy('a.created_at')
    .select('a.id', 'a.operator_id as operatorId', 'a.body', 'a.created_at as createdAt', 'a.updated_at as updatedAt',
      'a.author_id as authorId', 'u.display_name as authorName')
}

export async function annotationOr404(id: number) {
  const row = await useDb()('annotations as a').join('theories as t', 't.id', 'a.theory_id')
    .where('a.id', id).first('a.*', 't.group_id')
  if (!row) fail(404, `No note with id ${id}`)
  return row as { id: number, theory_id: number, operator_id: number | null, author_id: number | null, body: string, group_id: number }
}
