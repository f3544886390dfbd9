/**
 * Matrix-valued fields as plane-wave expansions with one bookkeeping parameter per external leg
 * ("perturbiner" form): X(x) = Σ_S X_S ε_S e^{i k_S·x}, S a subset of the legs, ε_i² = 0, so only
 * square-free products survive and every leg enters at most once. A product of fields convolves
 * over disjoint subsets: (XY)_S = Σ_{T ⊆ S} X_T Y_{S∖T}; ∂_μ multiplies X_S by i k_{S,μ}.
 * Entries are elements of F_p with p < 2^21 (explicitPrimes): a sum of up to 2^11 products a·b
 * stays below 2^53, exact in a double, so products are reduced once per entry.
 * Reference: Rosly & Selivanov, Phys. Lett. B 399 (1997) 135 (perturbiner); Berends & Giele,
 * Nucl. Phys. B 306 (1988) 759 (recursion over subsets of legs).
 */
import { EngineInputError } from '../../errors'
import { isPrime, type PrimeField } from '../../finite/primeField'

/** Largest modulus of the explicit engine (see the file header). */
export const EXPLICIT_PRIME_LIMIT = 2 ** 21

/**
 * The `count` largest primes ≡ 1 (mod 4) below 2^21 (√−1 exists mod p).
 * @example explicitPrimes(2) // [2097133, 2097101]
 */
export function explicitPrimes(count: number): number[] {
  const out: number[] = []
  for (let n = EXPLICIT_PRIME_LIMIT - 3; out.length < count; n -= 4) if (isPrime(n)) out.push(n)
  return out
}

/** A graded N × N matrix: entry (S, i, j) at S·N² + i·N + j. */
export type GMat = Float64Array
/** A graded scalar: entry S at S. */
export type GScalar = Float64Array

export class GradedSpace {
  readonly size: number
  readonly nn: number
  /** Masks in order of increasing number of legs. */
  readonly masksBySize: number[][]
  readonly popcount: Uint8Array
  constructor(
    readonly F: PrimeField,
    readonly n: number,
    readonly N: number,
  ) {
    if (n < 1 || n > 9) throw new EngineInputError('GradedSpace', `between 1 and 9 legs are supported, got ${n}`)
    if (F.p >= EXPLICIT_PRIME_LIMIT) throw new EngineInputError('GradedSpace', `the explicit engine works mod primes below 2^21, got ${F.p}`)
    if (2 ** n * N * (F.p - 1) ** 2 >= 2 ** 53) throw new EngineInputError('GradedSpace', `${n} legs with ${N} × ${N} matrices would overflow the exact sums mod ${F.p}`)
    this.size = 1 << n
    this.nn = N * N
    this.popcount = new Uint8Array(this.size)
    this.masksBySize = Array.from({ length: n + 1 }, () => [])
    for (let S = 0; S < this.size; S++) {
      let c = 0
      for (let t = S; t; t &= t - 1) c++
      this.popcount[S] = c
      this.masksBySize[c]!.push(S)
    }
  }

  zero(): GMat {
    return new Float64Array(this.size * this.nn)
  }
  zeroScalar(): GScalar {
    return new Float64Array(this.size)
  }

  /** The constant identity matrix (only the empty subset). */
  identity(): GMat {
    const m = this.zero()
    for (let i = 0; i < this.N; i++) m[i * this.N + i] = 1
    return m
  }

  /** A field with one component: matrix `block` (row-major, entries in F_p) at subset S. */
  single(S: number, block: readonly number[]): GMat {
    const m = this.zero()
    m.set(block, S * this.nn)
    return m
  }

  isZeroAt(X: GMat, S: number): boolean {
    const o = S * this.nn
    for (let k = 0; k < this.nn; k++) if (X[o + k] !== 0) return false
    return true
  }

  add(X: GMat, Y: GMat): GMat {
    const p = this.F.p
    const out = new Float64Array(X.length)
    for (let k = 0; k < X.length; k++) {
      const s = X[k]! + Y[k]!
      out[k] = s >= p ? s - p : s
    }
    return out
  }

  sub(X: GMat, Y: GMat): GMat {
    const p = this.F.p
    const out = new Float64Array(X.length)
    for (let k = 0; k < X.length; k++) {
      const s = X[k]! - Y[k]!
      out[k] = s < 0 ? s + p : s
    }
    return out
  }

  scale(c: number, X: GMat): GMat {
    const p = this.F.p
    const out = new Float64Array(X.length)
    if (c === 0) return out
    for (let k = 0; k < X.length; k++) out[k] = (c * X[k]!) % p
    return out
  }

  private readonly supports = new WeakMap<GMat, number[]>()

