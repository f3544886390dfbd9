import { describe, expect, it } from 'vitest'
import { formatGeV, gaugeContentOf, gaugeRunningReport, runGaugeCouplings, towerGaugeContent } from '../../../../server/engine/running/gauge/index'
import { darkU1, SM, theory, u1, weyl } from './theories'

describe('formatGeV', () => {
  it('three significant digits; powers of ten away from 1', () => {
    expect(formatGeV(91.1876)).toBe('91.2 GeV')
    expect(formatGeV(0.2064)).toBe('0.206 GeV')
    expect(formatGeV(3.214e17)).toBe('3.21·10¹⁷ GeV')
    expect(formatGeV(1e30)).toBe('10³⁰ GeV')
    expect(formatGeV(2.5e-5)).toBe('2.5·10⁻⁵ GeV')
  })
})

describe('the couplings page report', () => {
  it('Standard Model: curve both ways from M_Z, exact coefficients, no stop in 1 GeV – 10¹⁹ GeV', () => {
    const r = gaugeRunningReport(gaugeContentOf(SM), { loops: 2, muFromGeV: 91.1876, alpha: { colour: 0.118, weak: 0.0338, hypercharge: 0.0102 }, plotFromGeV: 1, plotToGeV: 1e19, muToGeV: 1e16 })
    expect(r.groups).toEqual([
      { name: 'colour', label: 'SU(3)', abelian: false },
      { name: 'weak', label: 'SU(2)', abelian: false },
      { name: 'hypercharge', label: 'U(1)', abelian: true },
    ])
    expect(r.stops).toEqual([])
    expect(r.curve[0]!.mu).toBeCloseTo(1, 12)
    expect(r.curve[r.curve.length - 1]!.mu).toBeCloseTo(1e19, -6)
    expect(r.curve.every((p, i) => i === 0 || p.mu > r.curve[i - 1]!.mu)).toBe(true)
    expect(r.table.map((row) => row.label)).toEqual(['input scale', 'chosen scale'])
    // The chosen scale is passed exactly on the way up: the same couplings as a run that ends there.
    const direct = runGaugeCouplings({ content: gaugeContentOf(SM), loops: 2, muFromGeV: 91.1876, muToGeV: 1e16, alpha: { colour: 0.118, weak: 0.0338, hypercharge: 0.0102 } })
    r.table[1]!.alphaInverse.forEach((x, i) => expect(x).toBeCloseTo(direct.end.alphaInverse[i]!, 9))
    expect(r.segments).toEqual([
      {
        lowGeV: null,
        highGeV: null,
        active: ['Q', 'u', 'd', 'L', 'e', 'H'],
        oneLoop: ['-7', '-19/6', '41/6'],
        twoLoop: [
          ['-26', '9/2', '11/6'],
          ['12', '35/6', '3/2'],
          ['44/3', '9/2', '199/18'],
        ],
        mixing: null,
      },
    ])
    expect(r.assumptions.join(' ')).toContain('Yukawa couplings are not part of a theory file')
  })

  it('a tower: thresholds in the table, a segment per range, the stop named with its scale', () => {
    const full = darkU1('1', '1')
    const light = theory(
      'light',
      full.groups,
      full.fields.filter((f) => f.name !== 'S'),
    )
    const content = towerGaugeContent([
      { theory: full, thresholdGeV: null },
      { theory: light, thresholdGeV: 500 },
    ])
    const r = gaugeRunningReport(content, { loops: 1, muFromGeV: 1, alpha: { X: 0.2 }, plotFromGeV: 1e-3, plotToGeV: 1e19 })
    expect(r.table.map((row) => [row.label, row.mu])).toEqual([
      ['input scale', 1],
      ['threshold of S', 500],
    ])
    expect(r.segments.map((s) => [s.lowGeV, s.highGeV, s.oneLoop[0]])).toEqual([
      [null, 500, '4/3'],
      [500, null, '5/3'],
    ])
    expect(r.stops).toHaveLength(1)
    expect(r.stops[0]!.message).toMatch(/^g_X grows beyond 4π above μ ≈ .*10.* GeV/)
    expect(r.curve.some((p) => p.segment === 1)).toBe(true)
  })

  it('several U(1)s: the mixing terms are listed exactly', () => {
    const t = theory('mixer', [u1('X'), u1('Y')], [weyl('m', { charges: { X: '1', Y: '2' } })])
    const r = gaugeRunningReport(gaugeContentOf(t), { loops: 2, muFromGeV: 1, alpha: { X: 0.01, Y: 0.01 }, plotFromGeV: 0.1, plotToGeV: 10 })
    expect(r.pairs).toEqual([['X', 'Y']])
    expect(r.segments[0]!.mixing?.generated).toBe(true)
    expect(r.segments[0]!.mixing?.terms).toContainEqual({ target: 'X,Y', coupling: null, value: '4/3' })
    expect(r.segments[0]!.mixing?.terms).toContainEqual({ target: 'X,Y', coupling: 'X,X', value: '4' })
  })

  it('refuses a theory without a running gauge group and an empty plot range', () => {
    const none = theory('no gauge', [], [weyl('a')])
    expect(() => gaugeRunningReport(gaugeContentOf(none), { loops: 1, muFromGeV: 1, alpha: {}, plotFromGeV: 1, plotToGeV: 10 })).toThrow('This theory has no gauge group whose coupling runs')
    expect(() => gaugeRunningReport(gaugeContentOf(SM), { loops: 1, muFromGeV: 1, alpha: { colour: 0.1, weak: 0.03, hypercharge: 0.01 }, plotFromGeV: 10, plotToGeV: 10 })).toThrow(
      'The plotted range must go from a lower to a higher scale, not from 10 to 10 GeV.',
    )
  })
})
