/**
 * The QED coupling at the Z mass from α(0): the one-loop leptonic shift is computed, the
 * hadronic shift Δα_had^(5) is an input (dispersion integral over e+e- data, not computable
 * perturbatively), and the MS-bar coupling α̂(M_Z) follows from the on-shell one.
 */
import { EngineInputError } from '../errors'
import { ALPHA_INVERSE, ELECTRON_MASS_MEV, MUON_MASS_MEV, TAU_MASS_MEV } from '../scales/codata2018'
import { W_MASS_GEV, Z_MASS_GEV } from '../scales/pdg2024'
import { RUNNING_CAUTION } from './caution'

const LEPTON_MASSES_GEV = [ELECTRON_MASS_MEV / 1000, MUON_MASS_MEV / 1000, TAU_MASS_MEV / 1000]

function requirePositive(fn: string, name: string, x: number): void {
  if (!Number.isFinite(x) || x <= 0) throw new EngineInputError(fn, `${name} must be a positive number, but it is ${x}`)
}

/**
 * One-loop leptonic shift of the on-shell coupling, Δα_lep(q²) = (α/3π) Σ_l [ln(q²/m_l²) − 5/3].
 * Convention: leading term for q² ≫ m_l² (mass corrections O(m_l²/q²) dropped); α = α(0).
 * @example leptonicShiftOneLoop(91.1876) // 0.031420
 * Method: large-q² expansion of the one-loop vacuum polarization Π̂(q²).
 * Reference: M. Steinhauser, Phys. Lett. B 429 (1998) 158 (its one-loop term).
 */
export function leptonicShiftOneLoop(muGeV: number, alphaInverse0 = ALPHA_INVERSE, leptonMassesGeV: readonly number[] = LEPTON_MASSES_GEV): number {
  requirePositive('leptonicShiftOneLoop', 'The scale μ (GeV)', muGeV)
  requirePositive('leptonicShiftOneLoop', 'α(0)⁻¹', alphaInverse0)
  const sum = leptonMassesGeV.reduce((s, m) => s + 2 * Math.log(muGeV / m) - 5 / 3, 0)
  return sum / (3 * Math.PI * alphaInverse0)
}

export interface AlphaQedAtZInput {
  /** Hadronic five-flavour shift Δα_had^(5)(M_Z²) — an input (e.g. PDG). */
  deltaAlphaHad5: number
  mZ?: number
  mW?: number
  alphaInverse0?: number
}
export interface AlphaQedAtZResult {
  deltaAlphaLeptonic: number
  onShell: { alphaInverse: number; deltaAlpha: number }
  msbar: { alphaInverse: number; deltaAlphaHat: number; conversion: number }
  computed: string[]
  inputs: Record<string, { value: number; source: string }>
  caution: string
}

/**
 * On-shell α(M_Z)^-1 = α(0)^-1 (1 − Δα_lep − Δα_had^(5)) and MS-bar α̂(M_Z)^-1 = α(0)^-1 (1 − Δα̂),
 * Δα̂ − Δα = (α/π)[100/27 − 1/6 − (7/4) ln(M_Z²/M_W²)] (fermion scheme conversion + W loop;
 * O(α α_s) and top terms dropped).
 * @example alphaQedAtZ({ deltaAlphaHad5: 0.02766 }).onShell.alphaInverse // ≈ 128.94
 * Method: one-loop leptonic shift (leptonicShiftOneLoop), hadronic shift as input, one-loop conversion.
 * Reference: Steinhauser, Phys. Lett. B 429 (1998) 158; PDG 2024 review "Electroweak model and
 *   constraints on new physics" (J. Erler, A. Freitas), conversion formula quoted from memory.
 */
export function alphaQedAtZ(input: AlphaQedAtZInput): AlphaQedAtZResult {
  const mZ = input.mZ ?? Z_MASS_GEV
  const mW = input.mW ?? W_MASS_GEV
  const inv0 = input.alphaInverse0 ?? ALPHA_INVERSE
  const had = input.deltaAlphaHad5
  if (!Number.isFinite(had) || had < 0 || had > 0.1) throw new EngineInputError('alphaQedAtZ', `The hadronic shift Δα_had⁽⁵⁾(M_Z²) must be a number from 0 to 0.1, but it is ${had}`)
  requirePositive('alphaQedAtZ', 'M_Z (GeV)', mZ)
  requirePositive('alphaQedAtZ', 'M_W (GeV)', mW)
  if (mW >= mZ) throw new EngineInputError('alphaQedAtZ', `M_W = ${mW} GeV must be below M_Z = ${mZ} GeV`)
  const lep = leptonicShiftOneLoop(mZ, inv0)
  const deltaAlpha = lep + had
  const conversion = (100 / 27 - 1 / 6 - (7 / 4) * Math.log((mZ * mZ) / (mW * mW))) / (Math.PI * inv0)
  return {
    deltaAlphaLeptonic: lep,
    onShell: { alphaInverse: inv0 * (1 - deltaAlpha), deltaAlpha },
    msbar: { alphaInverse: inv0 * (1 - deltaAlpha - conversion), deltaAlphaHat: deltaAlpha + conversion, conversion },
    computed: ['Δα_lep at one loop', 'on-shell α(M_Z)', 'MS-bar α̂(M_Z) via the one-loop scheme conversion'],
    inputs: {
      alphaInverse0: { value: inv0, source: input.alphaInverse0 === undefined ? 'CODATA 2018' : 'user' },
      deltaAlphaHad5: { value: had, source: 'user (e.g. PDG electroweak review)' },
      mZ: { value: mZ, source: input.mZ === undefined ? 'PDG 2024' : 'user' },
      mW: { value: mW, source: input.mW === undefined ? 'PDG 2024' : 'user' },
    },
    caution: RUNNING_CAUTION,
  }
}
