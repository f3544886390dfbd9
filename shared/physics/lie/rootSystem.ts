/**
 * Root system of a simple Lie algebra from its Cartan matrix: positive roots, the Weyl
 * vector, the invariant inner product on weights, and Weyl reflections — all exact (integers).
 * Weights are written in the Dynkin (fundamental-weight) basis; a simple reflection is
 * s_i(λ) = λ − λ_i α_i, with α_i = row i of the Cartan matrix.
 * Reference: Humphreys, Introduction to Lie Algebras and Representation Theory (Springer
 * 1972), §10 and §13; Slansky, Phys. Rep. 79 (1981) 1, §3.
 */
import { cartanMatrix, rootHalfLengths, type LieType } from './cartan'

export interface PositiveRoot {
  /** Coefficients in the basis of simple roots. */
  coeffs: number[]
  /** Dynkin labels ⟨α, α_j^∨⟩. */
  labels: number[]
  /** Half squared length (α, α)/2 in units where short roots have 1. */
  half: number
}

const cache = new Map<string, RootSystem>()

export class RootSystem {
  readonly cartan: number[][]
  readonly half: number[]
  readonly positive: PositiveRoot[]
  /** Integer Gram matrix of the fundamental weights, scaled by `scale`: (ω_i, ω_j) = gram[i][j] / scale. */
  readonly gram: number[][]
  readonly scale: number

  private constructor(
    readonly type: LieType,
    readonly rank: number,
  ) {
    this.cartan = cartanMatrix(type, rank)
    this.half = rootHalfLengths(type, rank)
    const { inverse, det } = integerInverse(this.cartan)
    this.scale = det
    // A G = D with A the Cartan matrix and D = diag(d_i): G = A^{-1} D.
    this.gram = inverse.map((row) => row.map((x, j) => x * this.half[j]!))
    this.positive = this.positiveRoots()
  }

  /**
   * The root system of type_rank (cached).
   * @example RootSystem.of('G', 2).positive.length // 6
   */
  static of(type: LieType, rank: number): RootSystem {
    const key = `${type}${rank}`
    let r = cache.get(key)
    if (!r) cache.set(key, (r = new RootSystem(type, rank)))
    return r
  }

  /** Scaled inner product (λ, μ)·scale of two weights in Dynkin labels (exact integer). */
  inner(a: ArrayLike<number>, b: ArrayLike<number>): number {
    let s = 0
    for (let i = 0; i < this.rank; i++) {
      if (a[i] === 0) continue
      const row = this.gram[i]!
      for (let j = 0; j < this.rank; j++) s += a[i]! * row[j]! * b[j]!
    }
    return s
  }

  /** Positive roots by increasing height: simple-root strings (Humphreys §10.2, Prop. A). */
  private positiveRoots(): PositiveRoot[] {
    const n = this.rank
    const key = (c: number[]): string => c.join(',')
    const known = new Map<string, number[]>()
    let level: number[][] = []
    for (let i = 0; i < n; i++) {
      const c = new Array<number>(n).fill(0)
      c[i] = 1
      level.push(c)
      known.set(key(c), c)
    }
    const all = [...level]
    while (level.length > 0) {
      const next: number[][] = []
      for (const beta of level) {
        const labels = this.labelsOf(beta)
        for (let j = 0; j < n; j++) {
          // p = how far β − kα_j stays a root; β + α_j is a root iff p − ⟨β, α_j^∨⟩ > 0.
          let p = 0
          const down = beta.slice()
          for (;;) {
            down[j]! -= 1
            if (!known.has(key(down))) break
            p++
          }
          if (p - labels[j]! <= 0) continue
          const up = beta.slice()
          up[j]! += 1
          if (known.has(key(up))) continue
          known.set(key(up), up)
          next.push(up)
        }
      }
      all.push(...next)
      level = next
    }
    return all.map((coeffs) => {
      const labels = this.labelsOf(coeffs)
      // (α, α)/2 = Σ_i c_i (α_i, α)/2 and (α_i, α) = d_i ⟨α, α_i^∨⟩.
      const twice = coeffs.reduce((s, c, i) => s + c * this.half[i]! * labels[i]!, 0)
      return { coeffs, labels, half: twice / 2 }
    })
  }

  /** Dynkin labels of Σ_i c_i α_i. */
  labelsOf(coeffs: readonly number[]): number[] {
    const out = new Array<number>(this.rank).fill(0)
    coeffs.forEach((c, i) => {
      if (c === 0) return
      const row = this.cartan[i]!
      for (let j = 0; j < this.rank; j++) out[j]! += c * row[j]!
    })
    return out
  }

