/**
 * Worked one-loop matching results: integrating out a heavy charged Dirac fermion (mass m,
 * charge Q in units of e) from QED. Each coefficient is exact: rational × α^k Q^{2k} / (π^p m^j).
 * Field conventions (E, B, F^{μν}, F̃^{μν}, metric) are those of fieldInvariants.ts; units are
 * Heaviside–Lorentz natural units, α = e²/4π.
 */
import { parseRational, toString as ratText, type Rational } from '../exact/rational'
import type { InvariantKey } from './fieldInvariants'
import { uehlingCoefficient, vacuumPolarizationSeries } from './vacuumPolarization'

export interface MatchingCoefficient {
  rational: Rational
  alphaPower: number
  /** Power of Q (the heavy fermion's charge); always 2 × alphaPower here. */
  chargePower: number
  /** Power of 1/π. */
  inversePiPower: number
  /** Power of 1/m. */
  inverseMassPower: number
}
export interface MatchingTerm {
  /** Monomial in the invariants of fieldInvariants.ts (exponents), when the operator is one; absent for derivative operators. */
  invariants?: Partial<Record<InvariantKey, number>>
  latex: string
  text: string
  coefficient: MatchingCoefficient
}
export interface MatchingForm {
  name: string
  terms: MatchingTerm[]
  note?: string
}
export interface MatchingEntry {
  id: string
  title: string
  source: string
  appliesTo: { heavyField: string; mass: string; charge: string; lightFields: string[] }
  loops: number
  dimension: number
  forms: MatchingForm[]
}

const q = parseRational
const c = (r: string, alphaPower: number, inverseMassPower: number, inversePiPower = 0): MatchingCoefficient => ({
  rational: q(r),
  alphaPower,
  chargePower: 2 * alphaPower,
  inversePiPower,
  inverseMassPower,
})
const QED_FERMION = { heavyField: 'Dirac fermion', mass: 'm', charge: 'Q', lightFields: ['photon A_μ'] }

const EULER_HEISENBERG: MatchingEntry = {
  id: 'euler-heisenberg',
  title: 'Euler–Heisenberg Lagrangian (light-by-light, weak-field limit)',
  source: 'W. Heisenberg, H. Euler, Z. Phys. 98 (1936) 714',
  appliesTo: QED_FERMION,
  loops: 1,
  dimension: 8,
  forms: [
    {
      name: 'E, B form',
      terms: [
        { invariants: { E2minusB2: 2 }, latex: '(\\mathbf E^2-\\mathbf B^2)^2', text: '(E^2 - B^2)^2', coefficient: c('2/45', 2, 4) },
        { invariants: { EdotB: 2 }, latex: '(\\mathbf E\\cdot\\mathbf B)^2', text: '(E.B)^2', coefficient: c('14/45', 2, 4) },
      ],
    },
    {
      name: 'covariant form',
      note: 'F F = 2(B² − E²), F F̃ = −4 E·B with ε^{0123} = +1',
      terms: [
        { invariants: { FF: 2 }, latex: '(F_{\\mu\\nu}F^{\\mu\\nu})^2', text: '(F_{mu nu} F^{mu nu})^2', coefficient: c('1/90', 2, 4) },
        { invariants: { FFdual: 2 }, latex: '(F_{\\mu\\nu}\\tilde F^{\\mu\\nu})^2', text: '(F_{mu nu} Ftilde^{mu nu})^2', coefficient: c('7/360', 2, 4) },
      ],
    },
  ],
}

/** F□F coefficient derived from the leading vacuum-polarization term (1/60), not typed in. */
const UEHLING_FBOXF = uehlingCoefficient(vacuumPolarizationSeries(1)[0]!)

const UEHLING: MatchingEntry = {
  id: 'uehling',
  title: 'Leading vacuum-polarization operator (Uehling term)',
  source: 'E. A. Uehling, Phys. Rev. 48 (1935) 55; derivation from Π̂₂(q²) ≈ −(α/15π) q²/m² as in M. E. Peskin, D. V. Schroeder, An Introduction to QFT (1995), §7.5',
  appliesTo: QED_FERMION,
  loops: 1,
  dimension: 6,
  forms: [
    { name: 'box form', terms: [{ latex: 'F_{\\mu\\nu}\\,\\Box F^{\\mu\\nu}', text: 'F_{mu nu} Box F^{mu nu}', coefficient: c(ratText(UEHLING_FBOXF), 1, 2, 1) }] },
    {
      name: 'current form',
      note: 'equal up to total derivatives (Bianchi identity); with ∂_μF^{μν} = e j^ν it is a contact current–current term',
      terms: [
        {
          latex: '(\\partial_\\mu F^{\\mu\\nu})(\\partial^\\rho F_{\\rho\\nu})',
          text: '(d_mu F^{mu nu})(d^rho F_{rho nu})',
          coefficient: c(ratText({ num: -2n * UEHLING_FBOXF.num, den: UEHLING_FBOXF.den }), 1, 2, 1),
        },
      ],
    },
  ],
}

/** The library of worked one-loop matching results, by id. */
export const MATCHING_LIBRARY: readonly MatchingEntry[] = [EULER_HEISENBERG, UEHLING]

/**
 * Human-readable coefficient, e.g. "2/45 α^2 Q^4 / m^4" or "1/60 α Q^2 / (π m^2)".
 * @example coefficientText(MATCHING_LIBRARY[1].forms[0].terms[0].coefficient) // '1/60 α Q^2 / (π m^2)'
 * Method: formatting only. Reference: common practice.
 */
export function coefficientText(k: MatchingCoefficient): string {
  const pw = (s: string, n: number) => (n === 0 ? '' : n === 1 ? s : `${s}^${n}`)
  const num = [pw('α', k.alphaPower), pw('Q', k.chargePower)].filter(Boolean).join(' ')
  const den = [pw('π', k.inversePiPower), pw('m', k.inverseMassPower)].filter(Boolean).join(' ')
  const denText = den.includes(' ') ? `(${den})` : den
  return `${ratText(k.rational)}${num ? ` ${num}` : ''}${den ? ` / ${denText}` : ''}`
}
