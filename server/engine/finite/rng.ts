/**
 * Small seeded pseudo-random generator (SplitMix32 variant) so that runs are reproducible.
 * Not cryptographic; used to draw random kinematic points and wave-functions.
 * @example new SeededRandom(1).below(10) // a fixed value in 0..9
 */
export class SeededRandom {
  private state: number
  constructor(seed: number) {
    this.state = seed >>> 0
  }
  /** Next unsigned 32-bit integer. */
  next32(): number {
    this.state = (this.state + 0x9e3779b9) >>> 0
    let z = this.state
    z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0
    z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0
    return (z ^ (z >>> 16)) >>> 0
  }
  /** Uniform integer in [0, n) for n ≤ 2^26 (negligible bias). */
  below(n: number): number {
    const x = this.next32() * 2 ** 21 + (this.next32() >>> 11)
    return x % n
  }
  /** Uniform non-zero element of F_p. */
  nonZero(p: number): number {
    return 1 + this.below(p - 1)
  }
}
