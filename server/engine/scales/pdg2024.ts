/**
 * Particle data, Review of Particle Physics 2024 (S. Navas et al., Particle Data Group,
 * Phys. Rev. D 110 (2024) 030001). Edition pinned: values below are the 2024 summary-table
 * entries as read from pdgLive; the ones marked "from memory" were not re-read. Masses in GeV.
 */
export const PDG_EDITION = 'PDG 2024'

/** Z boson mass, 91.1880 ± 0.0020 GeV (PDG 2024; the 2022 edition had 91.1876 ± 0.0021). */
export const Z_MASS_GEV = 91.188

/** W boson mass, 80.3692 ± 0.0133 GeV (PDG 2024 average, from memory). */
export const W_MASS_GEV = 80.3692

/** τ lepton mass, 1776.93 ± 0.09 MeV (PDG 2024; CODATA 2018 has 1776.86). */
export const TAU_MASS_GEV = 1.77693

/** Strong coupling α_s(M_Z) in MS-bar with five flavours, 0.1180 ± 0.0009 (PDG 2024 world average). */
export const ALPHA_S_MZ = 0.118
export const ALPHA_S_MZ_UNCERTAINTY = 0.0009

/** MS-bar masses m_q(m_q) of the heavy quarks: b 4.183 ± 0.007 GeV, c 1.2730 ± 0.0046 GeV. */
export const BOTTOM_MSBAR_MASS_GEV = 4.183
export const CHARM_MSBAR_MASS_GEV = 1.273

/** Top quark pole (direct-measurement) mass, 172.57 ± 0.29 GeV (PDG 2024, from memory). */
export const TOP_POLE_MASS_GEV = 172.57

/** b-quark pole mass quoted beside the MS-bar value, 4.78 ± 0.06 GeV (two-loop conversion). */
export const BOTTOM_POLE_MASS_GEV = 4.78

/** Light-quark MS-bar masses at μ = 2 GeV (PDG 2024, from memory): u 2.16, d 4.70, s 93.5 MeV. */
export const UP_MASS_2GEV_GEV = 0.00216
export const DOWN_MASS_2GEV_GEV = 0.0047
export const STRANGE_MASS_2GEV_GEV = 0.0935
