/**
 * Cartan matrices of the simple Lie algebras in Bourbaki's numbering (the numbering of
 * Slansky's tables and of LiE): A[i][j] = ⟨α_i, α_j^∨⟩ = 2(α_i, α_j)/(α_j, α_j), so row i
 * holds the Dynkin labels of the simple root α_i.
 * B_n: α_n short; C_n: α_n long; G2: α_1 short; F4: α_3, α_4 short; E_n: 1-3-4-…-n chain
 * with α_2 attached to α_4.
 * Reference: Bourbaki, Lie Groups and Lie Algebras, ch. VI, Plates I–IX; Slansky,
 * Phys. Rep. 79 (1981) 1, Table 2.
 */

export type LieType = 'A' | 'B' | 'C' | 'D' | 'E' | 'F' | 'G'

/** Smallest and largest rank per series accepted by the engine. */
export const RANK_LIMITS: Record<LieType, readonly [number, number]> = {
  A: [1, 8],
  B: [2, 9],
  C: [2, 8],
  D: [3, 9],
  E: [6, 8],
  F: [4, 4],
  G: [2, 2],
}

function checkRank(type: LieType, rank: number): void {
  const [lo, hi] = RANK_LIMITS[type] ?? [1, 0]
  if (!Number.isInteger(rank) || rank < lo || rank > hi) {
    // Unreachable from a validated theory file (group sizes are checked first): a programming error.
    throw new RangeError(`cartanMatrix: ${type}_n needs a rank from ${lo} to ${hi}, got ${rank}`)
  }
}

/**
 * Cartan matrix of the simple algebra type_rank (entries ⟨α_i, α_j^∨⟩).
 * @example cartanMatrix('G', 2) // [[2,-1],[-3,2]]
 */
export function cartanMatrix(type: LieType, rank: number): number[][] {
  checkRank(type, rank)
  const a: number[][] = Array.from({ length: rank }, (_, i) => Array.from({ length: rank }, (_, j) => (i === j ? 2 : 0)))
  const link = (i: number, j: number, aij = -1, aji = -1): void => {
    a[i]![j] = aij
    a[j]![i] = aji
  }
  if (type === 'E') {
    link(0, 2)
    link(1, 3)
    for (let i = 2; i < rank - 1; i++) link(i, i + 1)
    return a
  }
  if (type === 'G') {
    link(0, 1, -1, -3)
    return a
  }
  for (let i = 0; i < rank - 1; i++) link(i, i + 1)
  if (type === 'B') link(rank - 2, rank - 1, -2, -1)
  if (type === 'C') link(rank - 2, rank - 1, -1, -2)
  if (type === 'F') link(1, 2, -2, -1)
  if (type === 'D') {
    a[rank - 2]![rank - 1] = 0
    a[rank - 1]![rank - 2] = 0
    link(rank - 3, rank - 1)
  }
  return a
}

/**
 * Half squared lengths d_i = (α_i, α_i)/2 of the simple roots, short roots 1.
 * @example rootHalfLengths('B', 3) // [2, 2, 1]
 */
export function rootHalfLengths(type: LieType, rank: number): number[] {
  checkRank(type, rank)
  const d = new Array<number>(rank).fill(1)
  if (type === 'B') for (let i = 0; i < rank - 1; i++) d[i] = 2
  if (type === 'C') d[rank - 1] = 2
  if (type === 'F') d[0] = d[1] = 2
  if (type === 'G') d[1] = 3
  return d
}
