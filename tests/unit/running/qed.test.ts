import { describe, expect, it } from 'vitest'
import { alphaQedAtZ, leptonicShiftOneLoop } from '../../../server/engine/running/alphaQedAtZ'
import { chargeWeight, runAlphaQED } from '../../../server/engine/running/runAlphaQED'
import { CHARGED_LEPTONS, QED_FERMIONS, QUARKS } from '../../../server/engine/running/qedFermions'
import { ALPHA_INVERSE } from '../../../server/engine/scales/codata2018'
import { sum, toString as ratText } from '../../../server/engine/exact/rational'
import { fieldBetaContribution } from '../../../server/engine/scales/thresholdShifts'
import { expectClose } from '../scales/expectClose'

const MZ_1998 = 91.1876 // M_Z as used by the product owner (PDG 2022 value)
const CAUTION = 'estimates and leading-order formulas; check against the literature for precision work'

describe('leptonic shift Δα_lep(M_Z²) at one loop', () => {
  it('(α/3π) Σ_l [ln(M_Z²/m_l²) − 5/3] ≈ 0.03142 (product-owner figure; Steinhauser, Phys. Lett. B 429 (1998) 158, one-loop part)', () => {
    expectClose('Δα_lep one loop', MZ_1998, leptonicShiftOneLoop(MZ_1998), 0.03142, 1e-5)
  })

  it("equals Steinhauser's three-loop 0.031498 minus his two-loop ≈ 0.78e-4 (three-loop ≈ 1e-6 neglected) (Steinhauser, Phys. Lett. B 429 (1998) 158)", () => {
    expectClose('Δα_lep vs Steinhauser', MZ_1998, leptonicShiftOneLoop(MZ_1998), 0.031498 - 0.000078, 1.5e-5)
  })

  it('rejects a non-positive scale', () => {
    expect(() => leptonicShiftOneLoop(0)).toThrow('The scale μ (GeV) must be a positive number, but it is 0')
  })
})

describe('α(M_Z) with the hadronic shift Δα_had^(5) = 0.02766 as an input', () => {
  const r = alphaQedAtZ({ deltaAlphaHad5: 0.02766, mZ: MZ_1998 })

  it('on-shell α(M_Z)^-1 = α(0)^-1 (1 − Δα_lep − Δα_had) ≈ 128.9 (PDG electroweak review; from memory)', () => {
    expectClose('on-shell α^-1(M_Z)', 0.02766, r.onShell.alphaInverse, 128.9, 0.06)
    expectClose('on-shell formula', 0.02766, r.onShell.alphaInverse, ALPHA_INVERSE * (1 - r.deltaAlphaLeptonic - 0.02766), 1e-12)
  })

  it('MS-bar α̂(M_Z)^-1 ≈ 127.95 ± 0.03 (PDG electroweak review: 127.951)', () => {
    expectClose('MS-bar α^-1(M_Z)', 0.02766, r.msbar.alphaInverse, 127.951, 0.03)
  })

  it('the 100/27 in the MS-bar conversion is the sum of the −5/3 constants: (5/9) Σ N_c Q² over e, μ, τ, u, d, s, c, b = 100/27 (common practice)', () => {
    const light = QED_FERMIONS.filter((f) => f.name !== 't')
    expect(ratText(sum(light.map(chargeWeight)))).toBe('20/3')
  })

  it('says what is computed and what is input, with the caution text', () => {
    expect(r.computed).toContain('Δα_lep at one loop')
    expect(r.inputs.deltaAlphaHad5).toEqual({ value: 0.02766, source: 'user (e.g. PDG electroweak review)' })
    expect(r.inputs.alphaInverse0!.source).toBe('CODATA 2018')
    expect(r.caution).toBe(CAUTION)
  })

  it('rejects an impossible hadronic shift or W heavier than Z', () => {
    expect(() => alphaQedAtZ({ deltaAlphaHad5: -1 })).toThrow('The hadronic shift Δα_had⁽⁵⁾(M_Z²) must be a number from 0 to 0.1, but it is -1')
    expect(() => alphaQedAtZ({ deltaAlphaHad5: 0.0276, mW: 95 })).toThrow('M_W = 95 GeV must be below M_Z = 91.188 GeV')
  })
})

