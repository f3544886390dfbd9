/**
 * The conventional (published) operator basis of the heavy-fermion Lagrangian through 1/m³,
 * written in the building blocks of structure.ts, with the coefficient relations that
 * Lorentz (reparametrization) invariance imposes, attached as data to the operators they
 * constrain. The engine verifies at run time that these operators span exactly the
 * enumerated space at each order (see verifyConventional).
 *
 * Each entry prints as the source prints it: L ⊃ sign · c · (i if `imaginary`) · scale ·
 * body / m^order, coupling absorbed into E and B, with the body written by `combo` term by
 * term (see printedFactor for the bridge to the real algebra of algebra.ts).
 */
import { combo, type Combo } from './structure'
import { physicalPhase, type Phased } from './display'
import { neg, parseRational } from '../exact/rational'
import { fieldTex } from './fieldTex'

export interface CoefficientRelation {
  coefficient: string
  relation: string
  source: string
}

export interface ConventionalOperator {
  id: string
  order: number
  coefficient: string
  /** Physical form as printed in the literature; "{F}" stands for the heavy field. */
  latex: string
  /** The printed body, term by term, in building blocks. */
  combo: Combo
  /** Leading sign in front of the coefficient as printed. */
  sign: 1 | -1
  /** The printed form carries an explicit factor i. */
  imaginary: boolean
  /** Numerical factor as printed (e.g. "1/8" for X/8m³). */
  scale: string
  relations: CoefficientRelation[]
  /** What the gauge field's own EOM (Maxwell) would do with this operator, if anything. */
  gaugeEomNote?: string
  source: string
}

const MANOHAR = 'Manohar, Phys. Rev. D 56 (1997) 230'
const HLPS = 'Hill, Lee, Paz, Solon, Phys. Rev. D 87 (2013) 053017'
const LUKE_MANOHAR = 'Luke, Manohar, Phys. Lett. B 286 (1992) 348'
const CASWELL_LEPAGE = 'Caswell, Lepage, Phys. Lett. B 167 (1986) 437'
const BMT = 'checked against the Thomas–BMT precession in tests'

type Entry = Omit<ConventionalOperator, 'sign' | 'imaginary' | 'relations'> & Partial<Pick<ConventionalOperator, 'sign' | 'imaginary' | 'relations'>>
const entry = (e: Entry): ConventionalOperator => ({ sign: 1, imaginary: false, relations: [], ...e })

