/**
 * Exact rational numbers over bigint. A Rational is always normalised: the denominator is
 * positive and gcd(|num|, den) = 1, so structural equality of (num, den) is numeric equality.
 * Values are immutable plain objects; every operation returns a new value.
 */
import { EngineInputError } from '../errors'

export interface Rational {
  readonly num: bigint
  readonly den: bigint
}

function absBig(a: bigint): bigint {
  return a < 0n ? -a : a
}

/** Greatest common divisor of two bigints (non-negative result; gcd(0,0) = 0). */
export function gcdBig(a: bigint, b: bigint): bigint {
  let x = absBig(a)
  let y = absBig(b)
  while (y !== 0n) {
    const t = x % y
    x = y
    y = t
  }
  return x
}

/** Build a normalised rational num/den. Throws EngineInputError on a zero denominator. */
export function rat(num: bigint | number, den: bigint | number = 1n): Rational {
  const n = toBig('rat', num)
  const d = toBig('rat', den)
  if (d === 0n) throw new EngineInputError('rat', `A fraction cannot have a zero denominator (${n}/0)`)
  const g = gcdBig(n, d)
  const s = d < 0n ? -1n : 1n
  return g === 0n ? { num: 0n, den: 1n } : { num: (s * n) / g, den: (s * d) / g }
}

function toBig(fn: string, v: bigint | number): bigint {
  if (typeof v === 'bigint') return v
  if (!Number.isSafeInteger(v)) throw new EngineInputError(fn, `${v} is not a whole number below 2^53`)
  return BigInt(v)
}

/** The rational 0. */
export const ZERO: Rational = { num: 0n, den: 1n }
/** The rational 1. */
export const ONE: Rational = { num: 1n, den: 1n }

/**
 * Parse "a", "-a", "a/b" (integers, optional surrounding spaces).
 * @example parseRational("2/-6") // { num: -1n, den: 3n }
 */
export function parseRational(text: string): Rational {
  const m = /^\s*([+-]?\d+)\s*(?:\/\s*([+-]?\d+)\s*)?$/.exec(text)
  if (!m) throw new EngineInputError('parseRational', `"${text}" is not a fraction; write a whole number or p/q, e.g. 3/2`)
  const den = m[2] === undefined ? 1n : BigInt(m[2])
  if (den === 0n) throw new EngineInputError('parseRational', `"${text}" has a zero denominator`)
  return rat(BigInt(m[1]!), den)
}

/** a + b. @example toString(add(parseRational('1/6'), parseRational('1/3'))) // '1/2' */
export function add(a: Rational, b: Rational): Rational {
  return rat(a.num * b.den + b.num * a.den, a.den * b.den)
}

/** a - b. @example toString(sub(rat(1), parseRational('1/6'))) // '5/6' */
export function sub(a: Rational, b: Rational): Rational {
  return rat(a.num * b.den - b.num * a.den, a.den * b.den)
}

/** -a. @example toString(neg(parseRational('1/6'))) // '-1/6' */
export function neg(a: Rational): Rational {
  return { num: -a.num, den: a.den }
}

/** a · b. @example toString(mul(parseRational('2/3'), parseRational('3/4'))) // '1/2' */
export function mul(a: Rational, b: Rational): Rational {
  return rat(a.num * b.num, a.den * b.den)
}

/** a / b; throws EngineInputError when b is zero. */
export function div(a: Rational, b: Rational): Rational {
  if (b.num === 0n) throw new EngineInputError('div', `Division by zero (${toString(a)} / 0)`)
  return rat(a.num * b.den, a.den * b.num)
}

/** Numeric equality (normal forms compare structurally). @example equals(rat(2, 4), rat(1, 2)) // true */
export function equals(a: Rational, b: Rational): boolean {
  return a.num === b.num && a.den === b.den
}

/** a = 0. @example isZero(sub(rat(1, 3), rat(2, 6))) // true */
export function isZero(a: Rational): boolean {
  return a.num === 0n
}

/** Denominator 1. @example isInteger(rat(6, 3)) // true */
export function isInteger(a: Rational): boolean {
  return a.den === 1n
}

/** -1, 0 or 1 as a vs b. */
export function compare(a: Rational, b: Rational): -1 | 0 | 1 {
  const d = a.num * b.den - b.num * a.den
  return d < 0n ? -1 : d > 0n ? 1 : 0
}

/** "a" for integers, "a/b" otherwise (sign on the numerator). */
export function toString(a: Rational): string {
  return a.den === 1n ? `${a.num}` : `${a.num}/${a.den}`
}

/** The exact integer value; throws EngineInputError if the value is not an integer. */
export function toBigInt(a: Rational): bigint {
  if (a.den !== 1n) throw new EngineInputError('toBigInt', `${toString(a)} is not a whole number`)
  return a.num
}

/** Sum of a list of rationals. */
export function sum(xs: readonly Rational[]): Rational {
  return xs.reduce(add, ZERO)
}
