/**
 * An exact growing span over Q: rows are added one at a time; each either enlarges the span
 * or is reported with its exact expression in the rows added before (Gaussian elimination
 * over the rationals, keeping for each echelon row its combination of the added rows).
 * Reference: common practice (row reduction).
 */
import { add, div, isZero, mul, neg, ZERO, ONE, type Rational } from '../exact/rational'

interface EchelonRow {
  values: Rational[]
  pivot: number
  combo: Map<number, Rational>
}

export class RationalSpan {
  private rows: EchelonRow[] = []
  private added = 0
  constructor(readonly width: number) {}

  get rank(): number {
    return this.rows.length
  }

  /** Reduce v by the span; the remainder and how much of each added row was taken away. */
  private reduce(v: Rational[]): { rest: Rational[]; combo: Map<number, Rational> } {
    const rest = v.slice()
    const combo = new Map<number, Rational>()
    for (const r of this.rows) {
      const c = rest[r.pivot]!
      if (isZero(c)) continue
      const f = div(c, r.values[r.pivot]!)
      for (let j = 0; j < this.width; j++) if (!isZero(r.values[j]!)) rest[j] = add(rest[j]!, neg(mul(f, r.values[j]!)))
      for (const [k, x] of r.combo) combo.set(k, add(combo.get(k) ?? ZERO, mul(f, x)))
    }
    return { rest, combo }
  }

  /**
   * Add a row. Returns null when it enlarges the span, else its expression Σ c_k row_k in
   * the rows added before (k = order of adding, 0-based; rows that enlarged nothing count too).
   * @example s.add([1,0]); s.add([2,0]) // Map {0 → 2}
   */
  add(v: Rational[]): Map<number, Rational> | null {
    const id = this.added++
    const { rest, combo } = this.reduce(v)
    const pivot = rest.findIndex((x) => !isZero(x))
    if (pivot < 0) {
      for (const [k, x] of [...combo]) if (isZero(x)) combo.delete(k)
      return combo
    }
    const own = new Map<number, Rational>([...[...combo].map(([k, x]) => [k, neg(x)] as [number, Rational]), [id, ONE]])
    this.rows.push({ values: rest, pivot, combo: own })
    return null
  }

  /** Whether v lies in the span (without adding it). */
  contains(v: Rational[]): boolean {
    return this.reduce(v).rest.every(isZero)
  }
}
