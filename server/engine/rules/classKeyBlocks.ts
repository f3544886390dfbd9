/**
 * Building-block counts from an operator class key of the relativistic counting engine
 * ("D^2 H^2 H*^2", "G_L^3", "Q Q* u u*"), so that counting rules apply to counted classes.
 */
import { EngineInputError } from '../errors'
import type { BlockCounts } from './orderOf'

/**
 * Parse a class key into block counts.
 * @example blocksFromClassKey('D^2 H^2 H*^2') // { D: 2, H: 2, 'H*': 2 }
 * Method: split on single spaces, optional "^n" power. Reference: common practice.
 */
export function blocksFromClassKey(key: string): BlockCounts {
  const out: Record<string, number> = {}
  if (key.trim() === '') throw new EngineInputError('blocksFromClassKey', 'The class is empty; name its fields, e.g. "D^2 H^2 H*^2"')
  for (const tok of key.trim().split(' ')) {
    const m = /^([A-Za-z][A-Za-z0-9_]*\*?)(?:\^([1-9]\d*))?$/.exec(tok)
    if (!m) throw new EngineInputError('blocksFromClassKey', `Cannot read "${tok}" in the class "${key}"; write a class as fields with powers, e.g. "D^2 H^2 H*^2"`)
    out[m[1]!] = (out[m[1]!] ?? 0) + (m[2] ? Number(m[2]) : 1)
  }
  return out
}
