import { describe, it, expect } from 'vitest'
import { coverageRank, expressIn, type Fingerprint } from '../../../server/engine/board/fingerprints'
import { PrimeField, workingPrimes } from '../../../server/engine/finite/primeField'
import { toString as ratString } from '../../../server/engine/exact/rational'
import { EngineConsistencyError, EngineInputError } from '../../../server/engine/errors'

// Exact linear algebra checks on synthetic fingerprints (common practice: a vector built as a
// known rational combination must be recovered exactly; an independent one must not be).
const primes = workingPrimes(2)
const POINTS = 24

function randomPrint(seed: number): number[] {
  let s = seed
  return Array.from({ length: POINTS }, () => (s = (s * 1103515245 + 12345) % 2147483648) % 1_000_003)
}

/** Fingerprint of Σ c_j v_j with rational c_j = [num, den], the same integer vectors mod each prime. */
function combo(parts: { v: number[]; num: number; den: number }[]): Fingerprint {
  return {
    primes,
    values: primes.map((p) => {
      const F = new PrimeField(p)
      return Array.from({ length: POINTS }, (_, k) => parts.reduce((acc, { v, num, den }) => F.add(acc, F.mul(F.from(v[k]!), F.div(F.from(num), F.from(den)))), 0))
    }),
  }
}

const a = randomPrint(1)
const b = randomPrint(2)
const c = randomPrint(3)
const A = combo([{ v: a, num: 1, den: 1 }])
const B = combo([{ v: b, num: 1, den: 1 }])
const C = combo([{ v: c, num: 1, den: 1 }])

describe('coverage and rewrites from fingerprints', () => {
  it('the rank counts independent operators only', () => {
    expect(
      coverageRank([
        A,
        B,
        combo([
          { v: a, num: 1, den: 1 },
          { v: b, num: 1, den: 1 },
        ]),
      ]),
    ).toBe(2)
    expect(coverageRank([A, B, C])).toBe(3)
    expect(coverageRank([])).toBe(0)
  })

  it('recovers exact rational coefficients', () => {
    const target = combo([
      { v: a, num: 2, den: 1 },
      { v: b, num: -1, den: 3 },
      { v: c, num: 7, den: 45 },
    ])
    const r = expressIn([A, B, C], target)
    expect(r!.coefficients.map(ratString)).toEqual(['2', '-1/3', '7/45'])
  })

  it("recovers 7001/3, 1/9000 and 123457, beyond one prime's bound 5792 but within both primes' reach (reported bug)", () => {
    const target = combo([
      { v: a, num: 7001, den: 3 },
      { v: b, num: 1, den: 9000 },
      { v: c, num: 123457, den: 1 },
    ])
    expect(expressIn([A, B, C], target)!.coefficients.map(ratString)).toEqual(['7001/3', '1/9000', '123457'])
  })

  it("refuses a coefficient beyond both primes' reach instead of guessing", () => {
    const target = combo([
      { v: a, num: 1, den: 1 },
      { v: b, num: 2 ** 26 + 15, den: 1 },
    ])
    expect(() => expressIn([A, B], target)).toThrow(
      new EngineInputError(
        'expressIn',
        'The coefficient of kept operator 2 is not a fraction with numerator and denominator up to 47453092 (product up to 82595384), the most that the stored fingerprints determine; such a rewrite cannot be given exactly',
      ),
    )
  })

  it('says an independent operator is not a combination', () => {
    expect(expressIn([A, B], C)).toBeNull()
  })

  it('a vanishing operator rewrites to zero', () => {
    const zero: Fingerprint = { primes, values: primes.map(() => new Array(POINTS).fill(0)) }
    expect(expressIn([A, B], zero)!.coefficients.map(ratString)).toEqual(['0', '0'])
  })

  it('refuses fingerprints from different sample sets', () => {
    const short: Fingerprint = { primes, values: primes.map(() => [1, 2, 3]) }
    expect(() => coverageRank([A, short])).toThrow(new EngineConsistencyError('coverageRank', 'fingerprints of one class must share primes and sample points'))
  })
})
