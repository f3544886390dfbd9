import { describe, expect, it } from 'vitest'
import { classBasis, rewriteOperator } from '../../../server/engine/basis/index'
import { rat } from '../../../server/engine/exact/rational'

const weyl = {
  name: 'four Weyl fermions',
  frame: 'relativistic' as const,
  groups: [],
  fields: ['a', 'b', 'c', 'd'].map((name) => ({ name, lorentz: 'left-weyl' as const })),
}
const oneWeyl = { name: 'one Weyl fermion', frame: 'relativistic' as const, groups: [], fields: [{ name: 'psi', lorentz: 'left-weyl' as const }] }

describe('Weyl fermions', () => {
  it('four distinct left-handed fermions (ψ1ψ2)(ψ3ψ4): 3 pairings, rank 2 (Schouten identity, common practice)', () => {
    const b = classBasis(weyl, 'a b c d')
    expect(b.candidates).toBe(3)
    expect(b.rank).toBe(2)
  })
  it('Fierz/Schouten: (ψ1ψ2)(ψ3ψ4) + (ψ1ψ3)(ψ4ψ2) + (ψ1ψ4)(ψ2ψ3) = 0 (common practice), by rewrite', () => {
    const b = classBasis(weyl, 'a b c d')
    expect(rewriteOperator(b, '<12><34> + <13><42> + <14><23>').vanishes).toBe(true)
    const r = rewriteOperator(b, '<14><23>')
    expect(r.coefficients.map((c) => c.operator)).toEqual(['<12><34>', '<13><24>'])
    expect(r.coefficients.map((c) => c.coefficient)).toEqual([rat(-1), rat(1)])
  })
  it('a vector current pair (ψ1†σ̄ψ2)(ψ3†σ̄ψ4) ↔ ⟨24⟩[13]: class a* b a* b style has one structure per pairing', () => {
    const b = classBasis(weyl, 'a a* b b*')
    expect(b.rank).toBe(1)
    // Fierz for currents: ⟨13⟩[24] and ⟨…⟩ forms are proportional (common practice)
    const r = rewriteOperator(b, '<13>[24]')
    expect(r.coefficients).toHaveLength(1)
  })
  it('one flavor of a Weyl fermion: (ψψ)(ψψ) vanishes by Fermi statistics; (ψψ)(ψ†ψ†) survives (common practice)', () => {
    expect(classBasis(oneWeyl, 'psi^4').rank).toBe(0)
    const b = classBasis(oneWeyl, 'psi^2 psi*^2')
    expect(b.rank).toBe(1)
    expect(b.selfConjugate).toBe(true)
  })
})
