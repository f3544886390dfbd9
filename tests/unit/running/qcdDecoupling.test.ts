import { describe, expect, it } from 'vitest'
import { alphaSBelowThreshold, alphaSAboveThreshold, decouplingCoefficients, decouplingFactor } from '../../../server/engine/running/qcdDecoupling'
import { add, mul, parseRational, toString as ratText } from '../../../server/engine/exact/rational'
import { expectClose } from '../scales/expectClose'

const q = parseRational

describe('heavy-quark decoupling of α_s (Chetyrkin, Kniehl, Steinhauser, Nucl. Phys. B 510 (1998) 61)', () => {
  it('at μ = m_h the two-loop constant is +11/72 for the MS-bar mass and −7/24 for the pole mass', () => {
    expect(ratText(decouplingCoefficients('msbar').c2[0])).toBe('11/72')
    expect(ratText(decouplingCoefficients('pole').c2[0])).toBe('-7/24')
    expect(ratText(decouplingCoefficients('msbar').c1[0])).toBe('0')
  })

  it('the pole-mass relation follows from the MS-bar one with m(μ) = M[1 − (α_s/π)(4/3 + ln(μ²/M²))] (Gray, Broadhurst, Grafe, Schilcher, Z. Phys. C 48 (1990) 673, one-loop term)', () => {
    // ℓ = ln(μ²/m(μ)²) = L + a (8/3 + 2L): the O(a) term −ℓ/6 feeds a²(−(1/6)(8/3) − (1/6)·2 L).
    const ms = decouplingCoefficients('msbar')
    const os = decouplingCoefficients('pole')
    const c1L = ms.c1[1]
    expect(ratText(add(ms.c2[0], mul(c1L, q('8/3'))))).toBe(ratText(os.c2[0]))
    expect(ratText(add(ms.c2[1], mul(c1L, q('2'))))).toBe(ratText(os.c2[1]))
    expect(ratText(ms.c2[2])).toBe(ratText(os.c2[2]))
  })

  it('going down at μ = m_h (MS-bar): α^(n_f−1) = α^(n_f)[1 + (11/72)(α/π)²]; pole: 1 − (7/24)(α/π)²', () => {
    const a = 0.2245
    expectClose('msbar down', a, alphaSBelowThreshold(a, 0, 'msbar', 2), a * (1 + (11 / 72) * (a / Math.PI) ** 2), 1e-16)
    expectClose('pole down', a, alphaSBelowThreshold(a, 0, 'pole', 2), a * (1 - (7 / 24) * (a / Math.PI) ** 2), 1e-16)
    expect(alphaSBelowThreshold(a, 0, 'msbar', 1)).toBe(a)
  })

  it('the O(α_s) term is −(1/6) ln(μ²/m²) (CKS 1998)', () => {
    expectClose('one-loop log', 2, decouplingFactor(0.1, 2, 'msbar', 1), 1 - (0.1 * 2) / 6, 1e-15)
  })

  it('alphaSAboveThreshold inverts alphaSBelowThreshold (both kinds, several logs)', () => {
    for (const kind of ['msbar', 'pole'] as const)
      for (const L of [-1, 0, 0.7]) {
        const a = 0.3
        expectClose(`${kind} L=${L}`, { a, L }, alphaSAboveThreshold(alphaSBelowThreshold(a, L, kind, 2), L, kind, 2), a, 1e-15)
      }
  })

  it('rejects bad loop numbers and mass kinds', () => {
    expect(() => decouplingFactor(0.1, 0, 'msbar', 3 as never)).toThrow('The decoupling loops must be 1 or 2, not 3')
    expect(() => decouplingCoefficients('kinetic' as never)).toThrow('A heavy-quark mass is an MS-bar mass ("msbar") or a pole mass ("pole"), not "kinetic"')
  })
})
