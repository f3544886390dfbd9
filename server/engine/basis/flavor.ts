/**
 * Flavor decomposition of a class. Operators with open flavor indices on m identical
 * fields are (V' ⊗ (C^{N_f})^{⊗m})^{S_m}, V' the space of unsymmetrised contact amplitudes
 * with the Fermi sign; by Schur–Weyl duality their number is Σ_λ m_λ · dim_{GL(N_f)}(λ),
 * with m_λ = rank of the Young symmetrizer Y_λ on V' (one product over blocks of identical
 * fields). Each (structure, λ) pair kept is one explicit operator whose flavor tensor has the
 * Young symmetry λ; it has dim_{GL(N_f)}(λ) independent flavor components.
 */
import { EngineConsistencyError } from '../errors'
import { PrimeSet } from '../finite/primeSet'
import { partitionsOf } from '../group/symmetricGroup'
import type { Theory } from '../../../shared/schemas/theory'
import type { ClassBasis } from './classBasis'
import { classCandidates } from './candidates'
import { amplitudeRows, samplePoints } from './evaluation'
import { composeBlocks, glDimension, standardTableaux, youngSymmetrizer } from './young'
import type { LegPermutation } from './symmetry'
import { formatLorentz } from './inputSyntax'
import { operatorLatex } from './latex'
import { fourComponentLatex } from './fourComponent'

export interface FlavorOperator {
  text: string
  latex: string
  /** Four-component form (see fourComponent.ts) or null. */
  latex4: string | null
  /** Young diagram per block of identical fields (blocks in class order). */
  young: number[][]
  flavorComponents: number
}

/**
 * Which symmetrizer a Young shape means, for every flavoured operator (shown with the basis).
 * Reference: Fulton & Harris, Representation Theory, §4.1 and §6.1 (Y_T = b_T a_T acting on
 * the tensor slots: row symmetrizer after column antisymmetrizer); dim Y_T·V^{⊗m} = dim_GL(N)(λ).
 */
export const YOUNG_CONVENTION =
  'A flavoured operator with Young shape λ on m identical fields has the flavour tensor C′ = Y_T C: T is the tableau of λ filled row by row with those fields in class order, and Y_T = (sum of the permutations within the rows of T) × (signed sum of the permutations within its columns): antisymmetrize the columns, then symmetrize the rows. Its flavour components, dim_GL(N_f)(λ), are those of this one image; the whole λ-part of the flavour tensor (all standard tableaux) has f^λ times as many and repeats the same operator f^λ times.'

export interface FlavorSummary {
  /** YOUNG_CONVENTION: which symmetrizer `young` means. */
  convention: string
  nf: number
  /** Flavor number per block of identical fields, with the block's particle label. */
  blocks: { label: string; size: number; flavors: number }[]
  /** Complex count of this class with flavors. */
  count: number
  hilbert: number
  realParameters: number
  tallyOk: boolean
  message?: string
  decomposition: { young: number[][]; multiplicity: number; componentsEach: number }[]
  operators: FlavorOperator[]
}

function blocksOf(b: ClassBasis, nf: number | undefined): { legs: number[]; label: string; flavors: number; fermion: boolean }[] {
  const out: { legs: number[]; label: string; flavors: number; fermion: boolean }[] = []
  b.class.legs.forEach((p, i) => {
    const last = out[out.length - 1]
    if (last && last.label === p.label) last.legs.push(i)
    else out.push({ legs: [i], label: p.label, flavors: p.flavored ? (nf ?? p.flavors) : 1, fermion: p.fermion })
  })
  return out
}

function product<T>(lists: T[][]): T[][] {
  return lists.reduce<T[][]>((acc, l) => acc.flatMap((a) => l.map((x) => [...a, x])), [[]])
}

/**
 * Decompose a class into flavor symmetries and count its operators for N_f flavors.
 * @example flavorDecomposition(t, classBasis(t, "L^2 H^2"), 3, 6).count // 6 (Weinberg: symmetric in flavor)
 * Method: Young symmetrizers on the amplitude space (Fulton & Harris §4.1), GL(N) dimensions
 * by the hook-content formula; tally against the Hilbert series with N_f flavors
 * (Henning, Lu, Melia & Murayama, JHEP 08 (2017) 016).
 */
export function flavorDecomposition(t: Theory, b: ClassBasis, nf: number | undefined, hilbert: number, signal?: { aborted: boolean }): FlavorSummary {
  const blocks = blocksOf(b, nf)
  const n = b.class.legs.length
  const { lorentz, gauge, candidates } = classCandidates(t, b.class)
  const nG = gauge.length
  const set = PrimeSet.working()
  const points = set.fields.map((F, pi) => samplePoints(F, t, b.class, candidates.length + 12 + Math.ceil(candidates.length / 4), 7919 + pi))
  const shapes = product(blocks.map((bl) => partitionsOf(bl.legs.length)))
  const decomposition: FlavorSummary['decomposition'] = []
  const operators: FlavorOperator[] = []
  let dimV = 0
  for (const young of shapes) {
    const ys = young.map((lam, i) => youngSymmetrizer(lam, blocks[i]!.legs, n, blocks[i]!.fermion))
    const terms: LegPermutation[] = ys.reduce((acc, y) => composeBlocks(acc, y), [{ map: Array.from({ length: n }, (_, i) => i), sign: 1 }])
    const rows = set.fields.map((F, pi) => amplitudeRows(F, lorentz, gauge, points[pi]!, terms, signal))
    const { pivots } = set.echelon(rows, { fn: 'flavorDecomposition', about: `class ${b.key}, Young ${JSON.stringify(young)}` }, signal)
    const mult = pivots.length
    dimV += mult * young.reduce((s, lam) => s * standardTableaux(lam), 1)
    const each = young.reduce((s, lam, i) => s * glDimension(lam, blocks[i]!.flavors), 1)
    if (mult === 0 || each === 0) continue
    decomposition.push({ young, multiplicity: mult, componentsEach: each })
    for (const c of pivots) {
      const cand = candidates[c]!
      operators.push({
        text: formatLorentz(cand.lorentz, nG > 1 ? c % nG : null),
        latex: operatorLatex(b.class.legs, cand.lorentz, cand.gauge),
        latex4: fourComponentLatex(b.class.legs, cand.lorentz, cand.gauge),
        young,
        flavorComponents: each,
      })
    }
  }
  const identity = [{ map: Array.from({ length: n }, (_, i) => i), sign: 1 }]
  const full = set.rank(
    set.fields.map((F, pi) => amplitudeRows(F, lorentz, gauge, points[pi]!, identity, signal)),
    { fn: 'flavorDecomposition', about: `class ${b.key}` },
    signal,
  )
  if (full !== dimV) {
    throw new EngineConsistencyError('flavorDecomposition', `class ${b.key}: Σ m_λ f^λ = ${dimV} differs from the unsymmetrised rank ${full}`)
  }
  const count = decomposition.reduce((s, d) => s + d.multiplicity * d.componentsEach, 0)
  const ok = count === hilbert
  return {
    convention: YOUNG_CONVENTION,
    nf: nf ?? Math.max(...blocks.map((bl) => bl.flavors)),
    blocks: blocks.map((bl) => ({ label: bl.label, size: bl.legs.length, flavors: bl.flavors })),
    count,
    hilbert,
    realParameters: b.selfConjugate ? count : 2 * count,
    tallyOk: ok,
    ...(ok ? {} : { message: `class ${b.key}: flavor count ${count} differs from Hilbert-series count ${hilbert}` }),
    decomposition,
    operators,
  }
}
