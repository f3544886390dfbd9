/**
 * Exact integer accumulator: adds products of safe integers in a float-free way, staying in
 * machine numbers while the running sum is a safe integer and spilling into bigint otherwise.
 * Used in the inner loop of the cycle-index sums, where bigint everywhere would be slow.
 */
import { EngineConsistencyError } from '../errors'

export class ExactSum {
  private small = 0
  private big = 0n

  /**
   * Add a·b·c·d (safe integers; c and d default to 1). The fast path is exact: when the double
   * product is a safe integer, every partial product is too (all factors are integers).
   * @example const s = new ExactSum(); s.addProduct(2 ** 40, 2 ** 20); s.value() // 1152921504606846976n
   */
  addProduct(a: number, b: number, c = 1, d = 1): void {
    if (!Number.isSafeInteger(a) || !Number.isSafeInteger(b) || !Number.isSafeInteger(c) || !Number.isSafeInteger(d)) {
      throw new EngineConsistencyError('ExactSum.addProduct', `operands must be safe integers, got ${a}, ${b}, ${c}, ${d}`)
    }
    const t = a * b * c * d
    if (Number.isSafeInteger(t)) {
      const s = this.small + t
      if (Number.isSafeInteger(s)) {
        this.small = s
        return
      }
    }
    this.big += BigInt(a) * BigInt(b) * BigInt(c) * BigInt(d)
  }

  /** The exact sum. */
  value(): bigint {
    return this.big + BigInt(this.small)
  }
}
