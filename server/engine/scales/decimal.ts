/**
 * Exact reading of decimal numbers written as text ("0.51099895000", "4.18e3", "-1E-2") into
 * bigint rationals, so that ratios of printed scales stay exact.
 */
import { EngineInputError } from '../errors'
import { rat, type Rational } from '../exact/rational'

const DECIMAL = /^\s*([+-]?)(\d+)(?:\.(\d*))?(?:[eE]([+-]?\d{1,4}))?\s*$/

/**
 * The exact rational value of a decimal literal.
 * Conventions: plain or scientific notation; no thousands separators.
 * @example parseDecimal('4.18e3') // { num: 4180n, den: 1n }
 * Method: integer digits and fraction digits joined into one bigint, scaled by 10^(exp − #fraction).
 * Reference: common practice (decimal positional notation).
 */
export function parseDecimal(text: string): Rational {
  const m = DECIMAL.exec(text)
  if (!m) throw new EngineInputError('parseDecimal', `"${text}" is not a decimal number; write it like 0.511 or 4.18e3`)
  const frac = m[3] ?? ''
  const digits = BigInt(`${m[2]}${frac}`)
  const exp = Number(m[4] ?? '0') - frac.length
  const sign = m[1] === '-' ? -1n : 1n
  return exp >= 0 ? rat(sign * digits * 10n ** BigInt(exp)) : rat(sign * digits, 10n ** BigInt(-exp))
}

/**
 * Nearest double to a rational (correct to a few ulps even for huge numerators/denominators).
 * @example rationalToNumber(rat(1n, 3n)) // 0.3333333333333333
 * Method: scale to ~60 significant bits before the single float division.
 * Reference: common practice.
 */
export function rationalToNumber(r: Rational): number {
  const shift = (n: bigint) => Math.max(0, n.toString(2).length - 60)
  const a = r.num < 0n ? -r.num : r.num
  const sa = shift(a)
  const sb = shift(r.den)
  const x = Number(a >> BigInt(sa)) / Number(r.den >> BigInt(sb))
  const v = x * 2 ** (sa - sb)
  return r.num < 0n ? -v : v
}
