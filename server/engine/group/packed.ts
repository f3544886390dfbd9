/**
 * Packed weights for the hot loop of characterProduct: a weight vector w (length L) is encoded
 * as the number Σ_i w_i B^i with balanced digits |w_i| <= (B-1)/2, B the largest odd base with
 * B^L <= 2^52. The encoding is linear, so adding weights (tensor products) adds the numbers.
 * Characters whose weights could overflow a digit fall back to string keys.
 */
import { EngineInputError } from '../errors'
import type { Character } from './types'
import { formatWeightKey, keySeparators, parseWeightKey } from './labels'

/** Decode a packed weight (balanced base-B digits) into its key. */
function unpackKey(x: number, base: number, length: number, separators: string): string {
  const w = new Array<number>(length)
  const half = (base - 1) / 2
  for (let i = 0; i < length; i++) {
    let d = x % base
    if (d > half) d -= base
    else if (d < -half) d += base
    w[i] = d
    x = (x - d) / base
  }
  return formatWeightKey(w, separators)
}

interface FixedPacked {
  x: number
  maxAbs: number
}

const fixedBases = new Map<number, number>()
const fixedPacked = new Map<string, FixedPacked>()
const fixedUnpacked = new Map<string, Map<number, string>>()

function fixedBase(length: number): number {
  let b = fixedBases.get(length)
  if (b === undefined) {
    b = Math.floor(2 ** (52 / length))
    if (b % 2 === 0) b--
    while (length * Math.log2(b) > 52) b -= 2
    fixedBases.set(length, b)
  }
  return b
}

function fixedPack(key: string): FixedPacked {
  let v = fixedPacked.get(key)
  if (v) return v
  const w = parseWeightKey('characterProduct', key)
  const base = fixedBase(w.length)
  let x = 0
  let maxAbs = 0
  for (let i = w.length - 1; i >= 0; i--) {
    x = x * base + w[i]!
    maxAbs = Math.max(maxAbs, Math.abs(w[i]!))
  }
  v = { x, maxAbs }
  if (fixedPacked.size > 2_000_000) fixedPacked.clear()
  fixedPacked.set(key, v)
  return v
}

/** Decoder of packed weights with a cache per (length, separator pattern). */
function unpacker(length: number, separators: string): (x: number) => string {
  const id = `${length}|${separators}`
  let cache = fixedUnpacked.get(id)
  if (!cache) fixedUnpacked.set(id, (cache = new Map<number, string>()))
  const c = cache
  const base = fixedBase(length)
  return (x) => {
    const hit = c.get(x)
    if (hit !== undefined) return hit
    const key = unpackKey(x, base, length, separators)
    if (c.size > 2_000_000) c.clear()
    c.set(x, key)
    return key
  }
}

/**
 * Fast path of characterProduct on packed numbers; null when the two characters do not share
 * one key shape or their weights could overflow the fixed packing (the caller then uses keys).
 */
export function fixedPackedProduct(a: Character, b: Character): Character | null {
  const out: Character = new Map()
  if (a.size === 0 || b.size === 0) return out
  const first = a.keys().next().value!
  const seps = keySeparators(first)
  const length = parseWeightKey('characterProduct', first).length
  const half = (fixedBase(length) - 1) / 2
  const pa: number[] = []
  const ma: number[] = []
  let boundA = 0
  for (const [k, m] of a) {
    if (keySeparators(k) !== seps) return null
    const p = fixedPack(k)
    pa.push(p.x)
    ma.push(m)
    boundA = Math.max(boundA, p.maxAbs)
  }
  const pb: number[] = []
  const mb: number[] = []
  let boundB = 0
  for (const [k, m] of b) {
    if (keySeparators(k) !== seps) return null
    const p = fixedPack(k)
    pb.push(p.x)
    mb.push(m)
    boundB = Math.max(boundB, p.maxAbs)
  }
  if (boundA + boundB > half) return null
  const acc = new Map<number, number>()
  const LIMIT = Number.MAX_SAFE_INTEGER
  for (let i = 0; i < pa.length; i++) {
    const xa = pa[i]!
    const m1 = ma[i]!
    for (let j = 0; j < pb.length; j++) {
      const x = xa + pb[j]!
      const v = (acc.get(x) ?? 0) + m1 * mb[j]!
      if (v > LIMIT || v < -LIMIT)
        throw new EngineInputError('characterProduct', 'A weight multiplicity grows beyond 2^53, past exact arithmetic; lower the maximum dimension or the number of flavors')
      acc.set(x, v)
    }
  }
  const decode = unpacker(length, seps)
  for (const [x, m] of acc) if (m !== 0) out.set(decode(x), m)
  return out
}
