/**
 * Contact operators of two heavy particles of the same kind, (ψ†Γ₁ψ)(ψ†Γ₂ψ), at 1/m² (no
 * derivative) and 1/m⁴ (two), modulo IBP and the heavy-field EOM, Hermitian, P-even,
 * rotation scalars and — when imposed — T-even; from the rank of the contact vertex with
 * the two ψ and the two ψ† legs antisymmetrised (Fermi statistics: the operator sees two
 * identical particles, so Fierz rearrangements and the Pauli principle are built in).
 * The structures and the vertex are those of the particle–antiparticle sector
 * (fourStructure.ts, fourVertex.ts) with legs 0 = ψ†, 1 = ψ, 2 = ψ†, 3 = ψ in the direct
 * ordering (ψ†Γ₁ψ)(ψ†Γ₂ψ).
 */
import { EngineInputError } from '../errors'
import type { CancelFlag, PrimeField, SeededRandom } from '../finite'
import { contactRank } from './contactSpace'
import { symmetricFourCandidates } from './fourSpace'
import { evalFourCombo, pointTables, randomFourPoint, type FourPoint } from './fourVertex'
import { fourComboLatex, fourTerms } from './fourDisplay'
import type { FourCombo } from './fourStructure'
import type { HeavyOperator } from './heavyOperator'

export interface HeavyHeavyOrder {
  order: number
  count: number
  /** Operators that survive with both particles' total momentum zero (the pair's rest frame). */
  restFrameCount: number
  basis: HeavyOperator[]
}

export const HEAVY_HEAVY_NOTE =
  'Two-particle contact operators (ψ†Γψ)(ψ†Γψ), enumerated by the rank of their contact vertex with the two ψ and the two ' +
  'ψ† legs antisymmetrised (identical fermions): integration by parts and the heavy-field EOM are automatic, Fierz ' +
  'identities and the Pauli principle are built in. Spatial D acts as ∂ at this vertex (operators differing by field ' +
  'strengths are identified). The "rest frame" count keeps only what survives with total momentum zero.'

/** A point with the pair (legs 1, 3) and (legs 0, 2) each of total momentum zero when asked. */
function heavyPairPoint(F: PrimeField, rng: SeededRandom, colorN: number, restFrame: boolean): FourPoint {
  const pt = randomFourPoint(F, rng, colorN)
  if (!restFrame) return pt
  const neg = (v: number[]) => v.map((x) => F.neg(x))
  return { ...pt, k: [pt.k[0]!, pt.k[1]!, neg(pt.k[0]!), neg(pt.k[1]!)] }
}

const PERMS: Array<[number[], number]> = [
  [[0, 1, 2, 3], 1],
  [[2, 1, 0, 3], -1],
  [[0, 3, 2, 1], -1],
  [[2, 3, 0, 1], 1],
]

/** Antisymmetrised vertex of a combination (the operator's matrix element between identical particles). */
function antisymmetrised(F: PrimeField, c: FourCombo, pt: FourPoint): number {
  let total = 0
  for (const [perm, sign] of PERMS) {
    const q: FourPoint = { u: perm.map((l) => pt.u[l]!), k: perm.map((l) => pt.k[l]!), c: perm.map((l) => pt.c[l]!) }
    const v = evalFourCombo(F, c, q, pointTables(F, q))
    total = sign > 0 ? F.add(total, v) : F.sub(total, v)
  }
  return total
}

function rankOf(combos: FourCombo[], colorN: number, restFrame: boolean, signal?: CancelFlag): number[] {
  return contactRank(
    {
      size: combos.length,
      sample: (F, rng) => heavyPairPoint(F, rng, colorN, restFrame),
      values: (F, pt) => combos.map((c) => antisymmetrised(F, c, pt)),
    },
    { signal, label: 'heavy–heavy contact operators' },
  ).basis
}

/**
 * Heavy–heavy contact operators at one order (2 or 4) for colour dimension N (1 = abelian).
 * @example enumerateHeavyHeavy(2, 2, 'N', true).count // 2 (C_S, C_T for an isospin doublet)
 * Method: Hermitian, T-even completions of direct-ordering structures; antisymmetrised vertex
 * rank over two primes. Reference: Girlanda, Pastore, Schiavilla, Viviani, Phys. Rev. C 81
 * (2010) 034005 (2 and 7 operators for nucleons with isospin, centre-of-mass frame).
 */
export function enumerateHeavyHeavy(order: number, colorN: number, particle: string, timeReversal: boolean, signal?: CancelFlag): HeavyHeavyOrder {
  if (order !== 2 && order !== 4) throw new EngineInputError('enumerateHeavyHeavy', `Heavy–heavy contact operators (parity even) come at orders 2 and 4 in 1/m, not at order ${order}`)
  const colours = colorN === 1 ? (['singlet'] as const) : (['singlet', 'octet'] as const)
  const cands = symmetricFourCandidates(order - 2, colours, { chargeConjugation: false, timeReversal }).filter((c) => c.combo.every((t) => t.s.ordering === 'direct'))
  const basis = rankOf(
    cands.map((c) => c.combo),
    colorN,
    false,
    signal,
  )
  const rest = rankOf(
    cands.map((c) => c.combo),
    colorN,
    true,
    signal,
  )
  return {
    order,
    count: basis.length,
    restFrameCount: rest.length,
    basis: basis.map((b, i): HeavyOperator => ({
      id: `hh${order}.${i + 1}`,
      order,
      sector: 'heavyHeavy',
      latex: fourComboLatex(cands[b]!.combo, cands[b]!.antiHermitian, order, particle, particle),
      terms: fourTerms(cands[b]!.combo, particle, particle),
      fourCombo: cands[b]!.combo,
      antiHermitian: cands[b]!.antiHermitian,
      relations: [],
    })),
  }
}
