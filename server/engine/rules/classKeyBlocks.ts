/**
 * Building-block counts from an operator class key of the relativistic engines
 * ("D^2 H^2 H*^2", "G_L^3", "Q Q* u u*"), so that counting rules apply to counted classes.
 */
import { readClassKey } from '../theory/classKey'
import type { BlockCounts } from './orderOf'

/**
 * Parse a class key into block counts ("D" counts the derivatives).
 * @example blocksFromClassKey('D^2 H^2 H*^2') // { D: 2, H: 2, 'H*': 2 }
 * Method: the one class-key reader (theory/classKey.ts). Reference: common practice.
 */
export function blocksFromClassKey(key: string): BlockCounts {
  const { derivatives, blocks } = readClassKey(key)
  const out: Record<string, number> = derivatives > 0 ? { D: derivatives } : {}
  for (const b of blocks) out[b.label] = b.power
  return out
}
