/**
 * Units of physical scales and their conversion to MeV (natural units, ħ = c = 1).
 * Energies convert by powers of ten; a length L converts to the energy ħc/L with
 * ħc = 197.3269804 MeV fm (CODATA 2018).
 */
import { EngineInputError } from '../errors'
import { HBAR_C_MEV_FM } from './codata2018'
import { SCALE_UNITS, UNIT_POWER_OF_TEN, isLengthUnit, type ScaleUnit } from '../../../shared/physics/scaleUnits'

// The unit tables live in shared/ (the schemas need them on the client too).
export { ENERGY_UNITS, LENGTH_UNITS, SCALE_UNITS, UNIT_POWER_OF_TEN, isLengthUnit, type EnergyUnit, type LengthUnit, type ScaleUnit } from '../../../shared/physics/scaleUnits'

export function assertScaleUnit(fn: string, unit: string): asserts unit is ScaleUnit {
  if (!(SCALE_UNITS as readonly string[]).includes(unit)) {
    throw new EngineInputError(fn, `"${unit}" is not a unit Scalewright knows; use one of ${SCALE_UNITS.join(', ')}`)
  }
}

/**
 * The energy in MeV of a scale given in an energy unit, or the energy equivalent ħc/L of a length.
 * @example toMeV(1, 'fm') // 197.3269804
 * Method: powers of ten; lengths through ħc (CODATA 2018).
 * Reference: CODATA 2018 (ħc = 197.3269804 MeV fm).
 */
export function toMeV(value: number, unit: string): number {
  assertScaleUnit('toMeV', unit)
  if (!Number.isFinite(value) || value <= 0) {
    throw new EngineInputError('toMeV', `A scale must be a positive number, but this one is ${value} ${unit}`)
  }
  const scaled = value * 10 ** UNIT_POWER_OF_TEN[unit]
  return isLengthUnit(unit) ? HBAR_C_MEV_FM / scaled : scaled
}

/**
 * A scale in MeV expressed in the requested unit (inverse of toMeV).
 * @example fromMeV(1.3605693e-5, 'eV') // 13.605693
 * Method: inverse powers of ten; lengths as ħc/E.
 * Reference: CODATA 2018 (ħc).
 */
export function fromMeV(valueMeV: number, unit: string): number {
  assertScaleUnit('fromMeV', unit)
  if (!Number.isFinite(valueMeV) || valueMeV <= 0) {
    throw new EngineInputError('fromMeV', `A scale must be a positive number, but this one is ${valueMeV} MeV`)
  }
  const p = 10 ** UNIT_POWER_OF_TEN[unit]
  return isLengthUnit(unit) ? HBAR_C_MEV_FM / valueMeV / p : valueMeV / p
}
