import { useDb } from './connection'

// Board data serialised once per basis version (and reader role), kept as ready-to-send bytes.
// Every change that the board shows (moves, imports, tags, notes) bumps bases.version, so a
// cached entry is valid exactly while the stored version matches; each server process keeps
// its own copy.
const cache = new Map<number, { version: number, json: string, bytes: Map<string, Buffer> }>()
const LIMIT = 64

/** The cached response for this reader's role, or undefined when the basis changed. */
export function cachedBoard(basisId: number, version: number, role: string): Buffer | undefined {
  const hit = cache.get(basisId)
  if (!hit || hit.version !== version) return undefined
  let bytes = hit.bytes.get(role)
  if (!bytes) {
    bytes = Buffer.from(`{"role":${JSON.stringify(role)},${hit.json.slice(1)}`)
    hit.bytes.set(role, bytes)
  }
  return bytes
}

export function storeBoard(basisId: number, version: number, json: string) {
  if (cache.size >= LIMIT) cache.delete(cache.keys().next().value!)
  cache.set(basisId, { version, json, bytes: new Map() })
}

/** Mark the boards that show an operator (tags) or a theory's notes as changed. */
export async function touchBasesOfOperator(operatorId: number) {
  await useDb()('bases').whereIn('id', useDb()('operators').where({ id: operatorId }).select('basis_id')).increment('version', 1)
}
export async function touchBasesOfTheory(theoryId: number) {
  await useDb()('bases').where({ theory_id: theoryId }).increment('version', 1)
}
