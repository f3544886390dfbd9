import { describe, expect, it } from 'vitest'
import { fromMeV, toMeV } from '../../../server/engine/scales/units'
import { BOHR_RADIUS_M, ALPHA_INVERSE, ELECTRON_MASS_MEV } from '../../../server/engine/scales/codata2018'
import { expectClose } from './expectClose'

describe('toMeV / fromMeV', () => {
  it('converts energies by powers of ten (common practice)', () => {
    expectClose('GeV', [1, 'GeV'], toMeV(1, 'GeV'), 1000, 0)
    expectClose('eV', [13.6, 'eV'], toMeV(13.6, 'eV'), 13.6e-6, 1e-18)
    expectClose('TeV', [2, 'TeV'], toMeV(2, 'TeV'), 2e6, 0)
    expectClose('keV', [3.73, 'keV'], toMeV(3.73, 'keV'), 3.73e-3, 1e-18)
  })

  it('converts a length L to ħc/L with ħc = 197.3269804 MeV fm (CODATA 2018)', () => {
    expectClose('1 fm', [1, 'fm'], toMeV(1, 'fm'), 197.3269804, 1e-12)
    expectClose('1 m', [1, 'm'], toMeV(1, 'm'), 197.3269804e-15, 1e-27)
  })

  it('the Bohr radius is the inverse of m_e α (CODATA 2018: a0 = ħ/(m_e c α))', () => {
    expectClose('a0', [BOHR_RADIUS_M, 'm'], toMeV(BOHR_RADIUS_M, 'm'), ELECTRON_MASS_MEV / ALPHA_INVERSE, 1e-9, true)
  })

  it('round-trips through fromMeV for every unit (common practice)', () => {
    for (const unit of ['eV', 'keV', 'MeV', 'GeV', 'TeV', 'fm', 'pm', 'nm', 'm']) {
      expectClose(`round trip ${unit}`, [4.18, unit], fromMeV(toMeV(4.18, unit), unit), 4.18, 1e-12, true)
    }
  })

  it('rejects unknown units and non-positive values with the bad value in the message', () => {
    expect(() => toMeV(1, 'kg')).toThrow('"kg" is not a unit Scalewright knows')
    expect(() => toMeV(-2, 'MeV')).toThrow('A scale must be a positive number, but this one is -2 MeV')
    expect(() => fromMeV(0, 'GeV')).toThrow('A scale must be a positive number, but this one is 0 MeV')
  })
})
