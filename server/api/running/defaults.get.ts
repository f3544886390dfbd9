import { defineApiHandler } from '../../utils/http/apiHandler'
import { requireUser } from '../../utils/auth/currentUser'
import { ALPHA_S_MZ, BOTTOM_MSBAR_MASS_GEV, CHARM_MSBAR_MASS_GEV, TOP_POLE_MASS_GEV, Z_MASS_GEV } from '../../engine/scales/pdg2024'

// The inputs the couplings page starts from, with their sources (signed in).
export default defineApiHandler(async (event) => {
  await requireUser(event)
  return {
    qcd: {
      alphaS: ALPHA_S_MZ,
      muFrom: Z_MASS_GEV,
      muTo: 1.77693,
      loops: 4,
      thresholds: [
        { name: 'c', mass: CHARM_MSBAR_MASS_GEV, kind: 'msbar' },
        { name: 'b', mass: BOTTOM_MSBAR_MASS_GEV, kind: 'msbar' },
        { name: 't', mass: TOP_POLE_MASS_GEV, kind: 'pole' },
      ],
    },
    qed: { muTo: Z_MASS_GEV, quarks: false, deltaAlphaHad5: 0.02783 },
    sources: {
      alphaS: 'PDG 2024 world average α_s(M_Z) = 0.1180',
      muFrom: 'PDG 2024 M_Z',
      thresholds: 'PDG 2024: m_c(m_c), m_b(m_b) MS-bar; top pole mass',
      muTo: 'τ mass, PDG 2024',
      deltaAlphaHad5: 'hadronic shift Δα_had^(5)(M_Z²) = 0.02783, PDG 2024 electroweak review (from memory); edit it',
    },
  }
})