/** The published operators, 1/m through 1/m³ (spin-1/2 heavy fermion, abelian gauge field). */
export const CONVENTIONAL_OPERATORS: readonly ConventionalOperator[] = [
  entry({
    id: 'kinetic',
    order: 1,
    coefficient: 'c_k',
    latex: 'c_k\\, {F}^\\dagger \\frac{\\bm{D}^2}{2m} {F}',
    scale: '1/2',
    combo: combo([[1, 'D_i D_i']]),
    relations: [{ coefficient: 'c_k', relation: 'c_k = 1', source: `${LUKE_MANOHAR}; ${MANOHAR}` }],
    source: CASWELL_LEPAGE,
  }),
  entry({
    id: 'fermi',
    order: 1,
    coefficient: 'c_F',
    latex: 'c_F\\, {F}^\\dagger \\frac{\\bm{\\sigma}\\cdot\\bm{B}}{2m} {F}',
    scale: '1/2',
    combo: combo([[1, 's_k B_k']]),
    source: CASWELL_LEPAGE,
  }),
  entry({
    id: 'darwin',
    order: 2,
    coefficient: 'c_D',
    latex: 'c_D\\, {F}^\\dagger \\frac{[\\bm{D}\\cdot\\bm{E}]}{8m^2} {F}',
    scale: '1/8',
    combo: combo([
      [1, 'D_i E_i'],
      [-1, 'E_i D_i'],
    ]),
    gaugeEomNote: 'Gauss law ∇·E = ρ turns it into contact four-fermion operators (ψ†ψ)(ψ†ψ), (ψ†ψ)(χ†χ) and light-charge terms',
    source: CASWELL_LEPAGE,
  }),
  entry({
    id: 'spinOrbit',
    order: 2,
    coefficient: 'c_S',
    imaginary: true,
    scale: '1/8',
    latex: 'c_S\\, {F}^\\dagger \\frac{i\\bm{\\sigma}\\cdot(\\bm{D}\\times\\bm{E} - \\bm{E}\\times\\bm{D})}{8m^2} {F}',
    combo: combo([
      [1, 's_k eps_kij D_i E_j'],
      [-1, 's_k eps_kij E_i D_j'],
    ]),
    relations: [{ coefficient: 'c_S', relation: 'c_S = 2 c_F − 1', source: `${LUKE_MANOHAR}; ${MANOHAR}` }],
    source: CASWELL_LEPAGE,
  }),
  entry({
    id: 'D4',
    order: 3,
    coefficient: 'c_4',
    latex: 'c_4\\, {F}^\\dagger \\frac{\\bm{D}^4}{8m^3} {F}',
    scale: '1/8',
    combo: combo([[1, 'D_i D_i D_j D_j']]),
    relations: [{ coefficient: 'c_4', relation: 'c_4 = 1', source: `${MANOHAR} (from memory); free dispersion √(p²+m²) in tests` }],
    source: MANOHAR,
  }),
  entry({
    id: 'W1',
    order: 3,
    coefficient: 'c_{W1}',
    latex: 'c_{W1}\\, {F}^\\dagger \\frac{\\{\\bm{D}^2, \\bm{\\sigma}\\cdot\\bm{B}\\}}{8m^3} {F}',
    scale: '1/8',
    combo: combo([
      [1, 'D_i D_i s_k B_k'],
      [1, 's_k B_k D_i D_i'],
    ]),
    source: MANOHAR,
  }),
  entry({
    id: 'W2',
    order: 3,
    coefficient: 'c_{W2}',
    sign: -1,
    latex: '-c_{W2}\\, {F}^\\dagger \\frac{D^i \\bm{\\sigma}\\cdot\\bm{B} D^i}{4m^3} {F}',
    scale: '1/4',
    combo: combo([[1, 'D_i s_k B_k D_i']]),
    relations: [{ coefficient: 'c_{W2}', relation: 'c_{W2} = c_{W1} − 1', source: `${MANOHAR}; ${HLPS}; ${BMT}` }],
    source: MANOHAR,
  }),
  entry({
    id: 'pp',
    order: 3,
    coefficient: "c_{p'p}",
    scale: '1/8',
    latex: "c_{p'p}\\, {F}^\\dagger \\frac{\\bm{\\sigma}\\cdot\\bm{D}\\,\\bm{B}\\cdot\\bm{D} + \\bm{B}\\cdot\\bm{D}\\,\\bm{\\sigma}\\cdot\\bm{D}}{8m^3} {F}",
    combo: combo([
      [1, 's_i D_i B_j D_j'],
      [1, 's_j B_i D_i D_j'],
    ]),
    relations: [{ coefficient: "c_{p'p}", relation: "c_{p'p} = c_F − 1", source: `${MANOHAR}; ${HLPS}; ${BMT}` }],
    source: MANOHAR,
  }),
  entry({
    id: 'M',
    order: 3,
    coefficient: 'c_M',
    imaginary: true,
    scale: '1/8',
    latex: 'c_M\\, {F}^\\dagger \\frac{i\\{D^i, [\\bm{D}\\times\\bm{B}]^i\\}}{8m^3} {F}',
    combo: combo([
      [1, 'D_i eps_ijk D_j B_k'],
      [-1, 'D_i eps_ijk B_k D_j'],
      [1, 'eps_ijk D_j B_k D_i'],
      [-1, 'eps_ijk B_k D_j D_i'],
    ]),
    gaugeEomNote: 'Ampère law ∇×B − ∂_tE = J turns it into current–current four-fermion operators (plus a ∂_tE term)',
    source: MANOHAR,
  }),
  entry({
    id: 'A1',
    order: 3,
    coefficient: 'c_{A1}',
    latex: 'c_{A1}\\, {F}^\\dagger \\frac{\\bm{B}^2 - \\bm{E}^2}{8m^3} {F}',
    scale: '1/8',
    combo: combo([
      [1, 'B_k B_k'],
      [-1, 'E_k E_k'],
    ]),
    source: MANOHAR,
  }),
  entry({
    id: 'A2',
    order: 3,
    coefficient: 'c_{A2}',
    sign: -1,
    latex: '-c_{A2}\\, {F}^\\dagger \\frac{\\bm{E}^2}{16m^3} {F}',
    scale: '1/16',
    combo: combo([[1, 'E_k E_k']]),
    source: `${MANOHAR}; ${HLPS}`,
  }),
]

