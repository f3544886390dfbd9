import { describe, expect, it } from 'vitest'
import { gaugeBetaCoefficients, gaugeContentOf, gaugeCouplingsAt, runGaugeCouplings, towerGaugeContent } from '../../../../server/engine/running/gauge/index'
import { runAlphaS } from '../../../../server/engine/running/runAlphaS'
import { rationalToNumber } from '../../../../server/engine/scales/decimal'
import { ALPHA_S_MZ, BOTTOM_MSBAR_MASS_GEV, CHARM_MSBAR_MASS_GEV, TOP_POLE_MASS_GEV, Z_MASS_GEV } from '../../../../server/engine/scales/pdg2024'
import { expectClose } from '../../scales/expectClose'
import { darkU1, qcd, SM } from './theories'

const TWO_PI = 2 * Math.PI

describe('one U(1) against closed forms', () => {
  const content = gaugeContentOf(darkU1('2', '1/3'))
  const [b, B] = [40 / 27, 5188 / 81] // worked by hand in betaCoefficients.test.ts

  it('one loop: α⁻¹(μ) = α⁻¹(μ0) − (b/2π) ln(μ/μ0) (Peskin & Schroeder (1995) §12.3)', () => {
    for (const mu of [1e-3, 10, 1e6]) {
      const r = runGaugeCouplings({ content, loops: 1, muFromGeV: 1, muToGeV: mu, alpha: { X: 0.01 } })
      expectClose('one-loop α⁻¹', mu, r.end.alphaInverse[0]!, 100 - (b / TWO_PI) * Math.log(mu), 1e-9)
      expect(r.stop).toBeUndefined()
    }
  })

  it('two loops: t − t0 = −2π[(x − x0)/b − (c/b²) ln((bx + c)/(bx0 + c))], x = 1/α, c = B/4π (exact solution of the truncated flow; common practice)', () => {
    const x0 = 30
    const r = runGaugeCouplings({ content, loops: 2, muFromGeV: 1, muToGeV: 1e12, alpha: { X: 1 / x0 } })
    const x = r.end.alphaInverse[0]!
    const c = B / (4 * Math.PI)
    const t = -TWO_PI * ((x - x0) / b - (c / (b * b)) * Math.log((b * x + c) / (b * x0 + c)))
    expectClose('ln μ reached', x, t, Math.log(1e12), 1e-9)
  })

  it('names the scale where g_X passes 4π (one loop: ln(μ/μ0) = 2π(α0⁻¹ − 1/4π)/b), running up', () => {
    const r = runGaugeCouplings({ content, loops: 1, muFromGeV: 1, muToGeV: 1e30, alpha: { X: 0.1 } })
    const expected = Math.exp((TWO_PI * (10 - 1 / (4 * Math.PI))) / b) // ≈ 1.87·10¹⁸ GeV
    expect(r.stop?.group).toBe('X')
    expect(r.stop?.direction).toBe('up')
    expectClose('pole scale', 0.1, r.stop!.muGeV, expected, 1e-8, true)
    expect(r.stop!.message).toBe('g_X grows beyond 4π above μ ≈ 1.87·10¹⁸ GeV: perturbation theory fails there (a Landau pole lies close by), so the running stops.')
    expectClose('last point', 0.1, r.end.mu, r.stop!.muGeV, 1e-12, true)
    expectClose('α⁻¹ there', 0.1, r.end.alphaInverse[0]!, 1 / (4 * Math.PI), 1e-9)
  })

  it('gaugeCouplingsAt gives the couplings by group name at a reachable scale', () => {
    const at = gaugeCouplingsAt({ content, loops: 1, muFromGeV: 1, muToGeV: 1e6, alpha: { X: 0.01 } })
    expectClose('α_X(10⁶ GeV)', 1e6, at.alpha.X!, 1 / (100 - (b / TWO_PI) * Math.log(1e6)), 1e-12, true)
  })

  it('gaugeCouplingsAt refuses a scale beyond the pole with the same words', () => {
    expect(() => gaugeCouplingsAt({ content, loops: 2, muFromGeV: 1, muToGeV: 1e30, alpha: { X: 0.3 } })).toThrow(
      /g_X grows beyond 4π above μ ≈ .* GeV: perturbation theory fails there \(a Landau pole lies close by\); 10³⁰ GeV cannot be reached from 1 GeV\.$/,
    )
  })
})

