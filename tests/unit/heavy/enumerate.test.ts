import { describe, expect, it } from 'vitest'
import { enumerateHeavy, verifyConventional, CONVENTIONAL_OPERATORS, type HeavyInput } from '../../../server/engine/heavy'
import { EngineCancelledError, EngineInputError } from '../../../server/engine/errors'
import { isZero } from '../../../server/engine/exact/rational'

const qedLike: HeavyInput = {
  heavy: { particle: { name: 'psi', charges: { X: '1' } }, gaugeGroup: 'X', maxOrder: 3 },
  groups: [{ name: 'X', type: 'U1', gauge: true }],
}

describe('heavy fermion coupled to an abelian gauge field: bilinears ψ†…ψ modulo EOM and IBP', () => {
  const res = enumerateHeavy(qedLike)
  const byOrder = (n: number) => res.orders.find((o) => o.order === n)!

  it('1/m: two operators, spanning exactly {D²/2m, σ·B/2m} (Caswell, Lepage, Phys. Lett. B 167 (1986) 437)', () => {
    expect(byOrder(1).count).toBe(2)
    const v = verifyConventional(1)
    expect(v.rank).toBe(2)
    expect(v.spans).toBe(true)
    expect(v.rewrites.map((r) => r.id)).toEqual(['kinetic', 'fermi'])
    // each published operator is a non-zero exact combination of the enumerated basis
    for (const r of v.rewrites) expect(r.coefficients.some((c) => !isZero(c))).toBe(true)
  })

  it('1/m²: two operators, spanning exactly {Darwin [D·E], spin–orbit iσ·(D×E − E×D)} (Caswell, Lepage 1986; Manohar, Phys. Rev. D 56 (1997) 230)', () => {
    expect(byOrder(2).count).toBe(2)
    const v = verifyConventional(2)
    expect(v.rank).toBe(2)
    expect(v.spans).toBe(true)
  })

  it('1/m³: seven operators, spanning exactly D⁴, {D²,σ·B}, D^iσ·BD^i, σ·D B·D + B·D σ·D, {D^i,(∇×B)^i}, B²−E², E² (Manohar 1997; Hill, Lee, Paz, Solon, Phys. Rev. D 87 (2013) 053017)', () => {
    expect(byOrder(3).count).toBe(7)
    const v = verifyConventional(3)
    expect(v.rank).toBe(7) // the published list is independent modulo EOM + IBP
    expect(v.dimension).toBe(7)
    expect(v.spans).toBe(true)
    expect(v.rewrites).toHaveLength(7)
    for (const r of v.rewrites) expect(r.coefficients.some((c) => !isZero(c))).toBe(true)
  })

  it('every order reports that the published operators span the enumerated basis', () => {
    expect(res.orders.map((o) => o.conventionalSpansBasis)).toEqual([true, true, true])
  })

  it('the gauge field EOM note sits on Darwin and {D^i,(∇×B)^i} only (Gauss and Ampère laws; Manohar 1997)', () => {
    const noted = CONVENTIONAL_OPERATORS.filter((c) => c.gaugeEomNote).map((c) => c.id)
    expect(noted).toEqual(['darwin', 'M'])
  })

  it('reparametrization relations are attached to the operators they constrain (Luke, Manohar, Phys. Lett. B 286 (1992) 348; Manohar 1997; Hill et al. 2013)', () => {
    const rel = (id: string) =>
      byOrder(CONVENTIONAL_OPERATORS.find((c) => c.id === id)!.order)
        .conventional.find((c) => c.id === id)!
        .relations.map((r) => r.relation)
    expect(rel('kinetic')).toEqual(['c_k = 1'])
    expect(rel('spinOrbit')).toEqual(['c_S = 2 c_F − 1'])
    expect(rel('W2')).toEqual(['c_{W2} = c_{W1} − 1']) // with W2 printed as −c_{W2} D^iσ·BD^i/4m³ (thomasBmt.test.ts)
    expect(rel('pp')).toEqual(["c_{p'p} = c_F − 1"])
    expect(rel('fermi')).toEqual([])
  })

  it('on the enumerated basis, exactly one 1/m² and one 1/m³ operator carry the gauge-EOM note (Darwin, c_M) (Manohar 1997)', () => {
    const noted = (n: number) =>
      byOrder(n)
        .basis.filter((b) => b.gaugeEomNote)
        .map((b) => b.gaugeEomNote!.split(':')[0])
    expect(noted(1)).toEqual([])
    expect(noted(2)).toEqual(['involves darwin'])
    expect(noted(3)).toEqual(['involves M'])
  })

  it('explains what modulo EOM removes', () => {
    expect(res.eomNote).toContain('D_t acting on ψ')
    expect(res.leading.latex).toContain('iD_t')
  })
})