describe('runAlphaQED: one loop with step-function thresholds', () => {
  it('α stays α(0) below the electron mass (CODATA 2018 Thomson limit)', () => {
    expect(runAlphaQED({ muTo: 1e-4 }).alphaInverse).toBe(ALPHA_INVERSE)
  })

  it('leptons only: differs from the on-shell shift by exactly the −5/3 constants, 3 × (α/3π)(5/3) (Steinhauser 1998 formula vs leading logs)', () => {
    const r = runAlphaQED({ muTo: MZ_1998, fermions: CHARGED_LEPTONS })
    const onShellLike = ALPHA_INVERSE * (1 - leptonicShiftOneLoop(MZ_1998) - (3 * 5) / (3 * 3 * Math.PI * ALPHA_INVERSE))
    expectClose('steps vs on-shell', MZ_1998, r.alphaInverse, onShellLike, 1e-10)
  })

  it('quarks enter with N_c Q²: u 4/3, d 1/3; five light quarks give R = 11/3 (PDG QCD review, R ratio at leading order)', () => {
    expect(ratText(chargeWeight(QUARKS.find((q) => q.name === 'u')!))).toBe('4/3')
    expect(ratText(chargeWeight(QUARKS.find((q) => q.name === 'b')!))).toBe('1/3')
    expect(ratText(sum(QUARKS.filter((q) => q.name !== 't').map(chargeWeight)))).toBe('11/3')
  })

  it('a b quark alone shifts α^-1 by (2/3π)(1/3) ln(μ/m_b) above m_b (common practice)', () => {
    const b = QUARKS.find((q) => q.name === 'b')!
    const r = runAlphaQED({ muTo: 40, fermions: [b] })
    expectClose('b step', 40, ALPHA_INVERSE - r.alphaInverse, (2 / (3 * Math.PI)) * (1 / 3) * Math.log(40 / b.mass), 1e-12)
  })

  it('returns a trace for plotting, the caution and the inputs', () => {
    const r = runAlphaQED({ muTo: MZ_1998 })
    expect(r.trace.at(-1)!.alphaInverse).toBeCloseTo(r.alphaInverse, 12)
    expect(r.trace.at(-1)!.activeFermions).toBe(8)
    expect(r.caution.startsWith(CAUTION)).toBe(true)
    expect(String(r.inputs.fermions)).toContain('CODATA 2018')
  })

  it('rejects bad input', () => {
    expect(() => runAlphaQED({ muTo: -1 })).toThrow('The wanted scale μ must be a positive number of GeV, but it is -1')
    expect(() => runAlphaQED({ muTo: 1, fermions: [{ ...CHARGED_LEPTONS[0]!, colours: 2 as never }] })).toThrow('Fermion "e" must come in 1 or 3 colours, not 2')
  })
})

describe('consistency with the gauge β coefficient of the threshold data', () => {
  it('a Dirac lepton (two Weyl fields of charge −1) gives b = 4/3 and dα^-1/d ln μ = −b/(2π) = −2/(3π) (Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83; Peskin & Schroeder §12.3)', () => {
    const qed = { name: 'QED', type: 'U1' as const, gauge: true }
    const b = (['left-weyl', 'right-weyl'] as const).map((l) => fieldBetaContribution({ name: `mu${l === 'left-weyl' ? 'L' : 'R'}`, lorentz: l, charges: { QED: '-1' } }, qed, [qed]))
    expect(ratText(sum(b))).toBe('4/3')
    const mu = CHARGED_LEPTONS[1]!
    const r = runAlphaQED({ muTo: mu.mass * Math.E, fermions: [mu] })
    expectClose('slope', 'e-fold above m_μ', r.alphaInverse - ALPHA_INVERSE, -(4 / 3) / (2 * Math.PI), 1e-13)
  })
})
