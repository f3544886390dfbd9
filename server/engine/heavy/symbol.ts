/**
 * Faithful numerical image of covariant differential operators: the symbol with n external
 * gauge-field insertions. A word D_{μ1}…D_{μm} (D_μ = ∂_μ + 𝒜_μ) acts on e^{ℓ·x} in the
 * background 𝒜 = Σ_j ε_j M_j e^{κ_j·x} (M_j a colour matrix: 1 for an abelian field, a random
 * traceless N×N matrix for SU(N) in the fundamental); the coefficient of ε_1⋯ε_n
 * (multilinear part) is a polynomial in ℓ, κ_j, ε_j with colour-matrix values, evaluated here
 * at random points of F_p. For operators of dimension ≤ 5 the sectors n = 0, 1, 2 are
 * faithful: in the normal form Σ c_α(F-jets) D^α the coefficients with k field strengths
 * first appear at n = k, and k ≤ 2 below dimension 6 (common practice: gauge-covariant jet
 * normal form; checked numerically in tests/unit/heavy/faithfulness.test.ts).
 * A colour-trace word "t<w>" is tr(w·1) times the unit matrix (w acting on a constant, ℓ = 0).
 */
import type { PrimeField, SeededRandom } from '../finite'
import { splitKey, type Element } from './algebra'

export interface KinematicPoint {
  /** ∂-eigenvalue of the heavy field (4 components: t, x, y, z). */
  l: number[]
  /** ∂-eigenvalues of the gauge-field insertions. */
  k: number[][]
  /** Polarisations (connection components) of the insertions. */
  e: number[][]
  /** Colour dimension N and the insertions' colour matrices (row-major N×N). */
  colorN: number
  mats: number[][]
}

function randomMatrix(F: PrimeField, rng: SeededRandom, N: number): number[] {
  if (N === 1) return [1]
  const m = Array.from({ length: N * N }, () => rng.below(F.p))
  let tr = 0
  for (let i = 0; i < N - 1; i++) tr = F.add(tr, m[i * N + i]!)
  m[N * N - 1] = F.neg(tr)
  return m
}

/** Draw a random point with n insertions and colour dimension N (1 = abelian). */
export function randomPoint(F: PrimeField, rng: SeededRandom, n: number, colorN = 1): KinematicPoint {
  const vec = (): number[] => [0, 1, 2, 3].map(() => rng.nonZero(F.p))
  return {
    l: vec(), k: Array.from({ length: n }, vec), e: Array.from({ length: n }, vec),
    colorN, mats: Array.from({ length: n }, () => randomMatrix(F, rng, colorN)),
  }
}

function matMulInto(F: PrimeField, out: number[], a: number[], b: number[], f: number, N: number): void {
  for (let i = 0; i < N; i++) for (let j = 0; j < N; j++) {
    let s = 0
    for (let k = 0; k < N; k++) s = F.add(s, F.mul(a[i * N + k]!, b[k * N + j]!))
    out[i * N + j] = F.add(out[i * N + j]!, F.mul(s, f))
  }
}

/**
 * Colour matrix (row-major) of the multilinear n-insertion symbol of one word at a point;
 * `l` overrides the heavy-field momentum (ℓ = 0 for colour-trace words).
 * @example wordValue(F, '1', {l:[0,5,0,0],k:[],e:[],colorN:1,mats:[]}) // [5] (D_x on e^{5x})
 * Method: right-to-left dynamic programme over the set of insertions already placed.
 * Reference: Feynman rules of covariant derivatives (Peskin & Schroeder, §4.8, §16.1).
 */
export function wordValue(F: PrimeField, word: string, pt: KinematicPoint, l = pt.l): number[] {
  const n = pt.k.length
  const N = pt.colorN
  const full = (1 << n) - 1
  const zero = (): number[] => new Array<number>(N * N).fill(0)
  let state: Array<number[] | null> = new Array(full + 1).fill(null)
  state[0] = zero()
  for (let i = 0; i < N; i++) state[0]![i * N + i] = 1
  for (let r = word.length - 1; r >= 0; r--) {
    const mu = word.charCodeAt(r) - 48
    const next: Array<number[] | null> = new Array(full + 1).fill(null)
    for (let S = 0; S <= full; S++) {
      const v = state[S]
      if (!v) continue
      let mom = l[mu]!
      for (let j = 0; j < n; j++) if (S & (1 << j)) mom = F.add(mom, pt.k[j]![mu]!)
      const d = (next[S] ??= zero())
      for (let x = 0; x < d.length; x++) d[x] = F.add(d[x]!, F.mul(v[x]!, mom))
      for (let j = 0; j < n; j++) {
        if (S & (1 << j)) continue
        const T = S | (1 << j)
        matMulInto(F, (next[T] ??= zero()), pt.mats[j]!, v, pt.e[j]![mu]!, N)
      }
    }
    state = next
  }
  return state[full] ?? zero()
}

function termValue(F: PrimeField, word: string, pt: KinematicPoint): number[] {
  if (!word.startsWith('t')) return wordValue(F, word, pt)
  const N = pt.colorN
  const m = wordValue(F, word.slice(1), pt, [0, 0, 0, 0])
  let tr = 0
  for (let i = 0; i < N; i++) tr = F.add(tr, m[i * N + i]!)
  const out = new Array<number>(N * N).fill(0)
  for (let i = 0; i < N; i++) out[i * N + i] = tr
  return out
}

/**
 * Rows of evaluations (4 spin components × N² colour entries per point) of each element at
 * the given points: result[row][column]; rows vanishing for every element are dropped only
 * when asked.
 */
export function evaluationRows(F: PrimeField, elements: readonly Element[], points: readonly KinematicPoint[], dropZero = false): number[][] {
  const rows: number[][] = []
  for (const pt of points) {
    const N2 = pt.colorN * pt.colorN
    const cache = new Map<string, number[]>()
    const block = Array.from({ length: 4 * N2 }, () => new Array<number>(elements.length).fill(0))
    elements.forEach((el, col) => {
      for (const [key, c] of el) {
        const { spin, word } = splitKey(key)
        let w = cache.get(word)
        if (w === undefined) { w = termValue(F, word, pt); cache.set(word, w) }
        const fc = F.from(c)
        for (let x = 0; x < N2; x++) {
          if (w[x] === 0) continue
          const row = block[spin * N2 + x]!
          row[col] = F.add(row[col]!, F.mul(fc, w[x]!))
        }
      }
    })
    for (const r of block) if (!dropZero || r.some((x) => x !== 0)) rows.push(r)
  }
  return rows
}
