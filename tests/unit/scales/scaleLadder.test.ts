import { describe, expect, it } from 'vitest'
import { buildScaleLadder } from '../../../server/engine/scales/scaleLadder'
import { parseDecimal } from '../../../server/engine/scales/decimal'
import { div, mul, parseRational, rat, toString as ratText } from '../../../server/engine/exact/rational'
import { powRational } from '../../../server/engine/scales/derivedScales'
import { leadingOrderOf, suppressionPower } from '../../../shared/physics/leadingOrder'
import { ALPHA_INVERSE_TEXT, ELECTRON_MASS_MEV_TEXT, PROTON_ELECTRON_MASS_RATIO, PROTON_MASS_MEV_TEXT, RYDBERG_ENERGY_EV } from '../../../server/engine/scales/codata2018'
import { expectClose } from './expectClose'

/** Hydrogen-like atom: scales from CODATA 2018, m_b from PDG 2024 (MS-bar mass 4.18 GeV as quoted by the product owner). */
const hydrogen = {
  scales: [
    { name: 'me', value: ELECTRON_MASS_MEV_TEXT, unit: 'MeV' as const },
    { name: 'mp', value: PROTON_MASS_MEV_TEXT, unit: 'MeV' as const },
    { name: 'mb', value: '4.18', unit: 'GeV' as const },
  ],
  parameters: [
    { name: 'alpha', numerator: '1', denominator: ALPHA_INVERSE_TEXT },
    { name: 'me_mp', numerator: 'me', denominator: 'mp' },
    { name: 'me_mb', numerator: 'me', denominator: 'mb' },
  ],
  derived: [
    { name: 'Ry', from: 'me', factor: '1/2', powers: { alpha: 2 }, unit: 'eV' as const },
    { name: 'pBohr', from: 'me', powers: { alpha: 1 }, unit: 'keV' as const },
  ],
  precisionTarget: 1e-6,
}

describe('buildScaleLadder: hydrogen-like scales', () => {
  const ladder = buildScaleLadder(hydrogen, [0, 1, 2, { order: 'heavy-b', powers: { me_mb: 2 } }, { order: 'recoil', powers: { me_mp: 1 } }])

  it('½ m_e α² is the Rydberg energy 13.6057 eV (CODATA 2018 R∞hc = 13.605693122994 eV)', () => {
    const ry = ladder.derived.find((d) => d.name === 'Ry')!
    expectClose('Rydberg', hydrogen.derived[0], ry.value, RYDBERG_ENERGY_EV, 1e-9, true)
    expect(ry.unit).toBe('eV')
  })

  it('m_e α ≈ 3.73 keV (CODATA 2018 inputs; common practice)', () => {
    const p = ladder.derived.find((d) => d.name === 'pBohr')!
    expectClose('m_e α', hydrogen.derived[1], p.value, 3.7289, 5e-4)
  })

  it('m_e/m_p = 1/1836.15267343 (CODATA 2018 proton-electron mass ratio), exact from the printed masses', () => {
    const r = ladder.parameters.find((p) => p.name === 'me_mp')!
    expectClose('m_e/m_p', 'me/mp', r.value, 1 / PROTON_ELECTRON_MASS_RATIO, 1e-9, true)
    const exact = div(parseDecimal(ELECTRON_MASS_MEV_TEXT), parseDecimal(PROTON_MASS_MEV_TEXT))
    expect(r.exact).toBe(ratText(exact))
  })

  it('a correction suppressed by (m_e/m_b)², m_b = 4.18 GeV (PDG MS-bar mass), is of order 1e-8 (common practice)', () => {
    const o = ladder.orders.find((x) => x.order === 'heavy-b')!
    expect(Math.floor(Math.log10(o.estimate)), `estimate ${o.estimate}`).toBe(-8)
    const r = div(parseDecimal('0.51099895000'), parseDecimal('4180'))
    expect(o.exactEstimate).toBe(ratText(mul(r, r)))
    expect(o.belowTarget).toBe(true)
  })

  it('plain orders count powers of the first parameter (α^n) and the target marks those below 1e-6 (common practice)', () => {
    const [o0, o1, o2] = ladder.orders
    expect(o0).toEqual({ order: 0, estimate: 1, exactEstimate: '1', belowTarget: false })
    expect(o1!.exactEstimate).toBe(ratText(parseRational('1000000000/137035999084')))
    expectClose('α²', 2, o2!.estimate, 1 / 137.035999084 ** 2, 1e-12, true)
    expect(o2!.belowTarget).toBe(false)
    expect(ladder.orders.find((x) => x.order === 'recoil')!.belowTarget).toBe(false)
  })

  it('sorts scales from highest to lowest energy', () => {
    expect(ladder.scales.map((s) => s.name)).toEqual(['mb', 'mp', 'me'])
    expect(ladder.scales[0]!.exactMeV).toBe('4180')
  })
})

