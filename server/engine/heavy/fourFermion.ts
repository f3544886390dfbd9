/**
 * Enumeration of the heavy particle–antiparticle four-fermion contact operators ψ†ψχ†χ at
 * orders 1/m² and 1/m⁴, with the published operators of Bodwin, Braaten, Lepage (1995)
 * checked against the enumerated space.
 */
import { EngineCancelledError, EngineInputError } from '../errors'
import type { CancelFlag } from '../finite'
import type { HeavyOperator } from './heavyOperator'
import { conventionalFour } from './fourConventional'
import { fourComboLatex, fourTerms } from './fourDisplay'
import { fourFermionSpace } from './fourSpace'
import { enumerateFourField } from './fourField'

export interface FourFermionOrder {
  order: number
  /** Independent operators (Hermitian, rotation scalar, P-, T- and C-even) modulo IBP and EOM. */
  count: number
  basis: HeavyOperator[]
  /** Operators whose vertex survives with both pairs at rest (total momentum P = 0). */
  restFrameCount: number
  /** Same counts without imposing charge conjugation. */
  countWithoutC: number
  restFrameCountWithoutC: number
  candidates: number
  /** Published operators (BBL), their rank and whether they lie in / span the spaces. */
  conventional: HeavyOperator[]
  conventionalRank: number
  conventionalInBasis: boolean
  conventionalSpansRestFrame: boolean
  conventionalSpansBasis: boolean
  /** At 1/m⁴: the operators with one field strength (B), enumerated separately (fourField.ts). */
  fieldStrength: HeavyOperator[]
}

export const FOUR_FERMION_NOTE =
  'Four-fermion contact operators, enumerated by the rank of their tree-level contact vertex (random two-component ' +
  'spinors, colour wave-functions and leg momenta over two primes). Integration by parts is automatic: the four leg ' +
  'momenta sum to zero. The heavy-field EOM is automatic: every leg is on shell with zero energy at leading order, so ' +
  'D_t never appears. Spatial D acts as ∂ at this vertex; the operators with one field strength at 1/m⁴ are enumerated ' +
  'separately from their five-leg vertex (only B survives: E = [D_t, D] is removed by the EOM). χ creates the ' +
  'antiparticle and carries the colour of ψ ' +
  '(Bodwin, Braaten, Lepage convention); orderings ψ†Γχ χ†Γψ (listed first) and ψ†Γψ χ†Γχ are related by Fierz ' +
  'identities, which the vertex accounts for.'

/** Published LaTeX (written with ψ, χ) in the theory's own field names. */
function renameFields(tex: string, particle: string, anti: string): string {
  const f = (n: string): string => (n === 'psi' ? '\\psi' : n === 'chi' ? '\\chi' : n)
  return tex.split('\\psi').join('\u0001').split('\\chi').join(f(anti)).split('\u0001').join(f(particle))
}

function toOperator(order: number, i: number, combo: HeavyOperator['fourCombo'] & object, anti: boolean, p: string, a: string): HeavyOperator {
  return {
    id: `ff${order}.${i + 1}`,
    order,
    sector: 'fourFermion',
    latex: fourComboLatex(combo, anti, order, p, a),
    terms: fourTerms(combo, p, a),
    fourCombo: combo,
    antiHermitian: anti,
    relations: [],
    source: 'enumerated (contact-vertex rank); compare Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125',
  }
}

/**
 * Four-fermion basis at one order (2 or 4) for colour dimension N (1 = abelian).
 * @example enumerateFourFermion(4, 1, 'psi', 'chi').count // 12 (7 with both pairs at rest = BBL's list)
 * Method: Hermitian T-, C-even completions of δ/ε-contracted structures; rank of the contact
 * vertex at random points over two primes; greedy basis. Reference: Bodwin, Braaten, Lepage,
 * Phys. Rev. D 51 (1995) 1125.
 */
export function enumerateFourFermion(order: number, colorN: number, particle: string, anti: string, signal?: CancelFlag, timeReversal = true): FourFermionOrder {
  if (order !== 2 && order !== 4) throw new EngineInputError('enumerateFourFermion', `Four-fermion contact operators (parity even) come at orders 2 and 4 in 1/m, not at order ${order}`)
  if (signal?.aborted) throw new EngineCancelledError('four-fermion enumeration')
  const space = fourFermionSpace(order, { colorN, timeReversal, signal })
  const rest = fourFermionSpace(order, { colorN, timeReversal, restFrame: true, signal })
  const noC = fourFermionSpace(order, { colorN, timeReversal, chargeConjugation: false, signal })
  const restNoC = fourFermionSpace(order, { colorN, timeReversal, chargeConjugation: false, restFrame: true, signal })
  const basis = space.basis.map((b, i) => toOperator(order, i, space.candidates[b]!.combo, space.candidates[b]!.antiHermitian, particle, anti))
  const conv = conventionalFour(order, colorN)
  const combos = conv.map((c) => c.combo)
  const conventionalRank = rest.rankOf(combos)
  return {
    order,
    count: space.dimension,
    basis,
    restFrameCount: rest.dimension,
    countWithoutC: noC.dimension,
    restFrameCountWithoutC: restNoC.dimension,
    candidates: space.candidates.length,
    conventional: conv.map((c) => ({
      id: c.id,
      order,
      sector: 'fourFermion',
      latex: `${renameFields(c.latex, particle, anti)}/m^{${order}}`,
      terms: fourTerms(c.combo, particle, anti),
      fourCombo: c.combo,
      relations: [],
      source: c.source,
    })),
    conventionalRank,
    conventionalInBasis: space.contains(combos),
    conventionalSpansRestFrame: conventionalRank === rest.dimension && rest.contains(combos),
    conventionalSpansBasis: space.rankOf(combos) === space.dimension && space.contains(combos),
    fieldStrength: order === 4 ? enumerateFourField(colorN, particle, anti, { timeReversal, signal }).basis : [],
  }
}
