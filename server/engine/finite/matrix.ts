/**
 * Dense exact linear algebra over F_p: row echelon form, rank, pivot (greedy) columns,
 * and solving linear systems. Matrices are arrays of rows of numbers in [0, p).
 */
import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../errors'
import type { PrimeField } from './primeField'

export type ModMatrix = number[][]

export interface CancelFlag {
  aborted: boolean
}

export interface Echelon {
  /** Reduced rows (only the first `rank` rows are non-zero), a copy of the input. */
  rows: ModMatrix
  /** Column index of each pivot, ascending; these are the greedy independent columns. */
  pivots: number[]
  rank: number
}

/**
 * Reduced row echelon form by Gauss–Jordan elimination mod p.
 * Pivot columns are chosen left to right, so they form the lexicographically first
 * maximal set of independent columns (the greedy basis in column order).
 * @example rref(F7, [[1,2],[2,4]]).rank // 1
 * Method: Gauss–Jordan elimination. Reference: Golub & Van Loan, Matrix Computations, §3.2.
 */
export function rref(F: PrimeField, m: ModMatrix, signal?: CancelFlag): Echelon {
  const rows = m.map((r) => r.slice())
  const nRows = rows.length
  const nCols = nRows === 0 ? 0 : rows[0]!.length
  for (const r of rows) {
    if (r.length !== nCols) throw new EngineConsistencyError('rref', `ragged matrix: row of length ${r.length}, expected ${nCols}`)
  }
  const pivots: number[] = []
  let rank = 0
  for (let c = 0; c < nCols && rank < nRows; c++) {
    if (signal?.aborted) throw new EngineCancelledError('rref')
    let piv = -1
    for (let r = rank; r < nRows; r++)
      if (rows[r]![c] !== 0) {
        piv = r
        break
      }
    if (piv < 0) continue
    ;[rows[rank], rows[piv]] = [rows[piv]!, rows[rank]!]
    const pr = rows[rank]!
    const inv = F.inv(pr[c]!)
    for (let j = c; j < nCols; j++) pr[j] = F.mul(pr[j]!, inv)
    for (let r = 0; r < nRows; r++) {
      if (r === rank) continue
      const row = rows[r]!
      const f = row[c]!
      if (f === 0) continue
      const p = F.p
      for (let j = c; j < nCols; j++) {
        const v = pr[j]!
        if (v !== 0) row[j] = (row[j]! + (p - f) * v) % p
      }
    }
    pivots.push(c)
    rank++
  }
  return { rows, pivots, rank }
}

/** Rank of a matrix mod p. @example rank(F7, [[1,0],[0,1]]) // 2. Method/reference: see rref. */
export function rank(F: PrimeField, m: ModMatrix, signal?: CancelFlag): number {
  return rref(F, m, signal).rank
}

/**
 * Solve A x = b mod p for x (A given as rows). Returns one solution (free variables 0),
 * or null-free: throws EngineInputError when the system is inconsistent.
 * @example solve(F7, [[2,0],[0,3]], [4,6]) // [2, 2]
 * Method: Gauss–Jordan on the augmented matrix. Reference: Golub & Van Loan §3.2.
 */
export function solve(F: PrimeField, a: ModMatrix, b: number[], signal?: CancelFlag): number[] {
  if (a.length !== b.length) throw new EngineConsistencyError('solve', `row count ${a.length} differs from right side length ${b.length}`)
  const nCols = a.length === 0 ? 0 : a[0]!.length
  const aug = a.map((r, i) => [...r, b[i]!])
  const e = rref(F, aug, signal)
  if (e.pivots.includes(nCols)) throw new EngineInputError('solve', 'inconsistent system: right side is not in the column span')
  const x = new Array<number>(nCols).fill(0)
  e.pivots.forEach((c, i) => {
    x[c] = e.rows[i]![nCols]!
  })
  return x
}
