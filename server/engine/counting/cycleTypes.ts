/**
 * Cycle types of the symmetric group S_n with their class sizes n!/z_λ, the data of the
 * cycle-index expansion of symmetric and exterior powers:
 *   Sym^n V = (1/n!) Σ_λ (n!/z_λ) Π_i ψ^{λ_i}(V),   Λ^n V = (1/n!) Σ_λ (−1)^{n−ℓ(λ)} (n!/z_λ) Π_i ψ^{λ_i}(V)
 * (Macdonald, Symmetric Functions and Hall Polynomials, I.2 and I.7; Pólya's cycle index).
 */
import { EngineInputError } from '../errors'
import { classSize, partitionsOf } from '../group/symmetricGroup'

export interface CycleType {
  parts: readonly number[]
  /** n!/z_λ (safe integer). */
  size: number
  /** Number of cycles ℓ(λ). */
  length: number
  /** (−1)^{n−ℓ(λ)}: the sign used for fermions (exterior powers). */
  sign: number
}

/** Largest n supported (18! < 2^53 keeps class sizes safe integers). */
export const MAX_CYCLE_N = 18

const cache = new Map<number, CycleType[]>()

/**
 * All cycle types of S_n.
 * @example cycleTypes(3).map(t => t.size) // [2, 3, 1] for (3), (2,1), (1,1,1)
 */
export function cycleTypes(n: number): CycleType[] {
  if (!Number.isInteger(n) || n < 0 || n > MAX_CYCLE_N) {
    throw new EngineInputError('cycleTypes', `Operators with more than ${MAX_CYCLE_N} copies of one field are beyond the counting engine (here ${n}); lower the maximum dimension`)
  }
  let out = cache.get(n)
  if (!out) {
    out = partitionsOf(n).map((parts) => ({
      parts,
      size: Number(classSize(parts)),
      length: parts.length,
      sign: (n - parts.length) % 2 === 0 ? 1 : -1,
    }))
    cache.set(n, out)
  }
  return out
}
