/**
 * How a field's SU(N) irrep is written as a tensor in explicit operators: traceless tensors
 * with upper indices of Young shape α and lower indices of Young shape β, written [α; β].
 * Convention (stated with every basis): the components lie in the image of the Young
 * symmetrizer Y = (column antisymmetrizer) ∘ (row symmetrizer) acting on the boxes numbered
 * row by row, for the upper and for the lower indices, and every trace δ^j_i vanishes.
 * The highest weight λ (a partition) is written with the fewest indices: μ = λ − c(1,…,1)
 * with Σ|μ_i| smallest, then |α| and |β| as close as possible, then the most upper indices;
 * α = the positive parts of μ, β = the negative parts reversed. Examples: fundamental [□; ·],
 * antifundamental [·; □], adjoint [□; □], SU(3) sextet [□□; ·], SU(5) 10 [□/□; ·], SU(2)
 * quartet [□□; □]. A conjugate field swaps α and β; a real field needs α = β.
 * Reference: Fulton & Harris, Representation Theory, §6.1 and §15.5 (Weyl's construction,
 * traceless mixed tensors); Koike, Adv. Math. 74 (1989) 57.
 */
import { EngineInputError } from '../errors'

export interface TensorShape {
  upper: number[]
  lower: number[]
}

export const SINGLET_SHAPE: TensorShape = { upper: [], lower: [] }

/**
 * The [α; β] form of the SU(n) irrep with Dynkin labels `dynkin`.
 * @example irrepShape(2, [3]) // { upper: [2], lower: [1] } (the quartet)
 */
export function irrepShape(n: number, dynkin: readonly number[]): TensorShape {
  const lambda = new Array<number>(n).fill(0)
  for (let i = n - 2; i >= 0; i--) lambda[i] = lambda[i + 1]! + dynkin[i]!
  let best: { cost: number; skew: number; upper: number; shape: TensorShape } | null = null
  for (let c = 0; c <= lambda[0]!; c++) {
    const mu = lambda.map((x) => x - c)
    const upper = mu.filter((x) => x > 0)
    const lower = mu
      .filter((x) => x < 0)
      .map((x) => -x)
      .reverse()
    const size = (p: number[]) => p.reduce((s, x) => s + x, 0)
    const cand = { cost: size(upper) + size(lower), skew: Math.abs(size(upper) - size(lower)), upper: size(upper), shape: { upper, lower } }
    if (!best || cand.cost < best.cost || (cand.cost === best.cost && (cand.skew < best.skew || (cand.skew === best.skew && cand.upper > best.upper)))) best = cand
  }
  return best!.shape
}

/** The shape of the conjugate field: upper and lower swapped. */
export function conjugateShape(s: TensorShape): TensorShape {
  return { upper: s.lower.slice(), lower: s.upper.slice() }
}

/** True when the shape reads the same with upper and lower swapped (a real field's requirement). */
export function isSelfConjugateShape(s: TensorShape): boolean {
  return s.upper.join(',') === s.lower.join(',')
}

/** Number of boxes of a partition. */
export function boxes(p: readonly number[]): number {
  return p.reduce((s, x) => s + x, 0)
}

/** Row of each box, boxes numbered row by row. @example boxRows([2, 1]) // [0, 0, 1] */
export function boxRows(p: readonly number[]): number[] {
  return p.flatMap((len, r) => new Array<number>(len).fill(r))
}

/** Column of each box, boxes numbered row by row. @example boxColumns([2, 1]) // [0, 1, 0] */
export function boxColumns(p: readonly number[]): number[] {
  return p.flatMap((len) => Array.from({ length: len }, (_, c) => c))
}

/** Throw unless the shape fits SU(n) (ℓ(α) + ℓ(β) ≤ n): a guard for callers building shapes by hand. */
export function checkShape(fn: string, n: number, s: TensorShape): void {
  if (s.upper.length + s.lower.length > n) throw new EngineInputError(fn, `tensor shape [${s.upper}; ${s.lower}] does not fit SU(${n})`)
}
