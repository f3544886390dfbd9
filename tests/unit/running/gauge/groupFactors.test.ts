import { describe, expect, it } from 'vitest'
import { simpleGroupFactors } from '../../../../server/engine/running/gauge/index'
import { suWeights } from '../../../../server/engine/group/index'
import { add, div, mul, rat, toString, ZERO, type Rational } from '../../../../server/engine/exact/rational'

/** Every Dynkin label vector of SU(n) with entries 0..max. */
function labels(n: number, max: number): number[][] {
  let out: number[][] = [[]]
  for (let i = 0; i < n - 1; i++) out = out.flatMap((a) => Array.from({ length: max + 1 }, (_, k) => [...a, k]))
  return out
}

/**
 * Slow oracle: T(R) = Σ_weights m (w·H)² with H = diag(1, −1, 0, …)/2 (tr_fund H² = 1/2), where
 * w·H = (e1 − e2)/2 in ε-coordinates, e1 − e2 = a_1 (the first Dynkin label of the weight);
 * then C2(R) = T(R) dim G / dim R. The weights are those checked against LiE in tests/unit/group/lie.test.ts.
 */
function oracle(n: number, a: number[]): { index: Rational; casimir: Rational; dim: number } {
  let index: Rational = ZERO
  let dim = 0
  for (const [key, m] of suWeights(n, a)) {
    const a1 = Number(key.split(',')[0])
    index = add(index, mul(rat(m), rat(a1 * a1, 4)))
    dim += m
  }
  return { index, casimir: div(mul(index, rat(n * n - 1)), rat(dim)), dim }
}

describe('SU(N) invariants through the group plug-in (simpleGroupFactors)', () => {
  it('T(R) and C2(R) equal the weight-sum oracle for every irrep of SU(2)..SU(5) with labels ≤ 2 (and SU(6..8) with labels ≤ 1) (Slansky, Phys. Rep. 79 (1981) 1, eq. (4.14))', () => {
    let checked = 0
    for (const [n, max] of [
      [2, 6],
      [3, 2],
      [4, 2],
      [5, 2],
      [6, 1],
      [7, 1],
      [8, 1],
    ] as const) {
      const g = simpleGroupFactors({ name: 'G', type: 'SU', n, gauge: true })
      for (const a of labels(n, max)) {
        if (n >= 7 && a.filter((x) => x > 0).length > 2) continue // keep the weight enumeration small
        const o = oracle(n, a)
        expect(toString(g.index(a)), `SU(${n}) [${a}]`).toBe(toString(o.index))
        expect(toString(g.casimir(a)), `SU(${n}) [${a}]`).toBe(toString(o.casimir))
        expect(g.irrepDimension(a)).toBe(o.dim)
        checked++
      }
    }
    expect(checked).toBeGreaterThan(200)
  })

  it('adjoint and fundamental: C2(G) = N, T(adj) = N, C2(fund) = (N²−1)/2N (common practice)', () => {
    for (let n = 2; n <= 8; n++) {
      const g = simpleGroupFactors({ name: 'G', type: 'SU', n, gauge: true })
      const adj = n === 2 ? [2] : [1, ...new Array(n - 3).fill(0), 1]
      const fund = [1, ...new Array(n - 2).fill(0)]
      expect(toString(g.adjointCasimir)).toBe(String(n))
      expect(toString(g.index(adj))).toBe(String(n))
      expect(toString(g.casimir(fund))).toBe(toString(rat(n * n - 1, 2 * n)))
      expect(g.dimension).toBe(n * n - 1)
      expect(g.label).toBe(`SU(${n})`)
    }
  })

  it('SU(2) spin j: T = j(j+1)(2j+1)/3, C2 = j(j+1) (common practice)', () => {
    const g = simpleGroupFactors({ name: 'W', type: 'SU', n: 2, gauge: true })
    for (let twoJ = 0; twoJ <= 8; twoJ++) {
      const j = rat(twoJ, 2)
      const jj = mul(j, add(j, rat(1)))
      expect(toString(g.casimir([twoJ]))).toBe(toString(jj))
      expect(toString(g.index([twoJ]))).toBe(toString(div(mul(jj, rat(twoJ + 1)), rat(3))))
    }
  })

  it('a group kind without invariants is refused naming the group (U(1) has no irrep factors; others plug in here)', () => {
    expect(() => simpleGroupFactors({ name: 'X', type: 'U1', gauge: true })).toThrow('The running of the coupling of X is not available: it is a U1 group')
  })
})
