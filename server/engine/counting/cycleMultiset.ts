/**
 * Bookkeeping for the cycle-index sums: the multiset of (code, cycle length) pairs of one cycle
 * type (code = a Lorentz type, or a representation of one SU(n) group), updated incrementally
 * while the cycle types of the species are enumerated, with a canonical text key for caches.
 */

/** Largest cycle length (a species appears at most this many times in one operator). */
export const MAX_CYCLE = 32

/**
 * Incremental multiset of (code, cycle) pairs with a canonical text key. The non-zero slots
 * are kept in a small sorted list, so building the key costs O(number of distinct pairs).
 * @example const m = new CycleMultiset(5); m.add(0, 2, 1); m.add(0, 1, 1); m.key() // "1:1,2:1,"
 */
export class CycleMultiset {
  private readonly counts: Int32Array
  private readonly slots: number[] = []
  constructor(readonly codes: number) {
    this.counts = new Int32Array(codes * (MAX_CYCLE + 1))
  }
  add(code: number, cycle: number, delta: number): void {
    const i = code * (MAX_CYCLE + 1) + cycle
    const before = this.counts[i]!
    const after = before + delta
    this.counts[i] = after
    if (before === 0 && after !== 0) {
      let j = this.slots.length
      this.slots.push(i)
      while (j > 0 && this.slots[j - 1]! > i) {
        this.slots[j] = this.slots[j - 1]!
        j--
      }
      this.slots[j] = i
    } else if (before !== 0 && after === 0) {
      this.slots.splice(this.slots.indexOf(i), 1)
    }
  }
  key(): string {
    let k = ''
    for (const i of this.slots) k += `${i}:${this.counts[i]},`
    return k
  }
  /** The multiset as a list of [code, cycle] (each repeated by its multiplicity). */
  list(): [number, number][] {
    const out: [number, number][] = []
    for (const i of this.slots) {
      for (let m = 0; m < this.counts[i]!; m++) out.push([Math.floor(i / (MAX_CYCLE + 1)), i % (MAX_CYCLE + 1)])
    }
    return out
  }
  isEmpty(): boolean {
    return this.slots.length === 0
  }
}
