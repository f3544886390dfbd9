/**
 * Validation and conversions of SU(n) labels (Dynkin basis, partitions, ε-coordinates).
 * Partition λ of a highest weight a: λ_i = a_i + ... + a_{n-1} (λ_n = 0).
 */
import { EngineInputError } from '../errors'
import type { Dynkin } from './types'

/** Smallest and largest n of SU(n) accepted by the group engine (same range as the theory schema). */
export const MIN_N = 2
export const MAX_N = 8

/** Throw EngineInputError unless 2 <= n <= 8 is an integer. */
export function checkN(fn: string, n: number): void {
  if (!Number.isInteger(n) || n < MIN_N || n > MAX_N) {
    throw new EngineInputError(fn, `SU(n) needs a whole number n from ${MIN_N} to ${MAX_N}, but n = ${n}`)
  }
}

/** Throw EngineInputError unless dynkin is n-1 non-negative safe integers. */
export function checkDynkin(fn: string, n: number, dynkin: Dynkin): void {
  checkN(fn, n)
  if (!Array.isArray(dynkin) || dynkin.length !== n - 1) {
    throw new EngineInputError(fn, `SU(${n}) takes ${n - 1} Dynkin labels, but ${fmt(dynkin)} has ${Array.isArray(dynkin) ? dynkin.length : 0}`)
  }
  for (const a of dynkin) {
    if (!Number.isSafeInteger(a) || a < 0) {
      throw new EngineInputError(fn, `Dynkin labels must be whole numbers, 0 or more, but they are ${fmt(dynkin)}`)
    }
  }
}

/** Compact JSON rendering of a bad value for error messages. */
export function fmt(x: unknown): string {
  if (x === undefined) return 'missing'
  try {
    return JSON.stringify(x) ?? String(x)
  } catch {
    return String(x)
  }
}

/** Key of a Dynkin vector: entries joined by ','. @example dynkinKey([1, 0]) // "1,0" */
export function dynkinKey(d: readonly number[]): string {
  return d.join(',')
}

/**
 * Partition λ (length n, last entry 0) of a highest weight: λ_i = a_i + ... + a_{n-1}.
 * @example dynkinToPartition([1, 1]) // [2, 1, 0] (SU(3) adjoint)
 * Reference: Fulton & Harris, Representation Theory, §15.3.
 */
export function dynkinToPartition(dynkin: Dynkin): number[] {
  const n = dynkin.length + 1
  const lambda = new Array<number>(n).fill(0)
  for (let i = n - 2; i >= 0; i--) lambda[i] = lambda[i + 1]! + dynkin[i]!
  return lambda
}

/**
 * Dynkin labels of an ε-vector (any length-n integer vector): a_i = e_i - e_{i+1}.
 * @example epsilonToDynkin([1, 0, -1]) // [1, 1]
 */
export function epsilonToDynkin(e: readonly number[]): number[] {
  const out = new Array<number>(e.length - 1)
  for (let i = 0; i < e.length - 1; i++) out[i] = e[i]! - e[i + 1]!
  return out
}

const parsed = new Map<string, Int32Array>()
const separators = new Map<string, string>()

/**
 * Parse a weight key "1,-2,0" (or a product-group key "1,0;-1") into its integers (cached).
 * Throws EngineInputError on a malformed key.
 */
export function parseWeightKey(fn: string, key: string): Int32Array {
  let v = parsed.get(key)
  if (v) return v
  const parts = key.split(/[,;]/)
  v = new Int32Array(parts.length)
  for (let i = 0; i < parts.length; i++) {
    const x = Number(parts[i])
    if (!Number.isSafeInteger(x) || parts[i]!.trim() === '' || Math.abs(x) > 2 ** 30) {
      throw new EngineInputError(fn, `"${key}" is not a weight (whole numbers separated by commas)`)
    }
    v[i] = x
  }
  if (parsed.size > 2_000_000) {
    parsed.clear()
    separators.clear()
  }
  parsed.set(key, v)
  return v
}

/** The separator pattern of a key ("," and ";" in order), e.g. "1,0;-1" -> ",;". */
export function keySeparators(key: string): string {
  let s = separators.get(key)
  if (s === undefined) {
    s = key.replace(/[^,;]/g, '')
    separators.set(key, s)
  }
  return s
}

/** Build a key from integers and a separator pattern (inverse of parseWeightKey). */
export function formatWeightKey(values: ArrayLike<number>, seps: string): string {
  let key = `${values[0]}`
  for (let i = 1; i < values.length; i++) key += seps[i - 1]! + values[i]!
  return key
}