/**
 * The published operators of the heavy quark in the fundamental of SU(N) through 1/m³:
 * the abelian list with E, B colour matrices (products such as B² = B^aB^bT^aT^b), plus the
 * colour traces and the commutator terms that vanish for an abelian field (Manohar, Phys. Rev.
 * D 56 (1997) 230, NRQCD part; the printed signs of c_A3, c_A4, c_B1, c_B2 from memory). The
 * reparametrization relations are those of the abelian case.
 */
export const NONABELIAN_OPERATORS: readonly ConventionalOperator[] = [
  ...CONVENTIONAL_OPERATORS,
  entry({
    id: 'A3',
    order: 3,
    coefficient: 'c_{A3}',
    latex: 'c_{A3}\\, {F}^\\dagger \\frac{\\mathrm{tr}(\\bm{B}^2 - \\bm{E}^2)}{8m^3} {F}',
    scale: '1/8',
    combo: combo([
      [1, 'tr B_k B_k'],
      [-1, 'tr E_k E_k'],
    ]),
    source: `${MANOHAR} (from memory)`,
  }),
  entry({
    id: 'A4',
    order: 3,
    coefficient: 'c_{A4}',
    sign: -1,
    latex: '-c_{A4}\\, {F}^\\dagger \\frac{\\mathrm{tr}\\,\\bm{E}^2}{16m^3} {F}',
    scale: '1/16',
    combo: combo([[1, 'tr E_k E_k']]),
    source: `${MANOHAR} (from memory)`,
  }),
  entry({
    id: 'B1',
    order: 3,
    coefficient: 'c_{B1}',
    imaginary: true,
    scale: '1/8',
    latex: 'c_{B1}\\, {F}^\\dagger \\frac{i\\bm{\\sigma}\\cdot(\\bm{B}\\times\\bm{B} - \\bm{E}\\times\\bm{E})}{8m^3} {F}',
    combo: combo([
      [1, 's_k eps_kij B_i B_j'],
      [-1, 's_k eps_kij E_i E_j'],
    ]),
    source: `${MANOHAR} (from memory)`,
  }),
  entry({
    id: 'B2',
    order: 3,
    coefficient: 'c_{B2}',
    sign: -1,
    imaginary: true,
    scale: '1/8',
    latex: '-c_{B2}\\, {F}^\\dagger \\frac{i\\bm{\\sigma}\\cdot(\\bm{E}\\times\\bm{E})}{8m^3} {F}',
    combo: combo([[1, 's_k eps_kij E_i E_j']]),
    source: `${MANOHAR} (from memory)`,
  }),
]

/** Leading-order operator ψ† iD_t ψ (defines the EOM; coefficient 1 by normalisation of ψ). */
export const LEADING_OPERATOR = {
  id: 'leading',
  order: 0,
  coefficient: '1',
  latex: '{F}^\\dagger iD_t {F}',
  relations: [{ coefficient: '1', relation: 'normalisation of the heavy field', source: 'common practice' }],
}

/**
 * The factor f with (printed operator, without c and 1/m^n) = f · (real-algebra combo):
 * the printed body is the combo divided by i^physicalPhase (ℰ = igE, ℬ = −igB, s = iσ,
 * couplings absorbed), times the printed sign, i and scale.
 * @example printedPerReal(W2) // { r: -1/4, k: 0 }: −D^iσ·BD^i/4 = −¼ · D_i s_k ℬ_k D_i
 */
export function printedPerReal(op: ConventionalOperator): Phased {
  const k = ((((op.imaginary ? 1 : 0) - physicalPhase(op.combo[0]!.s)) % 4) + 4) % 4
  const r = parseRational(op.scale)
  return { r: op.sign < 0 ? neg(r) : r, k }
}

/** The printed LaTeX with the theory's own field name. */
export function printedLatex(latex: string, field: string): string {
  return latex.split('{F}').join(fieldTex(field))
}
