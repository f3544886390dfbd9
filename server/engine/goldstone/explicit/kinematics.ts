/**
 * Random external data for amplitudes of the chiral Lagrangian over F_p, with total momentum zero:
 * massless Goldstone legs ('pion', on shell) and off-shell source legs of one kind each:
 *   's'  scalar density:        χ = χ† = S
 *   'p'  pseudoscalar density:  χ = iP, χ† = −iP
 *   'v'  vector current:        l_μ = r_μ = V e_μ
 *   'a'  axial current:         r_μ = −l_μ = A e_μ
 * Values are multilinear in the legs, so these pure kinds lose nothing; they make every linear
 * letter a single flavor matrix, and by intrinsic parity (u, χ_−, f_− take pion, p and a legs;
 * χ_+ takes s legs, f_+ takes v legs) a configuration sees one class of the Hilbert series only.
 * Minkowski metric η = diag(1, −1, −1, −1); vectors are stored with lower indices. Fields are
 * complexified (a Hermitian configuration is a special case of these polynomial identities).
 */
import { EngineConsistencyError } from '../../errors'
import type { PrimeField } from '../../finite/primeField'
import type { SeededRandom } from '../../finite/rng'

export type LegKind = 'pion' | 's' | 'p' | 'v' | 'a'

/** Legs that carry momentum off shell (every kind but the Goldstone one). */
export const isSourceLeg = (k: LegKind): boolean => k !== 'pion'

export type Vec4 = [number, number, number, number]

export interface Leg {
  kind: LegKind
  /** Momentum k_μ (lower index). */
  k: Vec4
  /** Goldstone leg: traceless flavor matrix (row-major). */
  T?: number[]
  /** Scalar leg: χ and χ† matrices. */
  chi?: number[]
  chiBar?: number[]
  /** Vector leg: l_μ = tl·el_μ and r_μ = tr·er_μ (traceless matrices, lower-index polarizations). */
  tl?: number[]
  tr?: number[]
  el?: Vec4
  er?: Vec4
}

export interface Config {
  legs: Leg[]
  N: number
}

/** η^{μμ}: +1 for μ = 0, −1 otherwise. */
export const METRIC: readonly number[] = [1, -1, -1, -1]

export function dot(F: PrimeField, a: readonly number[], b: readonly number[]): number {
  let s = 0
  for (let m = 0; m < 4; m++) s = (s + (METRIC[m] === 1 ? a[m]! * b[m]! : F.neg((a[m]! * b[m]!) % F.p))) % F.p
  return s
}

function randomMatrix(F: PrimeField, rng: SeededRandom, N: number, traceless: boolean): number[] {
  const m = Array.from({ length: N * N }, () => rng.below(F.p))
  if (traceless) {
    let t = 0
    for (let i = 0; i < N - 1; i++) t = (t + m[i * N + i]!) % F.p
    m[N * N - 1] = F.neg(t)
  }
  return m
}

function randomVector(F: PrimeField, rng: SeededRandom): Vec4 {
  return [rng.below(F.p), rng.below(F.p), rng.below(F.p), rng.below(F.p)]
}

/** λ(1 + a² + b², 2a, 2b, 1 − a² − b²): light-like for η. */
function nullVector(F: PrimeField, rng: SeededRandom): Vec4 {
  const a = rng.below(F.p)
  const b = rng.below(F.p)
  const l = rng.nonZero(F.p)
  const s = F.add(F.mul(a, a), F.mul(b, b))
  return [F.mul(l, F.add(1, s)), F.mul(l, F.mul(2, a)), F.mul(l, F.mul(2, b)), F.mul(l, F.sub(1, s))]
}

function sumVectors(F: PrimeField, vs: readonly Vec4[]): Vec4 {
  const out: Vec4 = [0, 0, 0, 0]
  for (const v of vs) for (let m = 0; m < 4; m++) out[m] = F.add(out[m]!, v[m]!)
  return out
}

