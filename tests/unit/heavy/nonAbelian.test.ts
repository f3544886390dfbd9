import { describe, expect, it } from 'vitest'
import { enumerateHeavy, combo, expandCombo, orderSpace } from '../../../server/engine/heavy'

const su = (n: number, rep: number[]) => ({
  heavy: { particle: { name: 'psi', reps: { C: rep } }, antiparticle: { name: 'chi' }, gaugeGroup: 'C', maxOrder: 3 },
  groups: [{ name: 'C', type: 'SU', n }],
})

describe('heavy quark in the fundamental of SU(N) (NRQCD-type bilinears)', () => {
  it("SU(3): 2, 2 and 11 operators at 1/m, 1/m², 1/m³ — c_k, c_F; c_D, c_S; c_4, c_W1, c_W2, c_p'p, c_M, c_A1–c_A4, c_B1, c_B2 (from memory: Manohar, Phys. Rev. D 56 (1997) 230)", () => {
    const r = enumerateHeavy(su(3, [1, 0]))
    expect(r.colorN).toBe(3)
    expect(r.orders.map((o) => o.count)).toEqual([2, 2, 11])
  })
  it('an antifundamental heavy antiquark field gives the same counts (common practice)', () => {
    expect(enumerateHeavy(su(3, [0, 1])).orders.map((o) => o.count)).toEqual([2, 2, 11])
  })
  it('SU(2): the symmetric d-symbol vanishes, so the two d-type two-field-strength operators drop: 9 at 1/m³ (common practice: d^{abc} = 0 for SU(2))', () => {
    expect(enumerateHeavy(su(2, [1])).orders.map((o) => o.count)).toEqual([2, 2, 9])
  })
  it('σ·(E×E) vanishes for an abelian field but not for SU(3) (common practice: [E_i, E_j] ≠ 0)', () => {
    const e = expandCombo(combo([[1, 's_k eps_kij E_i E_j']]))
    expect(orderSpace(3, true).space.isNull(e)).toBe(true)
    expect(orderSpace(3, true, undefined, 3).space.isNull(e)).toBe(false)
  })
  it('tr(E·E) and the matrix product E·E are independent for SU(3) but proportional for SU(2) (common practice: {T^a,T^b} = δ^{ab}/2 for SU(2))', () => {
    const tr = expandCombo(combo([[1, 'tr E_k E_k']]))
    const mat = expandCombo(combo([[1, 'E_k E_k']]))
    const pair = (n: number) => {
      const s = orderSpace(3, true, undefined, n).space
      const a = s.rewrite(tr)
      const b = s.rewrite(mat)
      return a.map((x, i) => [x, b[i]!] as const)
    }
    const prop = (rows: ReturnType<typeof pair>) => {
      // b = λ a for some λ: all 2×2 minors vanish
      for (const [a1, b1] of rows)
        for (const [a2, b2] of rows) {
          if (a1.num * b2.num * a2.den * b1.den !== a2.num * b1.num * a1.den * b2.den) return false
        }
      return true
    }
    expect(prop(pair(2))).toBe(true)
    expect(prop(pair(3))).toBe(false)
  })
  it('four-fermion sector with χ: colour-singlet and colour-octet ¹S₀, ³S₁ at 1/m² (Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125)', () => {
    expect(enumerateHeavy(su(3, [1, 0])).fourFermion).toHaveLength(4)
  })
})

describe('published forms and relations for SU(N) (Manohar, Phys. Rev. D 56 (1997) 230, NRQCD part)', () => {
  const r3 = enumerateHeavy(su(3, [1, 0]))
  it('SU(3): the published lists span exactly at 1/m, 1/m², 1/m³ (11 at 1/m³: the abelian nine with colour-matrix E, B, plus tr(B² − E²), tr E², σ·(B×B − E×E), σ·(E×E))', () => {
    expect(r3.orders.map((o) => [o.conventional.length, o.conventionalSpansBasis, o.conventionalRedundant])).toEqual([
      [2, true, 0],
      [2, true, 0],
      [11, true, 0],
    ])
  })
  it("the reparametrization relations are those of the abelian case (c_k = 1, c_S = 2c_F − 1, c_4 = 1, c_W2 = c_W1 − 1, c_p'p = c_F − 1)", () => {
    const rel = r3.orders.flatMap((o) => o.conventional).flatMap((c) => c.relations.map((x) => x.relation))
    expect(rel).toEqual(['c_k = 1', 'c_S = 2 c_F − 1', 'c_4 = 1', 'c_{W2} = c_{W1} − 1', "c_{p'p} = c_F − 1"])
  })
  it('SU(2): the same list spans the 9 operators at 1/m³ with two redundant (common practice: d^{abc} = 0)', () => {
    const r2 = enumerateHeavy(su(2, [1]))
    expect([r2.orders[2]!.conventionalSpansBasis, r2.orders[2]!.conventionalRedundant]).toEqual([true, 2])
  })
  it('the χ copies of SU(N) operators follow the same (−1)^n rule (charge conjugation A → −Aᵀ keeps C = −† in the real algebra; antiparticle.ts)', () => {
    for (const o of r3.orders) for (const a of o.antiparticle) expect(a.fixedBy!.factor).toBe((-1) ** o.order)
  })
})
