/**
 * Charged fermions of the Standard Model as QED thresholds: mass (GeV), charge Q (exact,
 * in units of e) and colour multiplicity N_c. Each contributes N_c Q² to the one-loop running.
 */
import { parseRational, type Rational } from '../exact/rational'
import { ELECTRON_MASS_MEV, MUON_MASS_MEV, TAU_MASS_MEV } from '../scales/codata2018'
import { BOTTOM_MSBAR_MASS_GEV, CHARM_MSBAR_MASS_GEV, DOWN_MASS_2GEV_GEV, STRANGE_MASS_2GEV_GEV, TOP_POLE_MASS_GEV, UP_MASS_2GEV_GEV } from '../scales/pdg2024'

export interface QedFermion {
  name: string
  /** Mass in GeV where the fermion starts to contribute (step-function decoupling). */
  mass: number
  charge: Rational
  colours: 1 | 3
  source: string
}

const q = parseRational
const codata = 'CODATA 2018'
const pdg = 'PDG 2024 (MS-bar masses; u, d, s at 2 GeV — not physical thresholds)'

/** Charged leptons, masses from CODATA 2018. */
export const CHARGED_LEPTONS: readonly QedFermion[] = [
  { name: 'e', mass: ELECTRON_MASS_MEV / 1000, charge: q('-1'), colours: 1, source: codata },
  { name: 'mu', mass: MUON_MASS_MEV / 1000, charge: q('-1'), colours: 1, source: codata },
  { name: 'tau', mass: TAU_MASS_MEV / 1000, charge: q('-1'), colours: 1, source: codata },
]

/** Quarks with PDG 2024 masses (top: pole mass). Light-quark thresholds are only indicative. */
export const QUARKS: readonly QedFermion[] = [
  { name: 'u', mass: UP_MASS_2GEV_GEV, charge: q('2/3'), colours: 3, source: pdg },
  { name: 'd', mass: DOWN_MASS_2GEV_GEV, charge: q('-1/3'), colours: 3, source: pdg },
  { name: 's', mass: STRANGE_MASS_2GEV_GEV, charge: q('-1/3'), colours: 3, source: pdg },
  { name: 'c', mass: CHARM_MSBAR_MASS_GEV, charge: q('2/3'), colours: 3, source: pdg },
  { name: 'b', mass: BOTTOM_MSBAR_MASS_GEV, charge: q('-1/3'), colours: 3, source: pdg },
  { name: 't', mass: TOP_POLE_MASS_GEV, charge: q('2/3'), colours: 3, source: 'PDG 2024 (pole mass)' },
]

/** Leptons and quarks together, sorted by mass. */
export const QED_FERMIONS: readonly QedFermion[] = [...CHARGED_LEPTONS, ...QUARKS].sort((a, b) => a.mass - b.mass)
