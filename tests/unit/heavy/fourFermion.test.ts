import { describe, expect, it } from 'vitest'
import { enumerateFourFermion, enumerateHeavy, fourFermionSpace, conventionalFour, cOddMixing, fourCombo, expandArrows, parseFour } from '../../../server/engine/heavy'
import { conjugateFourCombo, daggerFourCombo, fourCandidates, type FourCombo } from '../../../server/engine/heavy/fourStructure'
import { conjugatePoint, evalFourCombo, pointTables, randomFourPoint } from '../../../server/engine/heavy/fourVertex'
import { PrimeField, SeededRandom, workingPrimes } from '../../../server/engine/finite'
import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../../../server/engine/errors'

const BBL = 'Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125'
const arrows = (text: string): FourCombo => fourCombo(expandArrows(text))

describe(`four-fermion contact operators at 1/m² (${BBL})`, () => {
  it('abelian: 2 operators, spanned exactly by ψ†χ χ†ψ and ψ†σχ·χ†σψ (¹S₀, ³S₁)', () => {
    const r = enumerateFourFermion(2, 1, 'psi', 'chi')
    expect(r.count).toBe(2)
    expect(r.conventional.map((c) => c.id)).toEqual(['O_1(1S0)', 'O_1(3S1)'])
    expect(r.conventionalRank).toBe(2)
    expect(r.conventionalSpansBasis).toBe(true)
  })
  it('SU(3) and SU(2): 4 operators, singlet and octet ¹S₀, ³S₁ spanning exactly', () => {
    for (const n of [3, 2]) {
      const r = enumerateFourFermion(2, n, 'psi', 'chi')
      expect(r.count).toBe(4)
      expect(r.conventional.map((c) => c.id)).toEqual(['O_1(1S0)', 'O_1(3S1)', 'O_8(1S0)', 'O_8(3S1)'])
      expect(r.conventionalSpansBasis).toBe(true)
    }
  })
  it('Fierz: (ψ†ψ)(χ†χ) = −½[ψ†χ χ†ψ + ψ†σχ·χ†σψ] for Grassmann fields (common practice: Fierz identity δδ = ½(δδ + σ·σ) crossed)', () => {
    const s = fourFermionSpace(2)
    expect(
      s.rankOf([
        fourCombo([
          [2, ''],
          [1, 'ex'],
          [1, 'ex s1_i s2_i'],
        ]),
      ]),
    ).toBe(0)
    expect(
      s.rankOf([
        fourCombo([
          [2, ''],
          [-1, 'ex'],
          [1, 'ex s1_i s2_i'],
        ]),
      ]),
    ).toBe(1)
  })
  it('colour Fierz: (ψ†T^Aψ)(χ†T^Aχ) = −½[ψ†χ χ†ψ-type with spin Fierz] − (1/2N)(ψ†ψ)(χ†χ), checked for N = 3 (common practice: T^A_ij T^A_kl = ½(δ_il δ_kj − δ_ij δ_kl/N))', () => {
    const s = fourFermionSpace(2, { colorN: 3 })
    // 12·oct + 2·(ψ†ψχ†χ) = 6·[crossed colour] = −3·[ex + ex σσ] ; crossed colour = singlet exchanged ordering
    expect(
      s.rankOf([
        fourCombo([
          [12, 'oct'],
          [2, ''],
          [3, 'ex'],
          [3, 'ex s1_i s2_i'],
        ]),
      ]),
    ).toBe(0)
  })
})

