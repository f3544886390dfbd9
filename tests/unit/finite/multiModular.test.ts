import { describe, expect, it } from 'vitest'
import {
  PrimeField,
  PrimeSet,
  SeededRandom,
  agreedEchelon,
  agreedRank,
  agreedValue,
  liftRational,
  liftReach,
  reconstructRationalOrNull,
  crt,
  solveOverQ,
  workingPrimes,
  type ModSystem,
} from '../../../server/engine/finite/index'
import { EngineConsistencyError } from '../../../server/engine/errors'
import { rat, toString as ratString, type Rational } from '../../../server/engine/exact/rational'
import { LIFT_CASES, caseName } from './liftCases'

// The multi-modular layer on its own. Methods: CRT (Knuth, TAOCP vol. 2, §4.3.2), Wang's
// rational reconstruction (Proc. SYMSAC 1981), Monagan's acceptance threshold (Proc. ISSAC
// 2004); the expected values are exact by construction (common practice).

const images = (q: Rational, set: PrimeSet): number[] => set.image(q)

describe('lifting one value from its images (named cases)', () => {
  for (const count of [2, 3] as const) {
    const set = PrimeSet.working(count)
    for (const c of LIFT_CASES) {
      const expected = count === 2 ? c.twoPrimes : c.threePrimes
      it(`${count} primes: ${caseName(c)} is ${expected}`, () => {
        const q = liftRational(images(c.value, set), set.primes)
        if (expected === 'exact') expect(q && ratString(q)).toBe(ratString(c.value))
        else expect(q).toBeNull()
      })
    }
  }

  it('one prime alone certifies almost nothing: 1/3 and 5792/5791 are refused, 2 is lifted', () => {
    const one = PrimeSet.working(1)
    expect(liftRational(one.image(rat(1, 3)), one.primes)).toBeNull()
    expect(liftRational(one.image(rat(5792, 5791)), one.primes)).toBeNull()
    expect(liftRational(one.image(rat(2)), one.primes)).toEqual(rat(2))
  })

  it('states its reach for 1, 2 and 3 primes (the figures quoted in liftCases.ts)', () => {
    expect([1, 2, 3].map((k) => liftReach(workingPrimes(k)))).toEqual([
      { each: 5792n, product: 2n },
      { each: 47453092n, product: 82595384n },
      { each: 388735423912n, product: 3695249063652183n },
    ])
  })

  it('checks the result against every prime: a third residue that disagrees refuses the lift', () => {
    const three = PrimeSet.working(3)
    const r = three.image(rat(7001, 3))
    expect(liftRational(r, three.primes)).toEqual(rat(7001, 3))
    expect(liftRational([r[0]!, r[1]!, (r[2]! + 1) % three.primes[2]!], three.primes)).toBeNull()
  })

  it("refuses random residues, which Wang's bound alone would lift more often than not", () => {
    const set = PrimeSet.working(2)
    const rng = new SeededRandom(2026)
    let lifted = 0
    let wangAlone = 0
    for (let t = 0; t < 2000; t++) {
      const r = set.primes.map((p) => rng.below(p))
      if (liftRational(r, set.primes)) lifted++
      const { residue, modulus } = crt(r.map(BigInt), set.primes.map(BigInt))
      if (reconstructRationalOrNull(residue, modulus)) wangAlone++
    }
    expect(lifted).toBe(0) // expected about 2000·2^-20 ≈ 0.002
    expect(wangAlone).toBeGreaterThan(1000) // ≈ 6/π² of them (count of fractions within the bound)
  })

  it('names the bad input', () => {
    const set = PrimeSet.working(2)
    expect(() => liftRational([1], set.primes)).toThrow('need one residue per prime, got 1 residues for 2 primes')
    expect(() => liftRational([1, set.primes[1]!], set.primes)).toThrow(`residue ${set.primes[1]} is not an element of F_${set.primes[1]}`)
    expect(() => liftRational([1, 2], set.primes)).not.toThrow()
  })
})

/** A x = b modulo each prime for an integer matrix A (8 equations, 3 unknowns) and rational x. */
function systemsFor(set: PrimeSet, x: Rational[], seed = 11): ModSystem[] {
  const rng = new SeededRandom(seed)
  const a = Array.from({ length: 8 }, () => x.map(() => rng.below(1000) - 500))
  return set.fields.map((F) => {
    const am = a.map((row) => row.map((v) => F.from(v)))
    const b = am.map((row) => row.reduce((s, v, j) => F.add(s, F.mul(v, F.fromRational(x[j]!))), 0))
    return { a: am, b }
  })
}

