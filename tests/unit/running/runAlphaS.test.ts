import { describe, expect, it } from 'vitest'
import { runAlphaS, type QcdThreshold } from '../../../server/engine/running/runAlphaS'
import { qcdBeta } from '../../../server/engine/running/qcdBeta'
import { ALPHA_S_MZ, BOTTOM_MSBAR_MASS_GEV, CHARM_MSBAR_MASS_GEV, Z_MASS_GEV } from '../../../server/engine/scales/pdg2024'
import { TAU_MASS_MEV } from '../../../server/engine/scales/codata2018'
import { EngineCancelledError } from '../../../server/engine/errors'
import { expectClose } from '../scales/expectClose'

/** PDG 2024: m_b(m_b) = 4.183 GeV, m_c(m_c) = 1.2730 GeV (MS-bar), α_s(M_Z) = 0.1180, M_Z = 91.1880 GeV. */
const BC: QcdThreshold[] = [
  { name: 'b', mass: BOTTOM_MSBAR_MASS_GEV, kind: 'msbar' },
  { name: 'c', mass: CHARM_MSBAR_MASS_GEV, kind: 'msbar' },
]
const MTAU = TAU_MASS_MEV / 1000 // 1.77686 GeV (CODATA 2018 / PDG 2022)

describe('runAlphaS: integrator against exact solutions', () => {
  it('one loop: α(μ) = α0 / (1 + α0 β0/(4π) ln(μ²/μ0²)) (Gross & Wilczek 1973; Politzer 1973)', () => {
    for (const muTo of [2, 10, 1000]) {
      const r = runAlphaS({ alphaS: 0.118, muFrom: 91.1876, muTo, loops: 1, lightFlavours: 5 })
      const exact = 0.118 / (1 + ((0.118 * qcdBeta(5)[0]!) / (4 * Math.PI)) * Math.log((muTo / 91.1876) ** 2))
      expectClose('one loop', muTo, r.alphaS, exact, 1e-12)
    }
  })

  it('two loops: the implicit exact solution β0 Δt = 1/a − 1/a0 + (β1/β0) ln[a(β0+β1 a0)/(a0(β0+β1 a))] holds (common practice)', () => {
    const [b0, b1] = qcdBeta(5) as [number, number]
    const r = runAlphaS({ alphaS: 0.118, muFrom: 91.1876, muTo: 5, loops: 2, lightFlavours: 5 })
    const a0 = 0.118 / (4 * Math.PI)
    const a = r.alphaS / (4 * Math.PI)
    const lhs = b0 * Math.log((5 / 91.1876) ** 2)
    const rhs = 1 / a - 1 / a0 + (b1 / b0) * Math.log((a * (b0 + b1 * a0)) / (a0 * (b0 + b1 * a)))
    expectClose('two-loop implicit solution', r.alphaS, rhs, lhs, 1e-9)
  })
})

describe('runAlphaS: α_s(M_Z) = 0.1180 (PDG 2024) through the b and c thresholds', () => {
  it('down to 1 GeV and back up returns the input to 1e-6 (product-owner requirement)', () => {
    for (const loops of [1, 2, 3, 4] as const) {
      const down = runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: 1.0, loops, thresholds: BC })
      expect(down.nfTo).toBe(3)
      const up = runAlphaS({ alphaS: down.alphaS, muFrom: 1.0, muTo: Z_MASS_GEV, loops, thresholds: BC })
      expect(up.nfTo).toBe(5)
      expectClose('round trip', loops, up.alphaS, ALPHA_S_MZ, 1e-6)
    }
  })

  it('α_s(m_τ) at four loops lies within the τ-decay value 0.314 ± 0.014 (PDG 2024 QCD review, figure as quoted by the product owner; from memory)', () => {
    const r = runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: MTAU, loops: 4, thresholds: BC })
    expect(r.nfTo).toBe(4)
    expectClose('α_s(m_τ) vs PDG τ', MTAU, r.alphaS, 0.314, 0.014)
  })

  it('α_s(m_τ) lies within 0.328 ± 0.013, and that value run up gives 0.1197 ± 0.0015 (A. Pich, arXiv:1811.10067, τ-decay determination)', () => {
    const r = runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: MTAU, loops: 4, thresholds: BC })
    expectClose('α_s(m_τ) vs Pich', MTAU, r.alphaS, 0.328, 0.013)
    const up = runAlphaS({ alphaS: 0.328, muFrom: MTAU, muTo: Z_MASS_GEV, loops: 4, thresholds: BC })
    expectClose('α_s(M_Z) from τ', 0.328, up.alphaS, 0.1197, 0.0015)
  })

  it('α_s(m_b) ≈ 0.2245 ± 0.002 for α_s(M_Z) = 0.118 (common practice; from memory)', () => {
    const r = runAlphaS({ alphaS: 0.118, muFrom: Z_MASS_GEV, muTo: BOTTOM_MSBAR_MASS_GEV, loops: 4, lightFlavours: 5 })
    expectClose('α_s(m_b)', 4.183, r.alphaS, 0.2245, 0.002)
  })

  it('the jump at each threshold is 1 + (11/72)(α_s/π)² going down (MS-bar, μ = m_h) and its inverse going up (Chetyrkin, Kniehl, Steinhauser 1998)', () => {
    const down = runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: 1.0, loops: 4, thresholds: BC })
    expect(down.crossings.map((c) => [c.name, c.direction, c.nfAbove])).toEqual([
      ['b', 'down', 5],
      ['c', 'down', 4],
    ])
    for (const c of down.crossings) {
      expectClose(`jump ${c.name}`, c, c.alphaBelow / c.alphaAbove, 1 + (11 / 72) * (c.alphaAbove / Math.PI) ** 2, 1e-14)
    }
    const up = runAlphaS({ alphaS: down.alphaS, muFrom: 1.0, muTo: Z_MASS_GEV, loops: 4, thresholds: BC })
    expect(up.crossings.map((c) => [c.name, c.direction])).toEqual([
      ['c', 'up'],
      ['b', 'up'],
    ])
    expectClose('same jump at c', 'c', up.crossings[0]!.alphaAbove, down.crossings[1]!.alphaAbove, 1e-9)
  })

  it('a pole-mass threshold jumps by 1 − (7/24)(α_s/π)² (Chetyrkin, Kniehl, Steinhauser 1998; m_b pole 4.78 GeV, PDG)', () => {
    const r = runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: 3, loops: 3, thresholds: [{ name: 'b', mass: 4.78, kind: 'pole' }] })
    const c = r.crossings[0]!
    expectClose('pole jump', c, c.alphaBelow / c.alphaAbove, 1 - (7 / 24) * (c.alphaAbove / Math.PI) ** 2, 1e-14)
  })

  it('higher loops move α_s(m_τ) by less and less (common practice: convergence of the β series)', () => {
    const v = ([1, 2, 3, 4] as const).map((loops) => runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: MTAU, loops, thresholds: BC }).alphaS)
    expect(Math.abs(v[3]! - v[2]!)).toBeLessThan(Math.abs(v[2]! - v[1]!))
    expect(Math.abs(v[2]! - v[1]!)).toBeLessThan(Math.abs(v[1]! - v[0]!))
  })

  it('returns a plot trace with n_f per point, monotone in μ, and the required result fields', () => {
    const r = runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: 1.5, loops: 4, thresholds: BC })
    expect(r.trace[0]).toEqual({ mu: Z_MASS_GEV, alphaS: ALPHA_S_MZ, nf: 5 })
    for (let i = 1; i < r.trace.length; i++) expect(r.trace[i]!.mu).toBeLessThanOrEqual(r.trace[i - 1]!.mu * (1 + 1e-12))
    expect(new Set(r.trace.map((p) => p.nf))).toEqual(new Set([5, 4]))
    expect(r.trace.at(-1)!.alphaS).toBe(r.alphaS)
    expect(r.caution).toBe('estimates and leading-order formulas; check against the literature for precision work')
    expect(r.computed.length).toBeGreaterThan(0)
    expect(r.inputs.alphaS).toBe(ALPHA_S_MZ)
    expect(r.decouplingLoops).toBe(2)
  })
})

