/**
 * Shared types of the Lie-group engine.
 *
 * Conventions: SU(n) irreps and weights are written in the Dynkin (fundamental-weight) basis,
 * a list of n-1 integers a_1..a_{n-1} (non-negative for a highest weight). The fundamental
 * is [1,0,...,0], its conjugate [0,...,0,1], the adjoint [1,0,...,0,1].
 * A character is a finite weight multiset: weight key ("a1,a2,...") -> multiplicity.
 */
export type Dynkin = readonly number[]
export type WeightKey = string
export type Character = Map<WeightKey, number>

/** Progress and cancel for the plethysm and its Brauer step. */
export interface PlethysmOptions {
  onProgress?: (fraction: number, label: string) => void
  signal?: { aborted: boolean }
}
