/**
 * Units of physical scales: energies by powers of ten of MeV, lengths by powers of ten of fm
 * (a length L stands for the energy ħc/L). Pure tables shared by the schemas (client and
 * server) and the engine's conversions in server/engine/scales/units.ts.
 */
export const ENERGY_UNITS = ['eV', 'keV', 'MeV', 'GeV', 'TeV'] as const
export const LENGTH_UNITS = ['fm', 'pm', 'nm', 'm'] as const
export const SCALE_UNITS = [...ENERGY_UNITS, ...LENGTH_UNITS] as const
export type EnergyUnit = (typeof ENERGY_UNITS)[number]
export type LengthUnit = (typeof LENGTH_UNITS)[number]
export type ScaleUnit = (typeof SCALE_UNITS)[number]

/** Power of ten: 1 unit = 10^p MeV (energies) or 10^p fm (lengths). */
export const UNIT_POWER_OF_TEN: Record<ScaleUnit, number> = {
  eV: -6,
  keV: -3,
  MeV: 0,
  GeV: 3,
  TeV: 6,
  fm: 0,
  pm: 3,
  nm: 6,
  m: 15,
}

export function isLengthUnit(unit: string): unit is LengthUnit {
  return (LENGTH_UNITS as readonly string[]).includes(unit)
}
