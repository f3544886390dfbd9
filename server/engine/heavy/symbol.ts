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
 * A colour-trace atom "(w)" is tr(w·1) times the unit matrix (w acting on a constant, ℓ = 0).
 * With several gauge factors each insertion belongs to one factor: a coupled factor's field
 * enters D (a random traceless matrix for SU(N), the unit matrix for U(1), charges absorbed);
 * an abelian factor's field-strength letters pick up that factor's insertions directly.
 */
import type { PrimeField, SeededRandom } from '../finite'
import { decodeFieldLetter, levi, splitKey, wordAtoms, type Element } from './algebra'

/** One gauge factor as the symbol sees it: SU(N) (the heavy field in the fundamental) or U(1). */
export interface GaugeFactor {
  kind: 'su' | 'u1'
  coupled: boolean
}
/** The gauge factors of a heavy-frame computation and the colour dimension N (1 without SU(N)). */
export interface GaugeSetup {
  colorN: number
  factors: GaugeFactor[]
}

/** One coupled factor: U(1) (colorN = 1) or SU(colorN). */
export function singleFactor(colorN = 1): GaugeSetup {
  return { colorN, factors: [{ kind: colorN > 1 ? 'su' : 'u1', coupled: true }] }
}

export interface KinematicPoint {
  /** ∂-eigenvalue of the heavy field (4 components: t, x, y, z). */
  l: number[]
  /** ∂-eigenvalues of the gauge-field insertions. */
  k: number[][]
  /** Polarisations (connection components) of the insertions. */
  e: number[][]
  /** Colour dimension N and, per insertion, its factor and its matrix in D (null when D does not see it). */
  colorN: number
  factor: number[]
  mats: Array<number[] | null>
}

function randomMatrix(F: PrimeField, rng: SeededRandom, N: number): number[] {
  const m = Array.from({ length: N * N }, () => rng.below(F.p))
  let tr = 0
  for (let i = 0; i < N - 1; i++) tr = F.add(tr, m[i * N + i]!)
  m[N * N - 1] = F.neg(tr)
  return m
}

function unit(N: number): number[] {
  const m = new Array<number>(N * N).fill(0)
  for (let i = 0; i < N; i++) m[i * N + i] = 1
  return m
}

/** Draw a random point with one insertion per entry of `factors` (a factor index each). */
export function randomPoint(F: PrimeField, rng: SeededRandom, factors: readonly number[], setup: GaugeSetup = singleFactor()): KinematicPoint {
  const vec = (): number[] => [0, 1, 2, 3].map(() => rng.nonZero(F.p))
  const N = setup.colorN
  return {
    l: vec(),
    k: factors.map(vec),
    e: factors.map(vec),
    colorN: N,
    factor: [...factors],
    mats: factors.map((g) => {
      const f = setup.factors[g]!
      if (!f.coupled) return null
      return f.kind === 'su' ? randomMatrix(F, rng, N) : unit(N)
    }),
  }
}

function matMulInto(F: PrimeField, out: number[], a: number[], b: number[], f: number, N: number): void {
  for (let i = 0; i < N; i++)
    for (let j = 0; j < N; j++) {
      let s = 0
      for (let k = 0; k < N; k++) s = F.add(s, F.mul(a[i * N + k]!, b[k * N + j]!))
      out[i * N + j] = F.add(out[i * N + j]!, F.mul(s, f))
    }
}

function scaleInto(F: PrimeField, out: number[], v: number[], f: number): void {
  for (let x = 0; x < v.length; x++) out[x] = F.add(out[x]!, F.mul(v[x]!, f))
}

/** Linearised field strength of insertion j: ℰ_i = κ_0ε_i − κ_iε_0, ℬ_i = ε_iab κ_a ε_b. */
function strength(F: PrimeField, pt: KinematicPoint, j: number, which: 'E' | 'B', i: number): number {
  const k = pt.k[j]!
  const e = pt.e[j]!
  if (which === 'E') return F.sub(F.mul(k[0]!, e[i]!), F.mul(k[i]!, e[0]!))
  let s = 0
  for (let a = 1; a <= 3; a++)
    for (let b = 1; b <= 3; b++) {
      const c = levi(i, a, b)
      if (c !== 0) s = c > 0 ? F.add(s, F.mul(k[a]!, e[b]!)) : F.sub(s, F.mul(k[a]!, e[b]!))
    }
  return s
}

type State = Array<number[] | null>