describe('runAlphaS: bad input, cancellation, progress', () => {
  const base = { alphaS: 0.118, muFrom: 91.1876, muTo: 2, loops: 4 as const, lightFlavours: 5 }
  it('names the bad value', () => {
    expect(() => runAlphaS({ alphaS: 0.118, muFrom: 91.1876, muTo: 2, loops: 4 })).toThrow('No heavy quarks are listed: give the number of light flavours')
    expect(() => runAlphaS({ ...base, loops: 5 as never })).toThrow('The loops in β must be 1, 2, 3 or 4, not 5')
    expect(() => runAlphaS({ ...base, muTo: -1 })).toThrow('The wanted scale μ (GeV) must be a positive number, but it is -1')
    expect(() => runAlphaS({ ...base, thresholds: [{ name: 'b', mass: 0, kind: 'msbar' }] })).toThrow('The mass of heavy quark "b" must be a positive number, but it is 0')
    expect(() => runAlphaS({ ...base, thresholds: [{ name: 'b', mass: 4, kind: 'kinetic' as never }] })).toThrow(
      'The mass of heavy quark "b" must be an MS-bar mass ("msbar") or a pole mass ("pole"), not "kinetic"',
    )
    expect(() => runAlphaS({ ...base, lightFlavours: 3, nfFrom: 3, thresholds: BC })).toThrow('3 active flavours at μ₀ = 91.1876 GeV do not match the heavy quarks listed (they give 5)')
    expect(() => runAlphaS({ ...base, decouplingLoops: 3 as never })).toThrow('The decoupling loops must be 1 or 2, not 3')
    expect(() => runAlphaS({ ...base, thresholds: BC })).toThrow('5 light flavours plus 2 heavy quarks make more than 6 quark flavours')
  })

  it('reports a Landau pole instead of returning a number', () => {
    expect(() => runAlphaS({ alphaS: 0.5, muFrom: 1, muTo: 0.1, loops: 1, lightFlavours: 3 })).toThrow(
      /^α_s grows beyond the perturbative range below μ = 0\.\d+ GeV \(running from μ = 1 GeV to 0\.1 GeV with 3 active flavours, towards the Landau pole\); choose a higher scale/,
    )
  })

  it('starts on a threshold with nfFrom choosing the side', () => {
    const above = runAlphaS({ alphaS: 0.2245, muFrom: 4.183, muTo: 3, loops: 3, thresholds: BC, nfFrom: 5 })
    const below = runAlphaS({ alphaS: 0.2245, muFrom: 4.183, muTo: 3, loops: 3, thresholds: BC })
    expect(above.crossings.map((c) => c.name)).toEqual(['b'])
    expect(below.crossings).toEqual([])
  })

  it('throws EngineCancelledError when aborted and reports progress up to 1', () => {
    expect(() => runAlphaS({ ...base, signal: { aborted: true } })).toThrow(EngineCancelledError)
    const seen: number[] = []
    runAlphaS({ ...base, lightFlavours: 3, thresholds: BC, onProgress: (f) => seen.push(f) })
    expect(seen.at(-1)).toBe(1)
    expect(seen.length).toBe(2)
  })
})
