import { useDb } from './connection'
import { fail } from '../http/apiHandler'

// Deleting marks a row (deleted_at, deleted_by); every read hides it (live.ts and the *Or404
// helpers); undo clears the mark. Rows under a deleted theory or group stay as they are and
// come back with it.
export type Deletable = 'annotations' | 'tags' | 'theories' | 'bases' | 'groups'

/** Mark a row deleted by `userId` (a row already marked keeps its first mark). */
export async function markDeleted(table: Deletable, id: number, userId: number) {
  await useDb()(table).where({ id }).whereNull('deleted_at').update({ deleted_at: useDb().fn.now(), deleted_by: userId })
}

/** Undo a deletion. A theory whose name another theory of the group took meanwhile stays deleted (409). */
export async function restoreDeleted(table: Deletable, id: number) {
  await useDb()(table)
    .where({ id })
    .update({ deleted_at: null, deleted_by: null })
    .catch((e: { code?: string }) => {
      if (e.code === '23505') fail(409, "Another theory of the group now has this theory's name; rename that one first, then restore this one")
      throw e
    })
}