describe('QCD through the thresholds of a tower agrees with the QCD module', () => {
  // Tower: six quarks above m_t, five below, four below m_b, three below m_c.
  const names = ['u', 'd', 's', 'c', 'b', 't']
  const content = towerGaugeContent([
    { theory: qcd(names, 'QCD6'), thresholdGeV: null },
    { theory: qcd(names.slice(0, 5), 'QCD5'), thresholdGeV: TOP_POLE_MASS_GEV },
    { theory: qcd(names.slice(0, 4), 'QCD4'), thresholdGeV: BOTTOM_MSBAR_MASS_GEV },
    { theory: qcd(names.slice(0, 3), 'QCD3'), thresholdGeV: CHARM_MSBAR_MASS_GEV },
  ])
  const thresholds = [
    { name: 'c', mass: CHARM_MSBAR_MASS_GEV, kind: 'msbar' as const },
    { name: 'b', mass: BOTTOM_MSBAR_MASS_GEV, kind: 'msbar' as const },
    { name: 't', mass: TOP_POLE_MASS_GEV, kind: 'pole' as const },
  ]

  it('α_s from M_Z to 1.5 GeV and to 10 TeV at one and two loops equals runAlphaS with continuous (one-loop) decoupling to 1e-10 (van Ritbergen et al. 1997 β0, β1; Chetyrkin et al. 1998 at L = 0)', () => {
    for (const loops of [1, 2] as const) {
      for (const mu of [1.5, 3, 50, 1e4]) {
        const ours = runGaugeCouplings({ content, loops, muFromGeV: Z_MASS_GEV, muToGeV: mu, alpha: { colour: ALPHA_S_MZ } })
        const theirs = runAlphaS({ alphaS: ALPHA_S_MZ, muFrom: Z_MASS_GEV, muTo: mu, loops, thresholds, decouplingLoops: 1 })
        expectClose(`α_s, ${loops} loop(s)`, mu, 1 / ours.end.alphaInverse[0]!, theirs.alphaS, 1e-10, true)
      }
    }
  })

  it('the segments carry n_f = 3, 4, 5, 6 (b = −9, −25/3, −23/3, −7)', () => {
    const r = runGaugeCouplings({ content, loops: 1, muFromGeV: 2, muToGeV: 1000, alpha: { colour: 0.3 } })
    expect(r.segments.map((s) => rationalToNumber(s.coefficients.oneLoop[0]!) * 3)).toEqual([-27, -25, -23, -21])
    expect(r.segments.map((s) => s.active.length)).toEqual([6, 8, 10, 12])
  })

  it('running down, α_s stops where g_s passes 4π, below the scale the one-loop formula gives', () => {
    const r = runGaugeCouplings({ content: gaugeContentOf(qcd(['u', 'd', 's'])), loops: 1, muFromGeV: 2, muToGeV: 1e-6, alpha: { colour: 0.3 } })
    // α⁻¹(μ) = 1/0.3 + (9/2π) ln(μ/2) reaches 1/(4π) at ln(μ/2) = −2π(1/0.3 − 1/4π)/9.
    const expected = 2 * Math.exp((-TWO_PI * (1 / 0.3 - 1 / (4 * Math.PI))) / 9)
    expectClose('stop scale', 0.3, r.stop!.muGeV, expected, 1e-8, true)
    expect(r.stop!.message).toMatch(/^g_colour grows beyond 4π below μ ≈ 0\.206 GeV/)
  })
})

describe('Standard Model gauge couplings', () => {
  const content = gaugeContentOf(SM)
  const alpha = { colour: 0.118, weak: 0.03378, hypercharge: 0.01016 }

  it('one loop: each α_i⁻¹ is a straight line in ln μ with slope −b_i/2π, b = (−7, −19/6, 41/6) (Machacek & Vaughn 1983)', () => {
    const r = runGaugeCouplings({ content, loops: 1, muFromGeV: Z_MASS_GEV, muToGeV: 1e16, alpha })
    const L = Math.log(1e16 / Z_MASS_GEV)
    const b = [-7, -19 / 6, 41 / 6]
    Object.values(alpha).forEach((a, i) => expectClose(`α_${i}⁻¹(1e16)`, i, r.end.alphaInverse[i]!, 1 / a - (b[i]! / TWO_PI) * L, 1e-9))
  })

  it('two loops: up to 10¹⁶ GeV and back returns the inputs to 1e-10 (common practice)', () => {
    const up = runGaugeCouplings({ content, loops: 2, muFromGeV: Z_MASS_GEV, muToGeV: 1e16, alpha })
    const [a3, a2, aY] = up.end.alphaInverse.map((x) => 1 / x)
    const back = runGaugeCouplings({ content, loops: 2, muFromGeV: 1e16, muToGeV: Z_MASS_GEV, alpha: { colour: a3!, weak: a2!, hypercharge: aY! } })
    Object.values(alpha).forEach((a, i) => expectClose('round trip', i, 1 / back.end.alphaInverse[i]!, a, 1e-10, true))
    // The two-loop terms lower α_3⁻¹(10¹⁶) relative to one loop (B_33 < 0 dominates; common practice).
    const one = runGaugeCouplings({ content, loops: 1, muFromGeV: Z_MASS_GEV, muToGeV: 1e16, alpha })
    expect(up.end.alphaInverse[0]! - one.end.alphaInverse[0]!).toBeGreaterThan(0)
  })

  it('the two-loop flow at a point equals −(1/2π)[b + B α/4π] with the exact coefficients', () => {
    const c = gaugeBetaCoefficients(content)
    const h = 1e-4
    const at = (mu: number) => runGaugeCouplings({ content, loops: 2, muFromGeV: Z_MASS_GEV, muToGeV: mu, alpha }).end.alphaInverse
    const slope = at(Z_MASS_GEV * Math.exp(h)).map((x, i) => (x - at(Z_MASS_GEV * Math.exp(-h))[i]!) / (2 * h))
    const a = Object.values(alpha)
    slope.forEach((s, i) => {
      const expected = -(rationalToNumber(c.oneLoop[i]!) + c.twoLoop[i]!.reduce((t, v, j) => t + rationalToNumber(v) * a[j]!, 0) / (4 * Math.PI)) / TWO_PI
      expectClose('dα⁻¹/d ln μ', i, s, expected, 1e-7)
    })
  })
})
