/**
 * Incremental Gaussian elimination over F_p: rows (evaluations at one configuration, one entry
 * per operator) are added one at a time; the rank grows when a row is independent of the earlier
 * ones. Used to decide when enough random configurations have been drawn.
 */
import type { PrimeField } from '../../finite/primeField'

export class IncrementalEchelon {
  private readonly rows: number[][] = []
  private readonly pivots: number[] = []
  constructor(
    readonly F: PrimeField,
    readonly width: number,
  ) {}

  get rank(): number {
    return this.rows.length
  }

  /** Reduce and keep the row if independent; returns true when the rank grew. */
  add(row: readonly number[]): boolean {
    const F = this.F
    const r = row.slice()
    this.rows.forEach((pr, i) => {
      const c = this.pivots[i]!
      const f = r[c]!
      if (f === 0) return
      for (let j = 0; j < this.width; j++) if (pr[j] !== 0) r[j] = F.sub(r[j]!, F.mul(f, pr[j]!))
    })
    const pivot = r.findIndex((x) => x !== 0)
    if (pivot < 0) return false
    const inv = F.inv(r[pivot]!)
    for (let j = 0; j < this.width; j++) r[j] = F.mul(r[j]!, inv)
    this.rows.forEach((pr) => {
      const f = pr[pivot]!
      if (f === 0) return
      for (let j = 0; j < this.width; j++) if (r[j] !== 0) pr[j] = F.sub(pr[j]!, F.mul(f, r[j]!))
    })
    this.rows.push(r)
    this.pivots.push(pivot)
    return true
  }
}
