import { gzipSync } from 'node:zlib'
import { useDb } from './connection'

// Board data serialised once per basis version (and reader role), kept as ready-to-send bytes,
// plain and gzip-compressed (about 70 KB → 7 KB for SMEFT dimension 6; writing the plain bytes
// was a third of the server's time under load). Every change that the board shows (moves,
// imports, tags, notes) bumps bases.version, so a cached entry is valid exactly while the
// stored version matches; each server process keeps its own copy.
export interface BoardBytes {
  plain: Buffer
  gzip: Buffer
}

const cache = new Map<number, { version: number; json: string; bytes: Map<string, BoardBytes> }>()
const LIMIT = 64

/** The cached response for this reader's role, or undefined when the basis changed. */
export function cachedBoard(basisId: number, version: number, role: string): BoardBytes | undefined {
  const hit = cache.get(basisId)
  if (!hit || hit.version !== version) return undefined
  let bytes = hit.bytes.get(role)
  if (!bytes) {
    const plain = Buffer.from(`{"role":${JSON.stringify(role)},${hit.json.slice(1)}`)
    bytes = { plain, gzip: gzipSync(plain) }
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
  await useDb()('bases')
    .whereIn('id', useDb()('operators').where({ id: operatorId }).select('basis_id'))
    .increment('version', 1)
}
export async function touchBasesOfTheory(theoryId: number) {
  await useDb()('bases').where({ theory_id: theoryId }).increment('version', 1)
}