describe('buildScaleLadder: mass-ratio rule (E/M)^n', () => {
  it('E = 1 GeV, M = 1 TeV gives (1/1000)^n exactly (common practice)', () => {
    const l = buildScaleLadder(
      {
        scales: [
          { name: 'E', value: '1', unit: 'GeV' },
          { name: 'M', value: '1', unit: 'TeV' },
        ],
        parameters: [{ name: 'eps', numerator: 'E', denominator: 'M' }],
        precisionTarget: 1e-5,
      },
      [1, 2, 3],
    )
    expect(l.orders.map((o) => [o.exactEstimate, o.belowTarget])).toEqual([
      ['1/1000', false],
      ['1/1000000', true],
      ['1/1000000000', true],
    ])
  })

  it('lengths are inverse energies: E(1 pm)/E(1 fm) = 1/1000 exactly (common practice)', () => {
    const l = buildScaleLadder(
      {
        scales: [
          { name: 'rNucleus', value: '1', unit: 'fm' },
          { name: 'rAtom', value: '1', unit: 'pm' },
        ],
        parameters: [{ name: 'ratio', numerator: 'rAtom', denominator: 'rNucleus' }],
      },
      [1],
    )
    expect(l.parameters[0]).toEqual({ name: 'ratio', value: 0.001, exact: '1/1000' })
  })

  it('float inputs stay numeric (no exact field)', () => {
    const l = buildScaleLadder(
      {
        scales: [
          { name: 'a', value: 2, unit: 'GeV' },
          { name: 'b', value: 8, unit: 'GeV' },
        ],
        parameters: [{ name: 'r', numerator: 'a', denominator: 'b' }],
      },
      [2],
    )
    expect(l.orders[0]).toEqual({ order: 2, estimate: 0.0625, belowTarget: false })
  })
})

describe('buildScaleLadder: Goldstone frame, order p^k is (p/Λ_χ)^(k−2)', () => {
  // Power counting of chiral Lagrangians: the p² Lagrangian leads, a p^k term is suppressed by
  // (p/Λ_χ)^(k−2) with Λ_χ ≈ 4πF (Manohar and Georgi, Nucl. Phys. B 234 (1984) 189).
  const chiral = {
    scales: [
      { name: 'p', value: '3/10', unit: 'GeV' as const },
      { name: 'Lambda_chi', value: '6/5', unit: 'GeV' as const },
    ],
    parameters: [{ name: 'eps', numerator: 'p', denominator: 'Lambda_chi' }],
    precisionTarget: 1e-2,
  }
  it('p = 0.3 GeV, Λ_χ = 1.2 GeV: p² is 1, p⁴ is 1/16, p⁶ is 1/256 (below 1/100), exactly', () => {
    const l = buildScaleLadder(chiral, [2, 4, 6], { leadingOrder: leadingOrderOf('goldstone') })
    expect(l.orders.map((o) => [o.order, o.exactEstimate, o.belowTarget])).toEqual([
      [2, '1', false],
      [4, '1/16', false],
      [6, '1/256', true],
    ])
  })
  it("the board heading's power and the ladder's power are one rule", () => {
    for (const k of [2, 4, 6, 8]) {
      const est = buildScaleLadder(chiral, [k], { leadingOrder: leadingOrderOf('goldstone') }).orders[0]!.exactEstimate
      expect(est).toBe(ratText(powRational(rat(1n, 4n), suppressionPower(k, 'goldstone'))))
    }
    expect(suppressionPower(3, 'relativistic')).toBe(3)
    expect(suppressionPower(3, 'heavy')).toBe(3)
  })
  it('refuses an order below p² in words', () => {
    expect(() => buildScaleLadder(chiral, [0], { leadingOrder: 2 })).toThrow("Order 0 lies below the leading order 2 of this theory's power counting")
  })
})

describe('buildScaleLadder: bad input', () => {
  const base = { scales: [{ name: 'E', value: '1', unit: 'GeV' as const }], parameters: [] }
  it('names the problem and repeats the bad value', () => {
    expect(() => buildScaleLadder({ ...base, parameters: [{ name: 'x', numerator: 'E', denominator: '2' }] }, [1])).toThrow(
      'Expansion parameter "x" mixes a scale with a plain number (E / 2); a ratio must be dimensionless',
    )
    expect(() => buildScaleLadder({ ...base, parameters: [{ name: 'x', numerator: 'Q', denominator: 'E' }] }, [1])).toThrow('Expansion parameter "x": "Q" is neither the name of a scale nor a number')
    expect(() => buildScaleLadder(base, [1])).toThrow('Order 1 needs an expansion parameter to be estimated, but the ladder has none')
    expect(() => buildScaleLadder(base, [{ order: 'a', powers: { zz: 1 } }])).toThrow('Order a uses the expansion parameter "zz", which the ladder does not declare')
    expect(() => buildScaleLadder({ ...base, scales: [{ name: 'E', value: '1', unit: 'kg' as never }] }, [])).toThrow(/^Scale 1 "E", unit must be one of eV, keV/)
    expect(() => buildScaleLadder({ scales: [...base.scales, ...base.scales], parameters: [] }, [])).toThrow('Two scales are named "E"')
    expect(() => buildScaleLadder({ ...base, parameters: [{ name: 'x', numerator: '1', denominator: '0' }] }, [])).toThrow('Expansion parameter "x" divides by zero')
  })
})
