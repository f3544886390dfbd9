/**
 * The conventional (published) operator basis of the heavy-fermion Lagrangian through 1/m³,
 * written in the building blocks of structure.ts, with the coefficient relations that
 * Lorentz (reparametrization) invariance imposes, attached as data to the operators they
 * constrain. The engine verifies at run time that these operators span exactly the
 * enumerated space at each order (see verifyConventional).
 */
import { combo, type Combo } from './structure'

export interface CoefficientRelation {
  coefficient: string
  relation: string
  source: string
}

export interface ConventionalOperator {
  id: string
  order: number
  coefficient: string
  /** Physical form as printed in the literature (coupling e absorbed). */
  latex: string
  combo: Combo
  relations: CoefficientRelation[]
  /** What the gauge field's own EOM (Maxwell) would do with this operator, if anything. */
  gaugeEomNote?: string
  source: string
}

const MANOHAR = 'Manohar, Phys. Rev. D 56 (1997) 230'
const HLPS = 'Hill, Lee, Paz, Solon, Phys. Rev. D 87 (2013) 053017'
const LUKE_MANOHAR = 'Luke, Manohar, Phys. Lett. B 286 (1992) 348'
const CASWELL_LEPAGE = 'Caswell, Lepage, Phys. Lett. B 167 (1986) 437'

/** The published operators, 1/m through 1/m³ (spin-1/2 heavy fermion, abelian gauge field). */
export const CONVENTIONAL_OPERATORS: readonly ConventionalOperator[] = [
  {
    id: 'kinetic', order: 1, coefficient: 'c_k', latex: '\\psi^\\dagger \\frac{\\bm{D}^2}{2m} \\psi',
    combo: combo([[1, 'D_i D_i']]),
    relations: [{ coefficient: 'c_k', relation: 'c_k = 1', source: `${LUKE_MANOHAR}; ${MANOHAR}` }],
    source: CASWELL_LEPAGE,
  },
  {
    id: 'fermi', order: 1, coefficient: 'c_F', latex: '\\psi^\\dagger \\frac{\\bm{\\sigma}\\cdot\\bm{B}}{2m} \\psi',
    combo: combo([[1, 's_k B_k']]), relations: [], source: CASWELL_LEPAGE,
  },
  {
    id: 'darwin', order: 2, coefficient: 'c_D', latex: '\\psi^\\dagger \\frac{[\\bm{D}\\cdot\\bm{E}]}{8m^2} \\psi',
    combo: combo([[1, 'D_i E_i'], [-1, 'E_i D_i']]), relations: [],
    gaugeEomNote: 'Gauss law ∇·E = ρ turns it into contact four-fermion operators (ψ†ψ)(ψ†ψ), (ψ†ψ)(χ†χ) and light-charge terms',
    source: CASWELL_LEPAGE,
  },
  {
    id: 'spinOrbit', order: 2, coefficient: 'c_S',
    latex: '\\psi^\\dagger \\frac{i\\bm{\\sigma}\\cdot(\\bm{D}\\times\\bm{E} - \\bm{E}\\times\\bm{D})}{8m^2} \\psi',
    combo: combo([[1, 's_k eps_kij D_i E_j'], [-1, 's_k eps_kij E_i D_j']]),
    relations: [{ coefficient: 'c_S', relation: 'c_S = 2 c_F − 1', source: `${LUKE_MANOHAR}; ${MANOHAR}` }],
    source: CASWELL_LEPAGE,
  },
  {
    id: 'D4', order: 3, coefficient: 'c_4', latex: '\\psi^\\dagger \\frac{\\bm{D}^4}{8m^3} \\psi',
    combo: combo([[1, 'D_i D_i D_j D_j']]),
    relations: [{ coefficient: 'c_4', relation: 'c_4 = 1', source: `${MANOHAR} (from memory)` }],
    source: MANOHAR,
  },
  {
    id: 'W1', order: 3, coefficient: 'c_{W1}', latex: '\\psi^\\dagger \\frac{\\{\\bm{D}^2, \\bm{\\sigma}\\cdot\\bm{B}\\}}{8m^3} \\psi',
    combo: combo([[1, 'D_i D_i s_k B_k'], [1, 's_k B_k D_i D_i']]), relations: [], source: MANOHAR,
  },
  {
    id: 'W2', order: 3, coefficient: 'c_{W2}', latex: '\\psi^\\dagger \\frac{D^i \\bm{\\sigma}\\cdot\\bm{B} D^i}{4m^3} \\psi',
    combo: combo([[1, 'D_i s_k B_k D_i']]),
    relations: [{ coefficient: 'c_{W2}', relation: 'c_{W2} = c_{W1} − 1', source: `${MANOHAR}; ${HLPS}` }],
    source: MANOHAR,
  },
  {
    id: 'pp', order: 3, coefficient: "c_{p'p}",
    latex: '\\psi^\\dagger \\frac{\\bm{\\sigma}\\cdot\\bm{D}\\,\\bm{B}\\cdot\\bm{D} + \\bm{B}\\cdot\\bm{D}\\,\\bm{\\sigma}\\cdot\\bm{D}}{8m^3} \\psi',
    combo: combo([[1, 's_i D_i B_j D_j'], [1, 's_j B_i D_i D_j']]),
    relations: [{ coefficient: "c_{p'p}", relation: "c_{p'p} = c_F − 1", source: `${MANOHAR}; ${HLPS}` }],
    source: MANOHAR,
  },
  {
    id: 'M', order: 3, coefficient: 'c_M', latex: '\\psi^\\dagger \\frac{i\\{D^i, [\\nabla\\times\\bm{B}]^i\\}}{8m^3} \\psi',
    combo: combo([
      [1, 'D_i eps_ijk D_j B_k'], [-1, 'D_i eps_ijk B_k D_j'], [1, 'eps_ijk D_j B_k D_i'], [-1, 'eps_ijk B_k D_j D_i'],
    ]),
    relations: [],
    gaugeEomNote: 'Ampère law ∇×B − ∂_tE = J turns it into current–current four-fermion operators (plus a ∂_tE term)',
    source: MANOHAR,
  },
  {
    id: 'A1', order: 3, coefficient: 'c_{A1}', latex: '\\psi^\\dagger \\frac{\\bm{B}^2 - \\bm{E}^2}{8m^3} \\psi',
    combo: combo([[1, 'B_k B_k'], [-1, 'E_k E_k']]), relations: [], source: MANOHAR,
  },
  {
    id: 'A2', order: 3, coefficient: 'c_{A2}', latex: '\\psi^\\dagger \\frac{\\bm{E}^2}{16m^3} \\psi',
    combo: combo([[1, 'E_k E_k']]), relations: [], source: MANOHAR,
  },
]

/** Leading-order operator ψ† iD_t ψ (defines the EOM; coefficient 1 by normalisation of ψ). */
export const LEADING_OPERATOR = {
  id: 'leading', order: 0, coefficient: '1', latex: '\\psi^\\dagger iD_t \\psi',
  relations: [{ coefficient: '1', relation: 'normalisation of the heavy field', source: 'common practice' }],
}
