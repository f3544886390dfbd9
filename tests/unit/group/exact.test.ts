import { describe, expect, it } from 'vitest'
import { ONE, ZERO, add, compare, div, equals, isZero, mul, neg, parseRational, rat, sub, toBigInt, toString } from '../../../server/engine/exact/rational'
import { EngineInputError } from '../../../server/engine/errors'

describe('exact rationals (common practice: normal form with positive denominator)', () => {
  it('parses and normalises', () => {
    expect(toString(parseRational('1/6'))).toBe('1/6')
    expect(toString(parseRational(' -4/6 '))).toBe('-2/3')
    expect(toString(parseRational('2/-6'))).toBe('-1/3')
    expect(toString(parseRational('12'))).toBe('12')
    expect(parseRational('0/5')).toEqual(ZERO)
  })

  it('arithmetic: hypercharge sums stay exact (1/6 + 1/3 = 1/2; 1/6 × 6 = 1)', () => {
    const a = parseRational('1/6')
    expect(toString(add(a, parseRational('1/3')))).toBe('1/2')
    expect(equals(mul(a, rat(6)), ONE)).toBe(true)
    expect(toString(sub(a, ONE))).toBe('-5/6')
    expect(toString(neg(a))).toBe('-1/6')
    expect(toString(div(parseRational('2/3'), parseRational('-4/9')))).toBe('-3/2')
    expect(isZero(sub(a, a))).toBe(true)
    expect(compare(a, parseRational('1/5'))).toBe(-1)
    expect(toBigInt(rat(12n, 4n))).toBe(3n)
    const big = rat(2n ** 80n + 1n, 3n)
    expect(toString(mul(big, rat(3)))).toBe(`${2n ** 80n + 1n}`)
  })

  it('rejects bad input with named errors', () => {
    expect(() => parseRational('1/0')).toThrow(EngineInputError)
    expect(() => parseRational('1/0')).toThrow('"1/0" has a zero denominator')
    expect(() => parseRational('0.5')).toThrow('"0.5" is not a fraction')
    expect(() => div(ONE, ZERO)).toThrow('Division by zero (1 / 0)')
    expect(() => rat(1.5)).toThrow('1.5 is not a whole number below 2^53')
    expect(() => toBigInt(parseRational('1/2'))).toThrow('1/2 is not a whole number')
  })
})