describe(`four-fermion contact operators at 1/m⁴ against the dimension-8 list of ${BBL}`, () => {
  const u1 = enumerateFourFermion(4, 1, 'psi', 'chi')
  it('with both pairs at rest: 7 = O(¹P₁), O(³P₀), O(³P₁), O(³P₂), P(¹S₀), P(³S₁), P(³S₁,³D₁), and the published seven span that space exactly', () => {
    expect(u1.restFrameCount).toBe(7)
    expect(u1.conventional.map((c) => c.id)).toEqual(['O_1(1P1)', 'O_1(3P0)', 'O_1(3P1)', 'O_1(3P2)', 'P_1(1S0)', 'P_1(3S1)', 'P_1(3S1,3D1)'])
    expect(u1.conventionalRank).toBe(7)
    expect(u1.conventionalSpansRestFrame).toBe(true)
  })
  it("in a general frame: 12 operators (hand derivation, common practice: SO(3) Clebsch–Gordan count in q, q', P with †, T, C); the published seven lie inside but miss the 5 depending on the pair momentum P", () => {
    expect(u1.count).toBe(12)
    expect(u1.conventionalInBasis).toBe(true)
    expect(u1.conventionalSpansBasis).toBe(false)
  })
  it('SU(3): 14 at rest (seven singlet, seven octet, as listed by BBL) and 24 in a general frame', () => {
    const r = enumerateFourFermion(4, 3, 'psi', 'chi')
    expect([r.restFrameCount, r.count, r.conventionalRank]).toEqual([14, 24, 14])
    expect(r.conventionalSpansRestFrame).toBe(true)
  })
  it('without charge conjugation one more rest-frame operator appears: the C-odd ¹P₁–³P₁ transition (hand derivation, common practice: C = (−1)^{L+S})', () => {
    expect(u1.restFrameCountWithoutC).toBe(8)
    expect(u1.countWithoutC).toBe(17)
    expect(fourFermionSpace(4, { restFrame: true }).contains([cOddMixing()])).toBe(false)
    expect(fourFermionSpace(4, { restFrame: true, chargeConjugation: false }).contains([cOddMixing()])).toBe(true)
  })
  it('a T-odd Hermitian operator i[ψ†χ χ†D⃡²ψ − h.c.] is outside the T-even space and inside the unrestricted one (common practice)', () => {
    const base = arrows('ex R_i R_i')
    const todd = [...base, ...daggerFourCombo(base).map((t) => ({ coef: -t.coef, s: t.s }))]
    expect(fourFermionSpace(4).contains([todd])).toBe(false)
    expect(fourFermionSpace(4, { timeReversal: false, chargeConjugation: false }).contains([todd])).toBe(true)
  })
  it('without T and C every Hermitian operator counts: 27 in general, 12 at rest (hand derivation, common practice: Sym²(3 vectors) = 6·l0 + 3·l1 + 6·l2 times spin 1, σ, σ, σ⊗σ)', () => {
    expect(fourFermionSpace(4, { timeReversal: false, chargeConjugation: false }).dimension).toBe(27)
    expect(fourFermionSpace(4, { timeReversal: false, chargeConjugation: false, restFrame: true }).dimension).toBe(12)
  })
  it('a total derivative has a vanishing vertex (IBP): ∂_i∂_i acting on the whole product, summed over legs (common practice)', () => {
    const legs = [0, 1, 2, 3]
    const total = legs.flatMap((a) => legs.map((b): [number, string] => [1, `ex d${a}_i d${b}_i`]))
    expect(fourFermionSpace(4).rankOf([fourCombo(total)])).toBe(0)
    expect(fourFermionSpace(4).rankOf([fourCombo([[1, 'ex d0_i d1_i']])])).toBe(1)
  })
})

describe('consistency of the symmetry operations', () => {
  it('charge conjugation on structures agrees with the vertex at the conjugated point (common practice: Ψ → iγ²Ψ*, Peskin & Schroeder §3.6)', () => {
    const F = new PrimeField(workingPrimes(1)[0]!)
    const pt = randomFourPoint(F, new SeededRandom(7), 3)
    const cp = conjugatePoint(F, pt)
    for (const s of fourCandidates(2, ['singlet', 'octet'])) {
      const c: FourCombo = [{ coef: 1, s }]
      expect(evalFourCombo(F, conjugateFourCombo(c), pt, pointTables(F, pt))).toBe(evalFourCombo(F, c, cp, pointTables(F, cp)))
    }
  })
  it('the published operators are C-even and Hermitian as structures (BBL)', () => {
    const s = fourFermionSpace(4, { chargeConjugation: false, timeReversal: false })
    for (const c of conventionalFour(4, 1)) {
      expect(s.rankOf([c.combo, conjugateFourCombo(c.combo)])).toBe(1)
      expect(s.rankOf([c.combo, daggerFourCombo(c.combo)])).toBe(1)
    }
  })
})

