import { describe, expect, it } from 'vitest'
import { FINITE_GROUPS, FINITE_KINDS } from '../../../shared/physics/finite/tables'
import { adamsClass, classAverage, classProduct, finiteConjugate, finiteGroup, finiteReality, finiteTensorProduct, irrepMultiplicity } from '../../../server/engine/group/finite/finiteGroup'
import { eConj } from '../../../shared/physics/finite/eisenstein'
import { EngineInputError } from '../../../server/engine/errors'

describe('character tables of the finite flavour groups (orthogonality checks; James & Liebeck, Thms 14.12 and 16.4)', () => {
  for (const kind of FINITE_KINDS) {
    const t = FINITE_GROUPS[kind]
    it(`${t.label}: class sizes sum to |G|, as many irreps as classes, Σ dim² = |G|, rows and columns orthonormal`, () => {
      expect(t.classes.reduce((s, c) => s + c.size, 0)).toBe(t.order)
      expect(t.irreps.length).toBe(t.classes.length)
      expect(t.irreps.reduce((s, r) => s + r.chi[0]![0] ** 2, 0)).toBe(t.order)
      t.irreps.forEach((r, i) =>
        t.irreps.forEach((q, j) => {
          expect(classAverage(t, classProduct(r.chi, q.chi.map(eConj))), `${r.name}·${q.name}`).toBe(i === j ? 1 : 0)
        }),
      )
      // column orthogonality: Σ_χ χ(C) conj χ(C') = δ |G|/|C|
      t.classes.forEach((c, a) =>
        t.classes.forEach((_, b) => {
          let re = 0
          let im = 0
          for (const r of t.irreps) {
            const [x0, x1] = r.chi[a]!
            const [y0, y1] = eConj(r.chi[b]!)
            re += x0 * y0 - x1 * y1
            im += x0 * y1 + x1 * y0 - x1 * y1
          }
          expect([re, im], `classes ${a}, ${b}`).toEqual([a === b ? t.order / c.size : 0, 0])
        }),
      )
    })

    it(`${t.label}: power maps are consistent (ψ^r of every irrep is an integer combination of irreps, ψ^1 = id, ψ^{|G|} = dimension)`, () => {
      for (const r of t.irreps) {
        expect(adamsClass(t, r.chi, 1)).toEqual(r.chi)
        for (const p of [2, 3, 4, 5, 6]) {
          const psi = adamsClass(t, r.chi, p)
          for (let i = 0; i < t.irreps.length; i++) expect(Number.isInteger(irrepMultiplicity(t, psi, i))).toBe(true)
        }
        expect(adamsClass(t, r.chi, t.order).every((x) => x[0] === r.chi[0]![0] && x[1] === 0)).toBe(true)
      }
    })
  }
})

describe('tensor products and reality (Ishimori et al., Prog. Theor. Phys. Suppl. 183 (2010) 1)', () => {
  it('A4: 3 ⊗ 3 = 1 + 1′ + 1″ + 3 + 3; 1′ ⊗ 1′ = 1″ (Ma & Rajasekaran, Phys. Rev. D 64 (2001) 113012)', () => {
    expect(Object.fromEntries(finiteTensorProduct('A4', '3', '3'))).toEqual({ 1: 1, "1'": 1, "1''": 1, 3: 2 })
    expect(Object.fromEntries(finiteTensorProduct('A4', "1'", "1'"))).toEqual({ "1''": 1 })
  })

  it('S4: 3 ⊗ 3 = 1 + 2 + 3 + 3′; 2 ⊗ 2 = 1 + 1′ + 2; S3: 2 ⊗ 2 = 1 + 1′ + 2', () => {
    expect(Object.fromEntries(finiteTensorProduct('S4', '3', '3'))).toEqual({ 1: 1, 2: 1, 3: 1, "3'": 1 })
    expect(Object.fromEntries(finiteTensorProduct('S4', '2', '2'))).toEqual({ 1: 1, "1'": 1, 2: 1 })
    expect(Object.fromEntries(finiteTensorProduct('S3', '2', '2'))).toEqual({ 1: 1, "1'": 1, 2: 1 })
  })

  it('T′: 2 ⊗ 2 = 1 + 3, 2 ⊗ 2′ = 1′ + 3, 2 ⊗ 3 = 2 + 2′ + 2″; Q8: 2 ⊗ 2 = the four singlets', () => {
    expect(Object.fromEntries(finiteTensorProduct('Tprime', '2', '2'))).toEqual({ 1: 1, 3: 1 })
    expect(Object.fromEntries(finiteTensorProduct('Tprime', '2', "2'"))).toEqual({ "1'": 1, 3: 1 })
    expect(Object.fromEntries(finiteTensorProduct('Tprime', '2', '3'))).toEqual({ 2: 1, "2'": 1, "2''": 1 })
    expect(Object.fromEntries(finiteTensorProduct('Q8', '2', '2'))).toEqual({ '1++': 1, '1+-': 1, '1-+': 1, '1--': 1 })
  })

  it('Δ(27): 3 ⊗ 3 = 3̄ + 3̄ + 3̄ and 3 ⊗ 3̄ = the nine singlets (Branco, Gerard, Grimus, Phys. Lett. B 136 (1984) 383)', () => {
    expect(Object.fromEntries(finiteTensorProduct('Delta27', '3', '3'))).toEqual({ '3bar': 3 })
    const singlets = Object.fromEntries(finiteTensorProduct('Delta27', '3', '3bar'))
    expect(Object.keys(singlets)).toHaveLength(9)
    expect(Object.values(singlets).every((m) => m === 1)).toBe(true)
  })

  it('Frobenius–Schur indicators: T′ 2 pseudoreal and 2′ complex, Q8 2 pseudoreal, A4 1′ complex and 3 real, Δ(27) 3 complex, S4 all real', () => {
    expect(finiteReality('Tprime', '2')).toBe('pseudoreal')
    expect(finiteReality('Tprime', "2'")).toBe('complex')
    expect(finiteReality('Tprime', '3')).toBe('real')
    expect(finiteReality('Q8', '2')).toBe('pseudoreal')
    expect(finiteReality('A4', "1'")).toBe('complex')
    expect(finiteReality('A4', '3')).toBe('real')
    expect(finiteReality('Delta27', '3')).toBe('complex')
    expect(finiteReality('Delta27', '1_00')).toBe('real')
    for (const r of finiteGroup('S4').irreps) expect(finiteReality('S4', r.name)).toBe('real')
    const a4 = finiteGroup('A4')
    expect(a4.irreps[finiteConjugate(a4, 1)]!.name).toBe("1''")
  })

  it('an unknown irrep names the group and its irreps', () => {
    expect(() => finiteTensorProduct('A4', '4', '3')).toThrow(EngineInputError)
    expect(() => finiteTensorProduct('A4', '4', '3')).toThrow(`A4 has no irrep "4"; its irreps are 1, 1', 1'', 3`)
  })
})