/** A word compiled once: derivatives (μ), abelian field letters, trace atoms. */
type Atom = { t: 0; mu: number } | { t: 1; g: number; which: 'E' | 'B'; i: number } | { t: 2; inner: Atom[] }
const compiled = new Map<string, Atom[]>()

function compile(word: string): Atom[] {
  const hit = compiled.get(word)
  if (hit) return hit
  const atoms = wordAtoms(word).map((a): Atom => {
    if (a.startsWith('(')) return { t: 2, inner: compile(a.slice(1, -1)) }
    const c = a.charCodeAt(0)
    if (c >= 48 && c <= 51) return { t: 0, mu: c - 48 }
    const f = decodeFieldLetter(a)
    return { t: 1, g: f.g, which: f.which, i: f.i }
  })
  if (compiled.size > 200_000) compiled.clear()
  compiled.set(word, atoms)
  return atoms
}

function applyAtom(F: PrimeField, atom: Atom, state: State, pt: KinematicPoint, l: number[]): State {
  const n = pt.k.length
  const N = pt.colorN
  const full = (1 << n) - 1
  const next: State = new Array(full + 1).fill(null)
  const traced = atom.t === 2 ? traceTable(F, atom.inner, pt) : null
  for (let S = 0; S <= full; S++) {
    const v = state[S]
    if (!v) continue
    if (atom.t === 2) {
      for (let T = 0; T <= full; T++) {
        if ((T & S) !== 0 || traced![T] === 0) continue
        scaleInto(F, (next[S | T] ??= new Array<number>(N * N).fill(0)), v, traced![T]!)
      }
    } else if (atom.t === 1) {
      for (let j = 0; j < n; j++) {
        if (S & (1 << j) || pt.factor[j] !== atom.g) continue
        scaleInto(F, (next[S | (1 << j)] ??= new Array<number>(N * N).fill(0)), v, strength(F, pt, j, atom.which, atom.i))
      }
    } else {
      const mu = atom.mu
      let mom = l[mu]!
      for (let j = 0; j < n; j++) if (S & (1 << j)) mom = F.add(mom, pt.k[j]![mu]!)
      if (mom !== 0) scaleInto(F, (next[S] ??= new Array<number>(N * N).fill(0)), v, mom)
      for (let j = 0; j < n; j++) {
        const m = pt.mats[j]
        if (S & (1 << j) || !m) continue
        const out = (next[S | (1 << j)] ??= new Array<number>(N * N).fill(0))
        if (N === 1) out[0] = F.add(out[0]!, F.mul(F.mul(m[0]!, v[0]!), pt.e[j]![mu]!))
        else matMulInto(F, out, m, v, pt.e[j]![mu]!, N)
      }
    }
  }
  return next
}

/** tr of the inner word acting on a constant, per subset of insertions it absorbs. */
function traceTable(F: PrimeField, inner: Atom[], pt: KinematicPoint): number[] {
  const N = pt.colorN
  const states = atomStates(F, inner, pt, [0, 0, 0, 0])
  return states.map((m) => {
    if (!m) return 0
    let t = 0
    for (let i = 0; i < N; i++) t = F.add(t, m[i * N + i]!)
    return t
  })
}

function atomStates(F: PrimeField, atoms: Atom[], pt: KinematicPoint, l: number[]): State {
  const full = (1 << pt.k.length) - 1
  let state: State = new Array(full + 1).fill(null)
  state[0] = unit(pt.colorN)
  for (let r = atoms.length - 1; r >= 0; r--) state = applyAtom(F, atoms[r]!, state, pt, l)
  return state
}

function wordStates(F: PrimeField, word: string, pt: KinematicPoint, l: number[]): State {
  return atomStates(F, compile(word), pt, l)
}

/**
 * Colour matrix (row-major) of the multilinear n-insertion symbol of one word at a point;
 * `l` overrides the heavy-field momentum.
 * @example wordValue(F, '1', {l:[0,5,0,0],k:[],e:[],colorN:1,factor:[],mats:[]}) // [5] (D_x on e^{5x})
 * Method: right-to-left dynamic programme over the set of insertions already placed.
 * Reference: Feynman rules of covariant derivatives (Peskin & Schroeder, §4.8, §16.1).
 */
export function wordValue(F: PrimeField, word: string, pt: KinematicPoint, l = pt.l): number[] {
  const full = (1 << pt.k.length) - 1
  return wordStates(F, word, pt, l)[full] ?? new Array<number>(pt.colorN * pt.colorN).fill(0)
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
        if (w === undefined) {
          w = wordValue(F, word, pt)
          cache.set(word, w)
        }
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
