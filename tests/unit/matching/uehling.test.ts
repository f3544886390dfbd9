import { describe, expect, it } from 'vitest'
import { MATCHING_LIBRARY, coefficientText } from '../../../server/engine/matching/library'
import { uehlingCoefficient, vacuumPolarizationOneLoop, vacuumPolarizationSeries } from '../../../server/engine/matching/vacuumPolarization'
import { mul, neg, parseRational, rat, toString as ratText } from '../../../server/engine/exact/rational'
import { rationalToNumber } from '../../../server/engine/scales/decimal'
import { ALPHA_INVERSE, ELECTRON_MASS_MEV, PLANCK_CONSTANT_EV_S } from '../../../server/engine/scales/codata2018'
import { expectClose } from '../scales/expectClose'

const uehling = MATCHING_LIBRARY.find((e) => e.id === 'uehling')!
const alpha = 1 / ALPHA_INVERSE
const q = parseRational

describe('vacuum polarization Π̂₂(q²) of a heavy Dirac fermion (Peskin & Schroeder, An Introduction to QFT (1995), §7.5)', () => {
  it('expansion: Π̂₂ ≈ −(α/15π) q²/m² − (α/140π)(q²/m²)² (P&S §7.5 leading term; second term from ∫x³(1−x)³ = 1/140)', () => {
    expect(vacuumPolarizationSeries(2).map(ratText)).toEqual(['-1/15', '-1/140'])
  })

  it('the series matches the Feynman-parameter integral numerically (P&S eq. for Π̂₂(q²))', () => {
    for (const x of [-0.01, 0.2, -1, 2]) {
      const series = vacuumPolarizationSeries(30).reduce((s, c, i) => s + rationalToNumber(c) * x ** (i + 1), 0)
      expectClose('Π̂₂ series vs integral', x, vacuumPolarizationOneLoop(x, alpha), (alpha / Math.PI) * series, 1e-9 * Math.abs(alpha * series), false)
    }
  })

  it('rejects q² above the pair threshold and bad orders', () => {
    expect(() => vacuumPolarizationOneLoop(5, alpha)).toThrow('q²/m² must be a finite number below the pair threshold 4, but it is 5')
    expect(() => vacuumPolarizationSeries(0)).toThrow('The order of the vacuum-polarization series must be a whole number from 1 to 30, not 0')
  })
})

describe('Uehling operator L ⊃ (α/(60π m²)) F_{μν} □ F^{μν} (E. A. Uehling, Phys. Rev. 48 (1935) 55)', () => {
  it('follows from Π̂₂ ≈ −(α/15π) q²/m² through L_eff = −¼ F [1 − Π̂₂(−□)] F (P&S §7.5)', () => {
    expect(ratText(uehlingCoefficient(q('-1/15')))).toBe('1/60')
    const term = uehling.forms[0]!.terms[0]!
    expect(ratText(term.coefficient.rational)).toBe('1/60')
    expect(coefficientText(term.coefficient)).toBe('1/60 α Q^2 / (π m^2)')
  })

  it('current form: F□F = −2 (∂_μF^{μν})(∂^ρF_{ρν}) up to total derivatives, coefficient −1/30 (Bianchi identity; common practice)', () => {
    const box = uehling.forms[0]!.terms[0]!.coefficient.rational
    expect(ratText(uehling.forms[1]!.terms[0]!.coefficient.rational)).toBe(ratText(mul(rat(-2), box)))
  })

  it('gives the hydrogen contact potential −(4α²/15m²) δ³(r) (P&S §7.5, Uehling term; from memory)', () => {
    // L ⊃ c (α/π m²)(∂F)², ∂_μF^{μν} = e j^ν, e² = 4πα; static charges q1 = −1, q2 = +1: V = −2 c e² q1 q2 (α/π m²) δ³.
    const c = uehling.forms[1]!.terms[0]!.coefficient.rational
    const vInAlpha2OverM2 = neg(mul(mul(rat(2), c), mul(rat(4), rat(-1)))) // π from e² cancels 1/π
    expect(ratText(vInAlpha2OverM2)).toBe('-4/15')
  })

  it('shifts the hydrogen 2S level by ≈ −27 MHz (Lamb-shift budget, common practice; from memory)', () => {
    // ΔE = −(4α²/15m²)|ψ_2S(0)|², |ψ_2S(0)|² = (m α)³/(8π): ΔE = −4 m α⁵ / (120 π).
    const c = rationalToNumber(q('-4/15'))
    const dE = (((c * alpha ** 2) / (ELECTRON_MASS_MEV * 1e6) ** 2) * (ELECTRON_MASS_MEV * 1e6 * alpha) ** 3) / (8 * Math.PI)
    expectClose('2S Uehling shift / MHz', 'n=2, l=0', dE / PLANCK_CONSTANT_EV_S / 1e6, -27.1, 0.2)
  })
})
