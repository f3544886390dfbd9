/**
 * Matrix-valued fields as plane-wave expansions with one bookkeeping parameter per external leg
 * ("perturbiner" form): X(x) = Σ_S X_S ε_S e^{i k_S·x}, S a subset of the legs, ε_i² = 0, so only
 * square-free products survive and every leg enters at most once. A product of fields convolves
 * over disjoint subsets: (XY)_S = Σ_{T ⊆ S} X_T Y_{S∖T}; ∂_μ multiplies X_S by i k_{S,μ}.
 * Entries are elements of F_p (p < 2^26, so a·b + c < 2^53 stays exact in a double).
 * Reference: Rosly & Selivanov, Phys. Lett. B 399 (1997) 135 (perturbiner); Berends & Giele,
 * Nucl. Phys. B 306 (1988) 759 (recursion over subsets of legs).
 */
import { EngineInputError } from '../../errors'
import type { PrimeField } from '../../finite/primeField'

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
  constructor(readonly F: PrimeField, readonly n: number, readonly N: number) {
    if (n < 1 || n > 9) throw new EngineInputError('GradedSpace', `between 1 and 9 legs are supported, got ${n}`)
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

  zero(): GMat { return new Float64Array(this.size * this.nn) }
  zeroScalar(): GScalar { return new Float64Array(this.size) }

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
    for (let k = 0; k < X.length; k++) { const s = X[k]! + Y[k]!; out[k] = s >= p ? s - p : s }
    return out
  }

  sub(X: GMat, Y: GMat): GMat {
    const p = this.F.p
    const out = new Float64Array(X.length)
    for (let k = 0; k < X.length; k++) { const s = X[k]! - Y[k]!; out[k] = s < 0 ? s + p : s }
    return out
  }

  scale(c: number, X: GMat): GMat {
    const p = this.F.p
    const out = new Float64Array(X.length)
    if (c === 0) return out
    for (let k = 0; k < X.length; k++) out[k] = (c * X[k]!) % p
    return out
  }

  /** Subsets where X is non-zero (for skipping work in products). */
  support(X: GMat, maxSize = this.n): number[] {
    const out: number[] = []
    for (let s = 0; s <= maxSize; s++) for (const S of this.masksBySize[s]!) if (!this.isZeroAt(X, S)) out.push(S)
    return out
  }

  /** (XY)_S for every S with at most maxSize legs. */
  mul(X: GMat, Y: GMat, maxSize = this.n): GMat {
    const { N, nn } = this
    const p = this.F.p
    const out = new Float64Array(this.size * nn)
    const sy = new Uint8Array(this.size)
    for (const S of this.support(Y, maxSize)) sy[S] = 1
    const acc = new Float64Array(nn)
    for (const T of this.support(X, maxSize)) {
      const free = (this.size - 1) & ~T
      // every U disjoint from T (including 0) with |T ∪ U| ≤ maxSize
      for (let U = free; ; U = (U - 1) & free) {
        if (sy[U] && this.popcount[T | U]! <= maxSize) {
          const oa = T * nn
          const ob = U * nn
          const oc = (T | U) * nn
          acc.fill(0)
          for (let i = 0; i < N; i++) {
            for (let k = 0; k < N; k++) {
              const a = X[oa + i * N + k]!
              if (a === 0) continue
              for (let j = 0; j < N; j++) acc[i * N + j] = (acc[i * N + j]! + a * Y[ob + k * N + j]!) % p
            }
          }
          for (let q = 0; q < nn; q++) { const s = out[oc + q]! + acc[q]!; out[oc + q] = s >= p ? s - p : s }
        }
        if (U === 0) break
      }
    }
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
        if (x !== 0) { const y = b[S & ~T]!; if (y !== 0) s = (s + x * y) % p }
        if (T === 0) break
      }
      out[S] = s
    }
    return out
  }
}
