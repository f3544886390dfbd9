import { describe, expect, it } from 'vitest'
import { parseDecimal, rationalToNumber } from '../../../server/engine/scales/decimal'
import { rat, toString as ratText } from '../../../server/engine/exact/rational'

describe('parseDecimal / rationalToNumber (common practice: positional decimal notation)', () => {
  it('reads printed decimals exactly', () => {
    expect(ratText(parseDecimal('0.51099895000'))).toBe('10219979/20000000')
    expect(ratText(parseDecimal('4.18e3'))).toBe('4180')
    expect(ratText(parseDecimal('-1E-2'))).toBe('-1/100')
    expect(ratText(parseDecimal('137.035999084'))).toBe('34258999771/250000000')
  })

  it('converts huge rationals to the nearest double within a few ulps', () => {
    const big = rat(10n ** 400n + 1n, 3n * 10n ** 399n)
    expect(Math.abs(rationalToNumber(big) - 10 / 3)).toBeLessThan(1e-15)
    expect(rationalToNumber(rat(-1, 3))).toBe(-1 / 3)
  })

  it('rejects text that is not a decimal number', () => {
    expect(() => parseDecimal('1,5')).toThrow('"1,5" is not a decimal number')
  })
})
