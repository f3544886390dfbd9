import { describe, expect, it } from 'vitest'
import { EngineConsistencyError, EngineInputError } from '../../../server/engine/errors'
import { PrimeField, isPrime, workingPrimes, SeededRandom, rref, rank, solve, reconstructRational, crt } from '../../../server/engine/finite/index'
import { rat } from '../../../server/engine/exact/rational'

describe('prime field (Knuth, TAOCP vol. 2, §4.5.2)', () => {
  const F7 = new PrimeField(7)
  it('inverts and divides', () => {
    expect(F7.inv(3)).toBe(5) // 3·5 = 15 ≡ 1 mod 7 (arithmetic)
    expect(F7.div(1, 2)).toBe(4)
    expect(F7.pow(3, 6)).toBe(1) // Fermat's little theorem
    expect(F7.from(-1)).toBe(6)
    expect(F7.from(-15n)).toBe(6)
    expect(F7.fromRational(rat(1, 2))).toBe(4)
  })
  it('rejects 0 inverse and composite or too large moduli with the bad value', () => {
    expect(() => F7.inv(0)).toThrow(new EngineConsistencyError('PrimeField.inv', '0 has no inverse mod 7'))
    expect(() => new PrimeField(15)).toThrow('got 15')
    expect(() => new PrimeField(2 ** 31 - 1)).toThrow('got 2147483647')
  })
  it('working primes are primes below 2^26 and ≡ 1 mod 4 with √−1 (common practice)', () => {
    const ps = workingPrimes(3)
    expect(ps).toEqual([67108837, 67108777, 67108757])
    for (const p of ps) {
      expect(isPrime(p)).toBe(true)
      const F = new PrimeField(p)
      const i = F.sqrtMinusOne()
      expect(F.mul(i, i)).toBe(p - 1)
    }
  })
  it('products of large elements stay exact (checked against bigint)', () => {
    const p = workingPrimes(1)[0]!
    const F = new PrimeField(p)
    const rng = new SeededRandom(7)
    for (let t = 0; t < 1000; t++) {
      const a = rng.below(p)
      const b = rng.below(p)
      expect(F.mul(a, b)).toBe(Number((BigInt(a) * BigInt(b)) % BigInt(p)))
    }
  })
})

describe('linear algebra mod p (Golub & Van Loan, Matrix Computations, §3.2)', () => {
  const F = new PrimeField(101)
  it('rank and greedy pivot columns', () => {
    const m = [
      [1, 2, 3, 1],
      [2, 4, 6, 0],
      [0, 0, 0, 5],
    ]
    const e = rref(F, m)
    expect(e.rank).toBe(2)
    expect(e.pivots).toEqual([0, 3]) // column 1 = 2·col 0, col 2 = 3·col 0
    expect(
      rank(F, [
        [1, 0],
        [0, 1],
        [1, 1],
      ]),
    ).toBe(2)
    expect(rank(F, [])).toBe(0)
  })
  it('solves and reports inconsistency', () => {
    expect(
      solve(
        F,
        [
          [2, 0],
          [0, 3],
        ],
        [4, 6],
      ),
    ).toEqual([2, 2])
    expect(() =>
      solve(
        F,
        [
          [1, 1],
          [2, 2],
        ],
        [1, 3],
      ),
    ).toThrow(expect.objectContaining({ where: 'solve', message: expect.stringMatching(/^inconsistent system/) }))
    expect(() => rref(F, [[1, 2], [3]])).toThrow('ragged matrix: row of length 1, expected 2')
  })
  it('honours cancellation', () => {
    expect(() => rref(F, [[1]], { aborted: true })).toThrow(expect.objectContaining({ where: 'rref', name: 'EngineCancelledError' }))
  })
})

describe('rational reconstruction (Wang, SYMSAC 1981; von zur Gathen & Gerhard §5.10)', () => {
  it('recovers small fractions', () => {
    expect(reconstructRational(51n, 101n)).toEqual({ num: 1n, den: 2n })
    const p = BigInt(workingPrimes(1)[0]!)
    const F = new PrimeField(Number(p))
    for (const [n, d] of [
      [-1, 3],
      [1, 4],
      [7, 12],
      [-255, 256],
      [0, 1],
    ] as const) {
      expect(reconstructRational(BigInt(F.fromRational(rat(n, d))), p)).toEqual(rat(n, d))
    }
  })
  it('fails loudly when the modulus is too small', () => {
    expect(() => reconstructRational(3n, 7n)).toThrow(new EngineInputError('reconstructRational', 'no rational with bound 1 has image 3 mod 7'))
  })
  it('CRT combines two primes and reconstructs larger fractions', () => {
    expect(crt([2n, 3n], [3n, 5n])).toEqual({ residue: 8n, modulus: 15n })
    const [p, q] = workingPrimes(2).map(BigInt) as [bigint, bigint]
    const x = rat(123456789, 987654)
    const r = [p, q].map((m) => BigInt(new PrimeField(Number(m)).fromRational(x)))
    const { residue, modulus } = crt(r, [p, q])
    expect(reconstructRational(residue, modulus)).toEqual(x)
    expect(() => crt([1n], [4n, 6n])).toThrow(new EngineConsistencyError('crt', 'need equally many residues and moduli, got 1 and 2'))
  })
})