describe('faithfulness of the random-point evaluation', () => {
  it('more points do not change the rank or the greedy basis; neither does another seed (common practice: Schwartz–Zippel)', () => {
    const a = fourFermionSpace(4)
    const b = fourFermionSpace(4, { extraPoints: 40 })
    const c = fourFermionSpace(4, { seed: 99 })
    expect(b.basis).toEqual(a.basis)
    expect(c.basis).toEqual(a.basis)
  })
})

describe('four-fermion sector inside enumerateHeavy', () => {
  const u1 = { heavy: { particle: { name: 'psi', charges: { X: '1' } }, antiparticle: { name: 'chi' }, gaugeGroup: 'X', maxOrder: 4 }, groups: [{ name: 'X', type: 'U1' }] }
  it('abelian, maxOrder 4: 2 operators at 1/m² and 12 + 1 (with B) at 1/m⁴, with a note on IBP and EOM (BBL for 1/m²; counts as above and in fourField.test.ts)', () => {
    const r = enumerateHeavy(u1)
    expect(r.fourFermion.map((o) => o.order)).toEqual([2, 2, ...new Array(13).fill(4)])
    expect(r.fourFermionOrders.map((o) => o.count)).toEqual([2, 12])
    expect(r.fourFermion.every((o) => o.sector === 'fourFermion' && o.relations.length === 0 && o.terms[0]!.chi === 1)).toBe(true)
    expect(r.fourFermionNote).toContain('four leg momenta sum to zero')
    expect(r.fourFermionNote).toContain('D_t never appears')
  })
  it('latex and building blocks of the leading operators', () => {
    const r = enumerateHeavy({ ...u1, heavy: { ...u1.heavy, maxOrder: 2 } })
    expect(r.fourFermion.map((o) => o.latex)).toEqual(['(\\psi^\\dagger \\chi)(\\chi^\\dagger \\psi)/m^{2}', '(\\psi^\\dagger \\sigma^{i} \\chi)(\\chi^\\dagger \\sigma^{i} \\psi)/m^{2}'])
    expect(r.fourFermion[1]!.terms).toEqual([{ psi: 1, 'psi*': 1, chi: 1, 'chi*': 1, sigma: 2 }])
  })
  it('no antiparticle, no four-fermion sector', () => {
    const r = enumerateHeavy({ ...u1, heavy: { particle: u1.heavy.particle, gaugeGroup: 'X', maxOrder: 2 } })
    expect(r.fourFermion).toEqual([])
    expect(r.fourFermionOrders).toEqual([])
  })
})

describe('bad input and cancellation', () => {
  it('orders other than 2 and 4 are refused with the value named', () => {
    expect(() => enumerateFourFermion(3, 1, 'psi', 'chi')).toThrow(EngineInputError)
    expect(() => enumerateFourFermion(3, 1, 'psi', 'chi')).toThrow('Four-fermion contact operators (parity even) come at orders 2 and 4 in 1/m, not at order 3')
    expect(() => fourFermionSpace(6)).toThrow('Four-fermion contact operators are enumerated at orders 2 and 4 in 1/m, not at order 6')
    expect(() => fourFermionSpace(2, { colorN: 0 })).toThrow('The number of colours must be a whole number from 1 to 8, not 0')
  })
  it('the structure parser names the bad token', () => {
    expect(() => parseFour('ex q1_i')).toThrow(new EngineConsistencyError('parseFour', 'unknown token "q1_i" in "ex q1_i"'))
    expect(() => parseFour('ex d1_i')).toThrow('index i is not contracted in "ex d1_i"')
    expect(() => parseFour('s1_i s1_i')).toThrow('two σ in one bilinear ("s1_i") in "s1_i s1_i"')
  })
  it('an aborted run throws EngineCancelledError', () => {
    expect(() => enumerateFourFermion(4, 2, 'psi', 'chi', { aborted: true })).toThrow(EngineCancelledError)
  })
})
