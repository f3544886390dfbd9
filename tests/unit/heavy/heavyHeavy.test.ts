import { describe, expect, it } from 'vitest'
import { enumerateHeavy } from '../../../server/engine/heavy'
import { enumerateHeavyHeavy } from '../../../server/engine/heavy/heavyHeavy'
import { EngineInputError } from '../../../server/engine/errors'

const GPSV = 'Girlanda, Pastore, Schiavilla, Viviani, Phys. Rev. C 81 (2010) 034005'

describe('contact operators of two heavy particles of the same kind (ψ†ψ)(ψ†ψ)', () => {
  it(`an SU(2) doublet (two nucleons with isospin): 2 at 1/m² (C_S, C_T) and 7 at 1/m⁴ in the pair's rest frame (${GPSV})`, () => {
    const lo = enumerateHeavyHeavy(2, 2, 'N', true)
    expect([lo.count, lo.restFrameCount]).toEqual([2, 2])
    expect(lo.basis.map((b) => b.latex)).toEqual(['(N^\\dagger N)(N^\\dagger N)/m^{2}', '(N^\\dagger \\sigma^{i} N)(N^\\dagger \\sigma^{i} N)/m^{2}'])
    expect(enumerateHeavyHeavy(4, 2, 'N', true).restFrameCount).toBe(7)
  })
  it('one species without internal index: 1 at 1/m² (¹S₀; (ψ†σψ)² = −3(ψ†ψ)² by Fierz) and 4 at 1/m⁴ at rest (¹S₀ with p², ³P₀, ³P₁, ³P₂; hand derivation, common practice: Pauli principle allows S = 0 with even L, S = 1 with odd L)', () => {
    expect(enumerateHeavyHeavy(2, 1, 'psi', true).count).toBe(1)
    expect(enumerateHeavyHeavy(4, 1, 'psi', true).restFrameCount).toBe(4)
  })
  it('SU(3) fundamentals: 2 at 1/m² (antisymmetric 3̄ with spin 1, symmetric 6 with spin 0; common practice: Λ²(2⊗3) = (1,6) ⊕ (3,3̄))', () => {
    expect(enumerateHeavyHeavy(2, 3, 'Q', true).count).toBe(2)
  })
  it('the sector appears in enumerateHeavy with its note', () => {
    const r = enumerateHeavy({ heavy: { particle: { name: 'psi', charges: { X: '1' } }, gaugeGroup: 'X', maxOrder: 2 } })
    expect(r.heavyHeavy.map((h) => [h.order, h.count])).toEqual([[2, 1]])
    expect(r.heavyHeavyNote).toContain('antisymmetrised')
  })
  it('orders other than 2 and 4 are refused', () => {
    expect(() => enumerateHeavyHeavy(3, 1, 'psi', true)).toThrow(EngineInputError)
    expect(() => enumerateHeavyHeavy(3, 1, 'psi', true)).toThrow('Heavy–heavy contact operators (parity even) come at orders 2 and 4 in 1/m, not at order 3')
  })
})
