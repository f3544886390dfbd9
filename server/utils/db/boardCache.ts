import { useDb } from './connection'

// Board data serialised once per basis version. Every change that the board shows (moves,
// imports, tags, notes) bumps bases.version, so a cached entry is valid exactly while the
// stored version matches; several server processes each keep their own copy.
const cache = new Map<number, { version: number, json: string }>()
const LIMIT = 64

export function cachedBoard(basisId: number, version: number): string | undefined {
  const hit = cache.get(basisId)
  return hit && hit.version === version ? hit.json : undefined
}

export function storeBoard(basisId: number, version: number, json: string) {
  if (cache.size >= LIMIT) cache.delete(cache.keys().next().value!)
  cache.set(basisId, { version, json })
}

/** Mark the boards that show an operator (tags) or a theory's notes as changed. */
export async function touchBasesOfOperator(operatorId: number) {
  await useDb()('bases').whereIn('id', useDb()('operators').where({ id: operatorId }).select('basis_id')).increment('version', 1)
}
export async function touchBasesOfTheory(theoryId: number) {
  await useDb()('bases').where({ theory_id: theoryId }).increment('version', 1)
}
