import { describe, expect, it } from 'vitest'
import { adjointSinglets, conjugationSinglets, GENERAL_N, specialPairing, squareType, twistedAdjointSinglets, withTracesRemoved } from '../../../server/engine/goldstone/unitaryIntegral'
import { averageOfComponents, orthogonalSinglets, powerSumIntegral } from '../../../server/engine/goldstone/orthogonalIntegral'
import { OrthogonalFlavor, UnitaryFlavor } from '../../../server/engine/goldstone/flavorModels'
import { lorentzSeries, twistedLorentzSeries } from '../../../server/engine/goldstone/lorentzIntegral'
import { towerCharacter, twistedTowerCharacter } from '../../../server/engine/goldstone/towers'
import { partitionsOf } from '../../../server/engine/group/symmetricGroup'

/** Brute force for N ≥ m: the invariants of m gl_N letters are the m! permutations (trace products). */
function permutations(m: number): number[][] {
  if (m === 0) return [[]]
  return permutations(m - 1).flatMap((p) => Array.from({ length: m }, (_, i) => [...p.slice(0, i), m - 1, ...p.slice(i)]))
}
const compose = (a: number[], b: number[]) => a.map((_, i) => a[b[i]!]!)
const inverse = (a: number[]) => {
  const r = new Array<number>(a.length)
  a.forEach((x, i) => {
    r[x] = i
  })
  return r
}
const withCycleType = (nu: number[]) => {
  const out: number[] = []
  let s = 0
  for (const c of nu) {
    for (let i = 0; i < c; i++) out.push(s + ((i + 1) % c))
    s += c
  }
  return out
}

describe('Schur–Weyl flavor integrals (Macdonald, Symmetric Functions, I.7 and VI.9; Procesi, Adv. Math. 19 (1976) 306)', () => {
  it('for N ≥ m, permutation π acting by conjugation on the m! trace products fixes |centralizer| of them, and C∘π (σ ↦ π σ⁻¹ π⁻¹) fixes #{σ : (πσ⁻¹π⁻¹) = σ} (brute force)', () => {
    for (let m = 1; m <= 5; m++) {
      const perms = permutations(m)
      for (const nu of partitionsOf(m)) {
        const pi = withCycleType(nu)
        const conj = (s: number[]) => compose(compose(pi, s), inverse(pi))
        const fixed = perms.filter((s) => conj(s).join() === s.join()).length
        const twisted = perms.filter((s) => conj(inverse(s)).join() === s.join()).length
        expect(adjointSinglets(GENERAL_N, nu)).toBe(fixed)
        expect(twistedAdjointSinglets(GENERAL_N, nu)).toBe(twisted)
      }
    }
  })

  it('Cayley–Hamilton: two traceless 2 × 2 matrices X, Y have ⟨XY⟩ only; three have ⟨XYZ⟩ and ⟨XZY⟩ but their sum is ⟨X{Y,Z}⟩ = 0 for SU(2) (common practice)', () => {
    expect(withTracesRemoved([], [1, 1], (nu) => adjointSinglets(2, nu))).toBe(1)
    expect(withTracesRemoved([], [1, 1, 1], (nu) => adjointSinglets(2, nu))).toBe(1)
    expect(withTracesRemoved([], [1, 1, 1], (nu) => adjointSinglets(3, nu))).toBe(2)
  })

  it('SU(2) adjoint = SO(3) vector: with an even number of letters, the unitary and orthogonal integrators agree (O(3) = SO(3) × {±1}; common practice)', () => {
    const su2 = new UnitaryFlavor(2)
    const o3 = new OrthogonalFlavor(3)
    for (let m = 2; m <= 8; m += 2) {
      for (const nu of partitionsOf(m)) {
        expect(
          su2.singlets(
            nu.map((c) => ({ kind: 'sl', cycle: c })),
            false,
          ),
        ).toBe(o3.singlets(nu.map((c) => ({ kind: 'vector', cycle: c }))))
      }
    }
  })

  it('SU(N) admits the determinant: two 2 × 2 fundamentals pair into one invariant, and SU(3) needs three (common practice)', () => {
    expect(specialPairing(2, [1, 1], [])).toBe(1)
    expect(specialPairing(3, [1, 1], [])).toBe(0)
    expect(specialPairing(3, [1, 1, 1], [])).toBe(1)
    expect(specialPairing(GENERAL_N, [1, 1, 1], [])).toBe(0)
    expect(conjugationSinglets(3, [1, 1])).toBe(2)
    expect(squareType([4, 3, 2])).toEqual([3, 2, 2, 1, 1])
  })
})

describe('O(N) integrals', () => {
  it('the Brauer (fixed matchings) formula equals Weyl integration over both components whenever 2N ≥ m (Brauer, Ann. Math. 38 (1937) 857; Diaconis & Shahshahani 1994)', () => {
    for (let m = 1; m <= 8; m++) {
      for (const nu of partitionsOf(m)) {
        for (const N of [Math.ceil(m / 2), Math.ceil(m / 2) + 1]) expect(powerSumIntegral(N, nu)).toBe(averageOfComponents(N, nu))
      }
    }
  })

  it('O(2) keeps δ_ab but not ε_ab, and a vector has no singlet (common practice)', () => {
    expect(
      orthogonalSinglets(2, [
        { rep: 'vector', cycle: 1 },
        { rep: 'vector', cycle: 1 },
      ]),
    ).toBe(1)
    expect(orthogonalSinglets(3, [{ rep: 'vector', cycle: 1 }])).toBe(0)
    expect(
      orthogonalSinglets(3, [
        { rep: 'adjoint', cycle: 1 },
        { rep: 'adjoint', cycle: 1 },
      ]),
    ).toBe(1)
  })
})

describe('Lorentz towers and integrals', () => {
  it('the Goldstone tower starts with the vector u_μ; the strength tower with (1,0)+(0,1) (six components); the source tower with one scalar at p² (common practice)', () => {
    expect(towerCharacter('goldstone', 1).reduce((s, t) => s + t.c, 0)).toBe(4)
    expect(towerCharacter('strength', 2).reduce((s, t) => s + t.c, 0)).toBe(6)
    expect(towerCharacter('source', 2)).toEqual([{ d: 2, ml: 0, mr: 0, c: 1 }])
  })

  it('the reflection fixes only the divergence ∂^μF_μν of a field strength at p³: trace z + 1/z (common practice)', () => {
    expect(twistedTowerCharacter('strength', 3)).toEqual([
      { d: 3, m: -1, c: 1 },
      { d: 3, m: 1, c: 1 },
    ])
  })

  it('a pair of Goldstone letters gives the scalar u_μ u^μ at p²; one source letter only χ itself, its derivatives being total derivatives (common practice)', () => {
    expect(
      lorentzSeries(
        [
          { kind: 'goldstone', cycle: 1 },
          { kind: 'goldstone', cycle: 1 },
        ],
        2,
      ),
    ).toEqual([0, 0, 1])
    expect(
      twistedLorentzSeries(
        [
          { kind: 'goldstone', cycle: 1 },
          { kind: 'goldstone', cycle: 1 },
        ],
        2,
      ),
    ).toEqual([0, 0, 1])
    expect(lorentzSeries([{ kind: 'source', cycle: 1 }], 6)).toEqual([0, 0, 1, 0, 0, 0, 0])
    expect(twistedLorentzSeries([{ kind: 'source', cycle: 1 }], 6)).toEqual([0, 0, 1, 0, 0, 0, 0])
  })
})