  /** Subsets where X is non-zero (for skipping work in products), cached per array (fields are not mutated after use). */
  support(X: GMat, maxSize = this.n): number[] {
    let all = this.supports.get(X)
    if (!all) {
      all = []
      for (let s = 0; s <= this.n; s++) for (const S of this.masksBySize[s]!) if (!this.isZeroAt(X, S)) all.push(S)
      this.supports.set(X, all)
    }
    return maxSize >= this.n ? all : all.filter((S) => this.popcount[S]! <= maxSize)
  }

  /** X += c·Y in place (c = ±1), for accumulators that are not used as factors before they are complete. */
  accumulate(X: GMat, Y: GMat, sign: 1 | -1): void {
    const p = this.F.p
    for (let k = 0; k < X.length; k++) {
      const y = Y[k]!
      if (y === 0) continue
      const s = sign === 1 ? X[k]! + y : X[k]! - y
      X[k] = s >= p ? s - p : s < 0 ? s + p : s
    }
  }

  /** (XY)_S for every S with at most maxSize legs. */
  mul(X: GMat, Y: GMat, maxSize = this.n): GMat {
    const { N, nn } = this
    const p = this.F.p
    const out = new Float64Array(this.size * nn)
    const sy = new Uint8Array(this.size)
    for (const S of this.support(Y, maxSize)) sy[S] = 1
    for (const T of this.support(X, maxSize)) {
      const free = (this.size - 1) & ~T
      const oa = T * nn
      for (let U = free; ; U = (U - 1) & free) {
        if (sy[U] && this.popcount[T | U]! <= maxSize) {
          const ob = U * nn
          const oc = (T | U) * nn
          for (let i = 0; i < N; i++) {
            for (let k = 0; k < N; k++) {
              const a = X[oa + i * N + k]!
              if (a === 0) continue
              for (let j = 0; j < N; j++) out[oc + i * N + j]! += a * Y[ob + k * N + j]!
            }
          }
        }
        if (U === 0) break
      }
    }
    for (let q = 0; q < out.length; q++) if (out[q] !== 0) out[q] = out[q]! % p
    return out
  }

  commutator(X: GMat, Y: GMat, maxSize = this.n): GMat {
    return this.sub(this.mul(X, Y, maxSize), this.mul(Y, X, maxSize))
  }

  /** Trace per subset. */
  trace(X: GMat): GScalar {
    const p = this.F.p
    const out = new Float64Array(this.size)
    for (let S = 0; S < this.size; S++) {
      let s = 0
      for (let i = 0; i < this.N; i++) s += X[S * this.nn + i * this.N + i]!
      out[S] = s % p
    }
    return out
  }

  /** Scalar times identity, per subset. */
  scalarTimesIdentity(c: GScalar): GMat {
    const out = this.zero()
    for (let S = 0; S < this.size; S++) {
      if (c[S] === 0) continue
      for (let i = 0; i < this.N; i++) out[S * this.nn + i * this.N + i] = c[S]!
    }
    return out
  }

  /** Multiply component S by w[S] (e.g. i k_{S,μ} for a derivative). */
  weight(X: GMat, w: Float64Array): GMat {
    const p = this.F.p
    const out = new Float64Array(X.length)
    for (let S = 0; S < this.size; S++) {
      const c = w[S]!
      if (c === 0) continue
      const o = S * this.nn
      for (let q = 0; q < this.nn; q++) out[o + q] = (c * X[o + q]!) % p
    }
    return out
  }

  /** (tr XY) for the full set of legs only: Σ_T tr(X_T Y_{full∖T}). */
  traceProductAtFull(X: GMat, Y: GMat): number {
    const { N, nn } = this
    const p = this.F.p
    const full = this.size - 1
    let s = 0
    for (let T = 0; T <= full; T++) {
      const oa = T * nn
      const ob = (full & ~T) * nn
      let t = 0
      for (let i = 0; i < N; i++) for (let k = 0; k < N; k++) t = (t + X[oa + i * N + k]! * Y[ob + k * N + i]!) % p
      s = (s + t) % p
    }
    return s
  }

  /** Product of graded scalars: (ab)_S = Σ_{T ⊆ S} a_T b_{S∖T}. */
  mulScalar(a: GScalar, b: GScalar): GScalar {
    const p = this.F.p
    const out = new Float64Array(this.size)
    for (let S = 0; S < this.size; S++) {
      let s = 0
      for (let T = S; ; T = (T - 1) & S) {
        const x = a[T]!
        if (x !== 0) {
          const y = b[S & ~T]!
          if (y !== 0) s = (s + x * y) % p
        }
        if (T === 0) break
      }
      out[S] = s
    }
    return out
  }
}