  /**
   * Reflect λ + ρ (λ plus an optional shift, Dynkin labels) into the dominant chamber:
   * null on a wall, else the sign ε(w) and the labels of w(λ + ρ) − ρ.
   * @example RootSystem.of('B', 2).reflectToDominant([-2, 0], null) // { sign: -1, labels: [0, 0] }
   */
  reflectToDominant(mu: ArrayLike<number>, shift: ArrayLike<number> | null): { sign: number; labels: number[] } | null {
    const n = this.rank
    const v = new Array<number>(n)
    for (let i = 0; i < n; i++) v[i] = mu[i]! + (shift ? shift[i]! : 0) + 1
    let sign = 1
    for (;;) {
      let i = 0
      while (i < n && v[i]! > 0) i++
      if (i === n) break
      for (let j = 0; j < n; j++) if (v[j] === 0) return null
      const c = v[i]!
      const row = this.cartan[i]!
      for (let j = 0; j < n; j++) v[j]! -= c * row[j]!
      sign = -sign
    }
    for (let i = 0; i < n; i++) v[i]! -= 1
    return { sign, labels: v }
  }

  /** The dominant weight in the Weyl orbit of μ. */
  dominantOf(mu: readonly number[]): number[] {
    const v = mu.slice()
    for (;;) {
      const i = v.findIndex((x) => x < 0)
      if (i < 0) return v
      const c = v[i]!
      this.cartan[i]!.forEach((a, j) => {
        v[j]! -= c * a
      })
    }
  }

  /** The antidominant weight w0(λ) of the orbit of a dominant λ. */
  antidominantOf(lambda: readonly number[]): number[] {
    const v = lambda.slice()
    for (;;) {
      const i = v.findIndex((x) => x > 0)
      if (i < 0) return v
      const c = v[i]!
      this.cartan[i]!.forEach((a, j) => {
        v[j]! -= c * a
      })
    }
  }

  /**
   * The Weyl orbit of a dominant weight (each element once).
   * @example RootSystem.of('G', 2).weylOrbit([1, 0]).length // 6
   * Method: from the dominant weight apply s_i wherever label i is positive (Humphreys §13.2).
   */
  weylOrbit(dominant: readonly number[]): number[][] {
    const seen = new Set<string>([dominant.join(',')])
    const out = [dominant.slice()]
    for (let k = 0; k < out.length; k++) {
      const v = out[k]!
      for (let i = 0; i < this.rank; i++) {
        const c = v[i]!
        if (c <= 0) continue
        const w = v.slice()
        this.cartan[i]!.forEach((a, j) => {
          w[j]! -= c * a
        })
        const key = w.join(',')
        if (seen.has(key)) continue
        seen.add(key)
        out.push(w)
      }
    }
    return out
  }
}

/** A^{-1} = inverse / det with integer entries (exact Gauss–Jordan over Q; n <= 9). */
function integerInverse(a: number[][]): { inverse: number[][]; det: number } {
  const n = a.length
  type Q = [bigint, bigint]
  const g = (x: bigint, y: bigint): bigint => (y === 0n ? (x < 0n ? -x : x) : g(y, x % y))
  const norm = ([p, q]: Q): Q => {
    const d = g(p, q) || 1n
    const s = q < 0n ? -1n : 1n
    return [(s * p) / d, (s * q) / d]
  }
  const sub = (x: Q, y: Q): Q => norm([x[0] * y[1] - y[0] * x[1], x[1] * y[1]])
  const mul = (x: Q, y: Q): Q => norm([x[0] * y[0], x[1] * y[1]])
  const div = (x: Q, y: Q): Q => norm([x[0] * y[1], x[1] * y[0]])
  const m: Q[][] = a.map((row, i) => [...row.map((x): Q => [BigInt(x), 1n]), ...Array.from({ length: n }, (_, j): Q => [i === j ? 1n : 0n, 1n])])
  let det: Q = [1n, 1n]
  for (let c = 0; c < n; c++) {
    let p = c
    while (m[p]![c]![0] === 0n) p++
    if (p !== c) {
      ;[m[p], m[c]] = [m[c]!, m[p]!]
      det = [-det[0], det[1]]
    }
    const piv = m[c]![c]!
    det = mul(det, piv)
    for (let k = 0; k < 2 * n; k++) m[c]![k] = div(m[c]![k]!, piv)
    for (let r = 0; r < n; r++) {
      if (r === c || m[r]![c]![0] === 0n) continue
      const f = m[r]![c]!
      for (let k = 0; k < 2 * n; k++) m[r]![k] = sub(m[r]![k]!, mul(f, m[c]![k]!))
    }
  }
  const D = det[0] / det[1]
  const inverse = m.map((row) => row.slice(n).map(([p, q]) => Number((p * D) / q)))
  return { inverse, det: Number(D) }
}