const negate = (F: PrimeField, v: Vec4): Vec4 => [F.neg(v[0]), F.neg(v[1]), F.neg(v[2]), F.neg(v[3])]

/** Momenta with Σ k = 0, light-like for Goldstone legs (two of them absorb the balance if all are). */
function momenta(F: PrimeField, rng: SeededRandom, kinds: readonly LegKind[]): Vec4[] {
  const n = kinds.length
  const ks: Vec4[] = kinds.map((kind) => (kind === 'pion' ? nullVector(F, rng) : randomVector(F, rng)))
  let last = -1
  kinds.forEach((k, i) => {
    if (isSourceLeg(k)) last = i
  })
  if (last >= 0) {
    ks[last] = negate(
      F,
      sumVectors(
        F,
        ks.filter((_, i) => i !== last),
      ),
    )
    return ks
  }
  if (n === 2) {
    ks[1] = negate(F, ks[0]!)
    return ks
  }
  // all light-like: K = −Σ_{i<n−2} k_i split into two light-like vectors
  const K = negate(F, sumVectors(F, ks.slice(0, n - 2)))
  const m = nullVector(F, rng)
  const c = F.div(dot(F, K, K), F.mul(2, dot(F, K, m)))
  ks[n - 2] = [F.mul(c, m[0]), F.mul(c, m[1]), F.mul(c, m[2]), F.mul(c, m[3])]
  ks[n - 1] = [F.sub(K[0], ks[n - 2]![0]), F.sub(K[1], ks[n - 2]![1]), F.sub(K[2], ks[n - 2]![2]), F.sub(K[3], ks[n - 2]![3])]
  return ks
}

/**
 * Every proper subset with two or more legs, and every source leg, needs k_S² ≠ 0 (a propagator),
 * except the complements of single Goldstone legs (on shell; see perturbiner.ts).
 */
function propagatorsDefined(F: PrimeField, legs: readonly Leg[]): boolean {
  const n = legs.length
  const full = (1 << n) - 1
  const isPion = (T: number) => (T & (T - 1)) === 0 && legs[Math.log2(T)]!.kind === 'pion'
  for (let S = 1; S < full; S++) {
    if (isPion(S) || isPion(full & ~S)) continue
    const k = sumVectors(
      F,
      legs.filter((_, i) => S & (1 << i)).map((l) => l.k),
    )
    if (dot(F, k, k) === 0) return false
  }
  return true
}

/**
 * A random configuration with the given leg kinds.
 * @example randomConfig(F, rng, 3, ['pion', 'pion', 'p']).legs[0].kind // 'pion'
 */
export function randomConfig(F: PrimeField, rng: SeededRandom, N: number, kinds: readonly LegKind[]): Config {
  const i = F.sqrtMinusOne()
  for (let attempt = 0; attempt < 20; attempt++) {
    const ks = momenta(F, rng, kinds)
    const legs: Leg[] = kinds.map((kind, j) => {
      const k = ks[j]!
      if (kind === 'pion') return { kind, k, T: randomMatrix(F, rng, N, true) }
      if (kind === 's') {
        const S = randomMatrix(F, rng, N, false)
        return { kind, k, chi: S, chiBar: S }
      }
      if (kind === 'p') {
        const P = randomMatrix(F, rng, N, false)
        return { kind, k, chi: P.map((x) => F.mul(i, x)), chiBar: P.map((x) => F.mul(F.neg(i), x)) }
      }
      const M = randomMatrix(F, rng, N, true)
      const e = randomVector(F, rng)
      return { kind, k, tl: kind === 'v' ? M : M.map((x) => F.neg(x)), tr: M, el: e, er: e }
    })
    if (propagatorsDefined(F, legs)) return { legs, N }
  }
  throw new EngineConsistencyError('randomConfig', `no configuration with finite propagators found for legs ${kinds.join(', ')}`)
}
