import { describe, it, expect } from 'vitest'
import { coverageOf, firstRedundant, keptRank, rewriteOnto, type ClassOperator } from '../../../server/engine/board/keptSet'
import type { Fingerprint } from '../../../server/engine/board/fingerprints'
import { PrimeField, workingPrimes } from '../../../server/engine/finite/primeField'

// The kept set of a class from synthetic fingerprints (common practice: vectors built as known
// rational combinations must be found dependent, independent ones must not).
const primes = workingPrimes(2)
const POINTS = 20

function vector(seed: number): number[] {
  let s = seed
  return Array.from({ length: POINTS }, () => (s = (s * 1103515245 + 12345) % 2147483648) % 1_000_003)
}
/** Fingerprint of Σ num/den · v, the same integer vectors mod each prime. */
function combo(parts: [number[], number, number][]): Fingerprint {
  return {
    primes,
    values: primes.map((p) => {
      const F = new PrimeField(p)
      return Array.from({ length: POINTS }, (_, k) => parts.reduce((acc, [v, num, den]) => F.add(acc, F.mul(F.from(v[k]!), F.div(F.from(num), F.from(den)))), 0))
    }),
  }
}
const [a, b, c] = [vector(1), vector(2), vector(3)]
let id = 0
const op = (fingerprint: Fingerprint | null, column: ClassOperator['column'] = 'kept'): ClassOperator => ({ id: ++id, column, latex: `O_{${id}}`, text: `o${id}`, fingerprint })

describe('the kept set of a class', () => {
  it('finds the first kept operator that is a combination of those before it', () => {
    const ops = [
      op(combo([[a, 1, 1]])),
      op(combo([[b, 1, 1]])),
      op(combo([[c, 1, 1]])),
      op(
        combo([
          [a, 2, 1],
          [c, -1, 7],
        ]),
      ),
      op(combo([[b, 1, 1]])),
    ]
    expect(firstRedundant(ops.slice(0, 3), 3)).toBeNull()
    expect(firstRedundant(ops, 3)).toBe(3)
    expect(firstRedundant([ops[0]!, ops[1]!, ops[4]!], 3)).toBe(2)
    expect(keptRank(ops)).toBe(3)
  })

  it('a vanishing operator is redundant on its own; without fingerprints only the count is judged', () => {
    const zero: Fingerprint = { primes, values: primes.map(() => new Array(POINTS).fill(0)) }
    expect(firstRedundant([op(zero)], 1)).toBe(0)
    expect(firstRedundant([op(null), op(null)], 2)).toBeNull()
    expect(firstRedundant([op(null), op(null), op(null)], 2)).toBe(2)
  })

  it('coverage counts the kept operators only', () => {
    const ops = [op(combo([[a, 1, 1]])), op(combo([[b, 1, 1]]), 'set_aside')]
    expect(coverageOf('X', ops, 2)).toEqual({ classKey: 'X', rank: 1, required: 2, complete: false })
  })

  it("rewrites exactly, and marks a rewrite whose coefficient is beyond the fingerprints' reach instead of failing", () => {
    const kept = op(combo([[a, 1, 1]]))
    const small = op(combo([[a, -7, 45]]), 'set_aside')
    expect(rewriteOnto([kept, small], small.id)).toEqual({ exact: true, vanishes: false, terms: [{ operatorId: kept.id, latex: kept.latex, coefficient: '-7/45' }] })
    const huge = op(combo([[a, 2 ** 26 + 15, 1]]), 'set_aside')
    expect(rewriteOnto([kept, huge], huge.id)).toMatchObject({ exact: false, terms: [], message: expect.stringContaining('cannot be given exactly') })
    expect(rewriteOnto([kept, op(combo([[b, 1, 1]]), 'set_aside')], id)).toBeNull()
  })
})