describe('solving over Q (named cases as the middle unknown)', () => {
  for (const count of [2, 3] as const) {
    const set = PrimeSet.working(count)
    for (const c of LIFT_CASES) {
      const expected = count === 2 ? c.twoPrimes : c.threePrimes
      it(`${count} primes: ${caseName(c)} is ${expected}`, () => {
        const out = set.solve(systemsFor(set, [rat(2), c.value, rat(-1, 3)]), { fn: 'test' })
        if (expected === 'exact') expect(out).toEqual({ status: 'solved', coefficients: [rat(2), c.value, rat(-1, 3)] })
        else expect(out).toMatchObject({ status: 'not-liftable', index: 1 })
      })
    }
  }

  it('lifts only the unknowns asked for', () => {
    const set = PrimeSet.working(2)
    const out = set.solve(systemsFor(set, [rat(2 ** 35 + 3), rat(7001, 3), rat(0)]), { fn: 'test' }, { lift: [1, 2] })
    expect(out).toEqual({ status: 'solved', coefficients: [rat(7001, 3), rat(0)] })
  })

  it('says when the right side is outside the span', () => {
    const set = PrimeSet.working(2)
    const systems = systemsFor(set, [rat(1), rat(2), rat(3)]).map((s) => ({ a: s.a.map((row) => row.slice(0, 2)), b: s.b }))
    expect(solveOverQ(set.fields, systems, { fn: 'test' })).toEqual({ status: 'outside-span' })
  })

  it('reports primes that disagree on solvability', () => {
    const set = PrimeSet.working(2)
    // Column (1, p1): independent of (1, 0) over Q and mod p2, equal to it mod p1.
    const p1 = set.primes[0]!
    const systems = set.fields.map((F) => ({ a: [[1], [0]], b: [1, F.from(p1)] }))
    expect(() => solveOverQ(set.fields, systems, { fn: 'expressIn', about: 'class X' })).toThrow(
      new EngineConsistencyError('expressIn', `class X: the primes disagree on the target being in the span (true mod ${p1}, false mod ${set.primes[1]})`),
    )
  })
})

describe('agreement between primes', () => {
  const set = PrimeSet.working(2)
  const [p1, p2] = set.primes as [number, number]
  // [[1, 1], [1, 1 + p1]] has determinant p1: rank 1 mod p1, rank 2 mod p2.
  const m = (F: PrimeField) => [
    [1, 1],
    [1, F.from(1 + p1)],
  ]

  it('a rank disagreement is a consistency error naming both primes', () => {
    expect(() => agreedEchelon(set.fields, set.fields.map(m), { fn: 'classBasis', about: 'class Y' })).toThrow(
      new EngineConsistencyError('classBasis', `class Y: the primes disagree on the independent columns (rank 1 mod ${p1}, rank 2 mod ${p2})`),
    )
    expect(() => agreedRank(set.fields, set.fields.map(m), { fn: 'coverageRank' })).toThrow(`the primes disagree on the rank (1 mod ${p1}, 2 mod ${p2})`)
  })

  it('agreeing primes give the common pivots and rank', () => {
    const same = set.fields.map(() => [
      [1, 2, 0],
      [2, 4, 1],
    ])
    expect(agreedEchelon(set.fields, same, { fn: 't' })).toMatchObject({ pivots: [0, 2], rank: 2 })
    expect(agreedRank(set.fields, same, { fn: 't' })).toBe(2)
    expect(agreedValue(set.fields, [3, 3], { fn: 't' }, 'trace')).toBe(3)
    expect(() => agreedValue(set.fields, [3, 1], { fn: 'classParity' }, 'parity trace')).toThrow(EngineConsistencyError)
  })
})

describe('the facade', () => {
  it('working sets are shared and ordered', () => {
    expect(PrimeSet.working()).toBe(PrimeSet.working(2))
    expect(PrimeSet.working(3).primes).toEqual(workingPrimes(3))
  })
  it('images and negation per prime', () => {
    const set = PrimeSet.working(2)
    expect(set.image(-1)).toEqual(set.primes.map((p) => p - 1))
    expect(set.negated(set.image(rat(1, 2)))).toEqual(set.image(rat(-1, 2)))
    expect(set.lift(set.image(rat(-7001, 3)))).toEqual(rat(-7001, 3))
  })
  it('refuses an empty or repeated prime list with the bad value', () => {
    expect(() => new PrimeSet([])).toThrow(EngineConsistencyError) // built by the engine, never from a user's input
    expect(() => new PrimeSet([7, 7])).toThrow('need one or more distinct primes, got [7, 7]')
  })
})