describe('neutral heavy fermion and the antiparticle sector', () => {
  it('a neutral fermion keeps only the free kinetic expansion p²/2m, p⁴/8m³ (common practice: expansion of √(p²+m²))', () => {
    const r = enumerateHeavy({ heavy: { particle: { name: 'psi', charges: { X: '0' } }, gaugeGroup: 'X', maxOrder: 3 } })
    expect(r.charged).toBe(false)
    expect(r.orders.map((o) => o.count)).toEqual([1, 0, 1])
  })
  it('with χ present: two four-fermion operators at 1/m² (Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125, colour-singlet ¹S₀ and ³S₁)', () => {
    const r = enumerateHeavy({ ...qedLike, heavy: { ...qedLike.heavy, antiparticle: { name: 'chi' }, maxOrder: 2 } })
    expect(r.fourFermion).toHaveLength(2)
    expect(r.fourFermion.every((o) => o.order === 2)).toBe(true)
    expect(r.antiparticleNote).toContain('Bodwin, Braaten, Lepage convention')
  })
})

describe('bad input and cancellation', () => {
  it('a discrete gauge group is rejected with the group named', () => {
    expect(() => enumerateHeavy({ ...qedLike, groups: [{ name: 'X', type: 'Z', n: 2 }] })).toThrow(EngineInputError)
    expect(() => enumerateHeavy({ ...qedLike, groups: [{ name: 'X', type: 'Z', n: 2 }] })).toThrow('The heavy particle couples to "X", a discrete Z_2 group; it needs a U(1) or SU(N) gauge group')
  })
  it('SU(N): only (anti)fundamental heavy particles', () => {
    const su3 = { heavy: { particle: { name: 'psi', reps: { C: [1, 1] } }, gaugeGroup: 'C', maxOrder: 3 }, groups: [{ name: 'C', type: 'SU', n: 3 }] }
    expect(() => enumerateHeavy(su3)).toThrow('The heavy particle must be a fundamental or an antifundamental of SU(3), but its Dynkin labels are [1,1]')
  })
  it('unknown gauge group', () => {
    expect(() => enumerateHeavy({ ...qedLike, groups: [{ name: 'Y', type: 'U1' }] })).toThrow('The heavy particle couples to "X", which is not a symmetry of the theory')
  })
  it('aborted runs throw EngineCancelledError and progress is reported', () => {
    const seen: string[] = []
    enumerateHeavy({ ...qedLike, heavy: { ...qedLike.heavy, maxOrder: 2 } }, { onProgress: (_f, l) => seen.push(l) })
    expect(seen).toEqual(['order 1/m^1', 'order 1/m^2', 'done'])
    expect(() => enumerateHeavy(qedLike, { signal: { aborted: true } })).toThrow(EngineCancelledError)
  })
})

describe('charge conjugation with both ψ and χ', () => {
  it('lists one χ-bilinear per ψ-bilinear, coefficient fixed by charge conjugation: (−1)^n at 1/m^n (common practice: C invariance of the relativistic theory; derived in antiparticle.test.ts)', () => {
    const r = enumerateHeavy({ ...qedLike, heavy: { ...qedLike.heavy, antiparticle: { name: 'chi' }, maxOrder: 2 } })
    for (const o of r.orders) {
      expect(o.antiparticle).toHaveLength(o.count)
      expect(o.antiparticle.every((a) => a.latex.includes('\\chi') && !a.latex.includes('\\psi'))).toBe(true)
      expect(o.antiparticle.every((a) => a.terms[0]!.chi === 1 && a.terms[0]!['chi*'] === 1)).toBe(true)
    }
    expect(r.orders[0]!.antiparticle[0]!.relations[0]!.relation).toBe('c(m1.1.C) = −c(m1.1)')
    expect(r.orders[1]!.antiparticle[0]!.relations[0]!.relation).toBe('c(m2.1.C) = c(m2.1)')
  })
})
