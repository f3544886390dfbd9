import { describe, expect, it } from 'vitest'
import { daggerField, enumerateFourField, fieldComboValue, sampleFieldPoint, type FieldCombo, type FieldStructure } from '../../../server/engine/heavy/fourField'
import { contactRank } from '../../../server/engine/heavy/contactSpace'

// (ψ†σ·Bχ)(χ†ψ): exchanged ordering, σ in the first bilinear, contracted with B.
const m1: FieldStructure = { ordering: 'exchanged', chain: 1, slots: ['s1', 'b'], pairs: [[0, 1]] }
const herm = (s: FieldStructure, sign = 1): FieldCombo => [
  { coef: 1, s, conj: false },
  { coef: sign, s: daggerField(s), conj: false },
]
// (ψ†σ·Bψ)(χ†χ) and (ψ†ψ)(χ†σ·Bχ)
const dPsi: FieldStructure = { ordering: 'direct', chain: 1, slots: ['s1', 'b'], pairs: [[0, 1]] }
const dChi: FieldStructure = { ordering: 'direct', chain: 1, slots: ['s2', 'b'], pairs: [[0, 1]] }

function rank(combos: FieldCombo[]): number {
  return contactRank({ size: combos.length, sample: (F, rng) => sampleFieldPoint(F, rng, 1), values: (F, x) => combos.map((c) => fieldComboValue(F, c, x)) }).basis.length
}

describe('four-fermion operators with a field strength at 1/m⁴', () => {
  const qed = enumerateFourField(1, 'psi', 'chi')
  it("QED: one operator, (ψ†σ·Bχ)(χ†ψ) + h.c., the magnetic-dipole ¹S₀ ↔ ³S₁ transition (the referee's missing operator; C(¹S₀) = +1, C(³S₁) = −1, C(γ) = −1: C-even, common practice)", () => {
    expect(qed.basis).toHaveLength(1)
    expect(qed.basis[0]!.latex).toContain('(\\psi^\\dagger \\sigma^{i} B^{i} \\chi)(\\chi^\\dagger \\psi)')
    expect(rank([...qed.combos, herm(m1)])).toBe(1) // lies in the C-even space
  })
  it('C(ψ†ψ) = −χ†χ and C(ψ†σ·Bψ) = −χ†σ·Bχ (antiparticle.ts; σ and B each C-odd), so C swaps the terms of (ψ†σ·Bψ)(χ†χ) ± (ψ†ψ)(χ†σ·Bχ): the sum is inside the C-even space, the difference outside (common practice)', () => {
    const plus: FieldCombo = [
      { coef: 1, s: dPsi, conj: false },
      { coef: 1, s: dChi, conj: false },
    ]
    const minus: FieldCombo = [
      { coef: 1, s: dPsi, conj: false },
      { coef: -1, s: dChi, conj: false },
    ]
    expect(rank([...qed.combos, plus])).toBe(1)
    expect(rank([...qed.combos, minus])).toBe(2)
  })
  it('without C: 2; without C and T: 3 (adds iε(ψ†σψ × χ†σχ)·B, T-odd; hand derivation, common practice)', () => {
    expect(enumerateFourField(1, 'psi', 'chi', { chargeConjugation: false }).basis).toHaveLength(2)
    expect(enumerateFourField(1, 'psi', 'chi', { chargeConjugation: false, timeReversal: false }).basis).toHaveLength(3)
  })
  it('SU(3): 4 (B^aT^a in either bilinear of either ordering, C pairs them: hand derivation, common practice); SU(2): 3 (its colour tensors obey one Fierz relation)', () => {
    expect(enumerateFourField(3, 'psi', 'chi').basis).toHaveLength(4)
    expect(enumerateFourField(2, 'psi', 'chi').basis).toHaveLength(3)
  })
})
