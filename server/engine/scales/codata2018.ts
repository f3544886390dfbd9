/**
 * Physical constants, CODATA 2018 recommended values (E. Tiesinga, P. J. Mohr, D. B. Newell,
 * B. N. Taylor, Rev. Mod. Phys. 93 (2021) 025010; also J. Phys. Chem. Ref. Data 50 (2021) 033105).
 * Edition pinned: do not mix with other CODATA editions. Energies in MeV unless the name says
 * otherwise. Each value is also given as the decimal string printed in the table, so that exact
 * (rational) work can start from the printed digits.
 */
export const CODATA_EDITION = 'CODATA 2018'

/** ħc in MeV fm (exact in the 2019 SI up to the printed digits). */
export const HBAR_C_MEV_FM = 197.3269804
export const HBAR_C_MEV_FM_TEXT = '197.3269804'

/** Inverse fine-structure constant α(0)^-1 at zero momentum transfer. */
export const ALPHA_INVERSE = 137.035999084
export const ALPHA_INVERSE_TEXT = '137.035999084'

/** Electron mass energy equivalent m_e c² in MeV. */
export const ELECTRON_MASS_MEV = 0.51099895
export const ELECTRON_MASS_MEV_TEXT = '0.51099895000'

/** Muon mass energy equivalent in MeV. */
export const MUON_MASS_MEV = 105.6583755
export const MUON_MASS_MEV_TEXT = '105.6583755'

/** Tau mass energy equivalent in MeV (CODATA 2018 adopts the PDG 2018 value 1776.86(12)). */
export const TAU_MASS_MEV = 1776.86
export const TAU_MASS_MEV_TEXT = '1776.86'

/** Proton mass energy equivalent in MeV. */
export const PROTON_MASS_MEV = 938.27208816
export const PROTON_MASS_MEV_TEXT = '938.27208816'

/** Proton-electron mass ratio m_p/m_e. */
export const PROTON_ELECTRON_MASS_RATIO = 1836.15267343
export const PROTON_ELECTRON_MASS_RATIO_TEXT = '1836.15267343'

/** Rydberg energy R∞hc in eV (= ½ m_e c² α²). */
export const RYDBERG_ENERGY_EV = 13.605693122994
export const RYDBERG_ENERGY_EV_TEXT = '13.605693122994'

/** Planck constant in eV s (exact in the 2019 SI). */
export const PLANCK_CONSTANT_EV_S = 4.135667696e-15

/** Bohr radius a0 = ħ/(m_e c α) in m. */
export const BOHR_RADIUS_M = 5.29177210903e-11
export const BOHR_RADIUS_M_TEXT = '0.529177210903e-10'
