/**
 * The published four-fermion operators of Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995)
 * 1125 (annihilation ordering ψ†…χ χ†…ψ, colour singlet 1 and octet T^a), written in the
 * structures of fourStructure.ts. Relative derivatives D⃡ (their −(i/2)D⃡ up to a constant
 * factor, which does not affect spans) are expanded into derivatives on single legs.
 * Their dimension-8 list is quoted from memory (eq. 2.10 there), including the S–D mixing
 * operator P(³S₁,³D₁) that the lists of P-wave and S-wave operators sometimes omit.
 */
import { daggerFourCombo, expandArrows, fourCombo, simplifyFour, type FourCombo } from './fourStructure'

export interface FourConventional {
  id: string
  order: number
  latex: string
  combo: FourCombo
  source: string
}

const BBL = 'Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125'

function arrows(terms: Array<[number, string]>, hermitianPart = false): FourCombo {
  const c = fourCombo(terms.flatMap(([k, t]) => expandArrows(t).map(([s, x]): [number, string] => [k * s, x])))
  return simplifyFour(hermitianPart ? [...c, ...daggerFourCombo(c)] : c)
}

interface Entry {
  name: string
  order: number
  latex: string
  terms: Array<[number, string]>
  hc?: boolean
}

/** Operators per colour structure; '%' stands for the colour token (empty or "oct"). */
const ENTRIES: Entry[] = [
  { name: '(1S0)', order: 2, latex: '\\psi^\\dagger {T} \\chi\\, \\chi^\\dagger {T} \\psi', terms: [[1, 'ex %']] },
  { name: '(3S1)', order: 2, latex: '\\psi^\\dagger \\bm{\\sigma} {T} \\chi \\cdot \\chi^\\dagger \\bm{\\sigma} {T} \\psi', terms: [[1, 'ex % s1_i s2_i']] },
  {
    name: '(1P1)',
    order: 4,
    latex: '\\psi^\\dagger (-\\tfrac{i}{2}\\overleftrightarrow{\\bm{D}}) {T} \\chi \\cdot \\chi^\\dagger (-\\tfrac{i}{2}\\overleftrightarrow{\\bm{D}}) {T} \\psi',
    terms: [[1, 'ex % L_i R_i']],
  },
  {
    name: '(3P0)',
    order: 4,
    latex:
      '\\tfrac13 \\psi^\\dagger (-\\tfrac{i}{2}\\overleftrightarrow{\\bm{D}}\\cdot\\bm{\\sigma}) {T} \\chi\\, \\chi^\\dagger (-\\tfrac{i}{2}\\overleftrightarrow{\\bm{D}}\\cdot\\bm{\\sigma}) {T} \\psi',
    terms: [[1, 'ex % s1_i L_i s2_j R_j']],
  },
  {
    name: '(3P1)',
    order: 4,
    latex:
      '\\tfrac12 \\psi^\\dagger (-\\tfrac{i}{2}\\overleftrightarrow{\\bm{D}}\\times\\bm{\\sigma}) {T} \\chi \\cdot \\chi^\\dagger (-\\tfrac{i}{2}\\overleftrightarrow{\\bm{D}}\\times\\bm{\\sigma}) {T} \\psi',
    terms: [
      [1, 'ex % s1_j s2_j L_i R_i'],
      [-1, 'ex % s1_j L_i s2_i R_j'],
    ],
  },
  {
    name: '(3P2)',
    order: 4,
    latex: '\\psi^\\dagger (-\\tfrac{i}{2}\\overleftrightarrow{D}^{(i}\\sigma^{j)}) {T} \\chi\\, \\chi^\\dagger (-\\tfrac{i}{2}\\overleftrightarrow{D}^{(i}\\sigma^{j)}) {T} \\psi',
    terms: [
      [3, 'ex % s1_j s2_j L_i R_i'],
      [3, 'ex % s1_j L_i s2_i R_j'],
      [-2, 'ex % s1_i L_i s2_j R_j'],
    ],
  },
  {
    name: 'P(1S0)',
    order: 4,
    latex: '\\tfrac12\\left[\\psi^\\dagger {T} \\chi\\, \\chi^\\dagger (-\\tfrac{i}{2}\\overleftrightarrow{\\bm{D}})^2 {T} \\psi + \\mathrm{h.c.}\\right]',
    terms: [[1, 'ex % R_i R_i']],
    hc: true,
  },
  {
    name: 'P(3S1)',
    order: 4,
    latex: '\\tfrac12\\left[\\psi^\\dagger \\bm{\\sigma} {T} \\chi \\cdot \\chi^\\dagger \\bm{\\sigma} (-\\tfrac{i}{2}\\overleftrightarrow{\\bm{D}})^2 {T} \\psi + \\mathrm{h.c.}\\right]',
    terms: [[1, 'ex % s1_i s2_i R_j R_j']],
    hc: true,
  },
  {
    name: 'P(3S1,3D1)',
    order: 4,
    latex:
      '\\tfrac12\\left[\\psi^\\dagger \\sigma^i {T} \\chi\\, \\chi^\\dagger \\sigma^j (-\\tfrac{i}{2})^2\\overleftrightarrow{D}^{(i}\\overleftrightarrow{D}^{j)} {T} \\psi + \\mathrm{h.c.}\\right]',
    terms: [
      [3, 'ex % s1_i s2_j R_i R_j'],
      [-1, 'ex % s1_i s2_i R_j R_j'],
    ],
    hc: true,
  },
]

/**
 * The published operators of one order for colour dimension N (singlet only for N = 1).
 * @example conventionalFour(4, 3).length // 14 (seven singlet, seven octet)
 */
export function conventionalFour(order: number, colorN: number): FourConventional[] {
  const out: FourConventional[] = []
  const channels: Array<[string, string]> =
    colorN === 1
      ? [['1', '']]
      : [
          ['1', ''],
          ['8', 'oct'],
        ]
  for (const [tag, colour] of channels) {
    for (const e of ENTRIES.filter((x) => x.order === order)) {
      const id = `${e.name.startsWith('P') ? 'P' : 'O'}_${tag}${e.name.replace(/^P/, '')}`
      const terms = e.terms.map(([k, t]): [number, string] => [k, t.replace('%', colour)])
      out.push({ id, order, latex: e.latex.replaceAll('{T} ', colour ? 'T^a ' : ''), combo: arrows(terms, e.hc), source: BBL })
    }
  }
  return out
}

/**
 * The one Hermitian, P- and T-even rest-frame operator (colour singlet) that BBL do not list
 * because it is C-odd: the ¹P₁–³P₁ transition i[ψ†σ·(D⃡×D⃡)χ χ†ψ-type − h.c.], written
 * iε_ijk[(ψ†σ^i D⃡^j χ)(χ† D⃡^k ψ) − h.c.] (hand derivation, common practice).
 */
export function cOddMixing(): FourCombo {
  const c = arrows([[1, 'ex eps_ijk s1_i L_j R_k']])
  return simplifyFour([...c, ...daggerFourCombo(c).map((t) => ({ coef: -t.coef, s: t.s }))])
}
