/**
 * Flavor integrals of the Goldstone-frame Hilbert series, exactly, through Schur–Weyl duality
 * instead of a torus integral. Every building block of SU(N)_L × SU(N)_R / SU(N)_V is an N × N
 * matrix on which h ∈ SU(N) acts by conjugation (adjoint, plus a singlet for χ_±), and the
 * invariants of SU(N) and U(N) agree there. With p_k(h) = tr h^k and a partition ν of m:
 *
 *   ∫_{U(N)} Π_i |p_{ν_i}(h)|²              = Σ_{λ ⊢ m, ℓ(λ) ≤ N} χ_λ(ν)²        (adjointSinglets)
 *   ∫_{U(N)} Π_i tr_{gl_N}((C∘h)^{ν_i})      = Σ_{λ ⊢ m, ℓ(λ) ≤ N} χ_λ(ν²)        (twistedAdjointSinglets)
 *   ∫_{U(N)} p_ν(A Ā) dA                     = Σ_{λ ⊢ m, ℓ(λ) ≤ N} χ_λ(ν)         (conjugationSinglets)
 *   ∫_{SU(N)} p_α(h) \overline{p_β(h)} dh    = Σ_{λ̃ = μ̃} χ_λ(α) χ_μ(β)            (specialPairing)
 *
 * C acts on gl_N as X ↦ X^T; ν² is the cycle type of the square of a permutation of type ν
 * (an odd cycle c stays c, an even cycle c splits into two c/2). The first line is the
 * centralizer algebra ⊕_{ℓ(λ)≤N} End(S^λ) of U(N) on V^{⊗m} with permutations acting by
 * conjugation (trace χ_λ(π)²); transposition sends a permutation to its inverse, i.e. the matrix
 * transpose on each End(S^λ), whose composite with conjugation by π has trace χ_λ(π²). The
 * Cayley–Hamilton (trace) relations of N × N matrices are exactly the components with ℓ(λ) > N.
 * In the last line λ̃ removes the full columns of height N (det h = 1 on SU(N)), which admits the
 * determinant invariants such as det χ of the source-only (contact) terms.
 * References: Procesi, Adv. Math. 19 (1976) 306 (trace identities as the kernel ℓ(λ) > N);
 * Macdonald, Symmetric Functions and Hall Polynomials (2nd ed., 1995), I.7 (p_ν = Σ χ_λ(ν) s_λ)
 * and VI.9 (∫ s_λ(h) \overline{s_μ(h)} = δ_{λμ}); Sagan, The Symmetric Group, 4.10 (characters).
 */
import { EngineInputError } from '../errors'
import { partitionsOf, symmetricCharacter } from '../group/symmetricGroup'

/** N larger than any number of letters: no trace relations ("general N"). */
export const GENERAL_N = Number.POSITIVE_INFINITY

const cache = new Map<string, number>()

function checkN(fn: string, N: number): void {
  if (N !== GENERAL_N && (!Number.isInteger(N) || N < 1)) throw new EngineInputError(fn, `N must be a positive integer or general, got ${N}`)
}

function sorted(nu: readonly number[]): number[] {
  return [...nu].sort((a, b) => b - a)
}

function total(nu: readonly number[]): number {
  return nu.reduce((a, b) => a + b, 0)
}

function memo(key: string, compute: () => number): number {
  const hit = cache.get(key)
  if (hit !== undefined) return hit
  const v = compute()
  if (cache.size > 500_000) cache.clear()
  cache.set(key, v)
  return v
}

function irreps(m: number, N: number): number[][] {
  return partitionsOf(m).filter((l) => l.length <= N)
}

/**
 * Number of U(N)-invariants (signed trace) of a cycle type ν of gl_N letters.
 * @example adjointSinglets(3, [1, 1]) // 2: ⟨X⟩⟨Y⟩ and ⟨XY⟩
 */
export function adjointSinglets(N: number, nu: readonly number[]): number {
  checkN('adjointSinglets', N)
  const p = sorted(nu)
  return memo(`a|${N}|${p.join(',')}`, () => {
    let s = 0
    for (const l of irreps(total(p), N)) {
      const x = symmetricCharacter(l, p)
      s += x * x
    }
    return s
  })
}

/** Cycle type of π² for π of cycle type ν. @example squareType([4, 3]) // [3, 2, 2] */
export function squareType(nu: readonly number[]): number[] {
  const out: number[] = []
  for (const c of nu) {
    if (c % 2 === 1) out.push(c)
    else out.push(c / 2, c / 2)
  }
  return sorted(out)
}

/**
 * Trace of charge conjugation (X ↦ X^T on every letter) composed with a permutation of cycle
 * type ν on the U(N)-invariants of gl_N letters.
 * @example twistedAdjointSinglets(3, [1, 1, 1]) // 4: of the 6 products ⟨…⟩, the identity and 3 transpositions are fixed
 */
export function twistedAdjointSinglets(N: number, nu: readonly number[]): number {
  checkN('twistedAdjointSinglets', N)
  return conjugationSinglets(N, squareType(nu))
}

/**
 * ∫_{U(N)} p_ν(A Ā) dA = Σ_{ℓ(λ) ≤ N} χ_λ(ν) (every irrep has twisted indicator +1 for complex conjugation).
 * @example conjugationSinglets(3, [1, 1]) // 2
 */
export function conjugationSinglets(N: number, nu: readonly number[]): number {
  checkN('conjugationSinglets', N)
  const p = sorted(nu)
  return memo(`c|${N}|${p.join(',')}`, () => {
    let s = 0
    for (const l of irreps(total(p), N)) s += symmetricCharacter(l, p)
    return s
  })
}

/** λ with the full columns of height N removed (the SU(N) irrep of s_λ). */
function reduced(l: readonly number[], N: number): string {
  if (N === GENERAL_N || l.length < N) return l.join(',')
  const k = l[N - 1]!
  return l
    .map((x) => x - k)
    .filter((x) => x > 0)
    .join(',')
}

/**
 * ∫_{SU(N)} p_α(h) \overline{p_β(h)} dh.
 * @example specialPairing(2, [1, 1], []) // 1: det of a 2 × 2 matrix is an SU(2) invariant of two fundamentals
 */
export function specialPairing(N: number, alpha: readonly number[], beta: readonly number[]): number {
  checkN('specialPairing', N)
  const a = sorted(alpha)
  const b = sorted(beta)
  return memo(`s|${N}|${a.join(',')}|${b.join(',')}`, () => {
    const ma = total(a)
    const mb = total(b)
    if (N === GENERAL_N ? ma !== mb : (ma - mb) % N !== 0) return 0
    const left = new Map<string, number>()
    for (const l of irreps(ma, N)) {
      const key = reduced(l, N)
      left.set(key, (left.get(key) ?? 0) + (a.length === 0 ? 1 : symmetricCharacter(l, a)))
    }
    let s = 0
    for (const l of irreps(mb, N)) {
      const x = left.get(reduced(l, N))
      if (x !== undefined) s += x * (b.length === 0 ? 1 : symmetricCharacter(l, b))
    }
    return s
  })
}

/**
 * Σ over sub-multisets A of `dropped` of (−1)^{|A|} f(kept ∪ (dropped ∖ A)): the expansion of
 * Π (tr_{gl} − 1) for traceless (sl_N) letters, the identity being C-even and parity-even.
 * @example withTracesRemoved([], [1, 1], (nu) => adjointSinglets(3, nu)) // 1 = 2 − 2·1 + 1: only ⟨XY⟩ for traceless X, Y
 */
export function withTracesRemoved(kept: readonly number[], traceless: readonly number[], f: (nu: number[]) => number): number {
  const counts = new Map<number, number>()
  for (const c of traceless) counts.set(c, (counts.get(c) ?? 0) + 1)
  const lengths = [...counts.keys()]
  let s = 0
  const visit = (i: number, chosen: number[], coef: number): void => {
    if (i === lengths.length) {
      s += coef * f([...kept, ...chosen])
      return
    }
    const c = lengths[i]!
    const m = counts.get(c)!
    let binom = 1
    for (let drop = 0; drop <= m; drop++) {
      const keep = new Array<number>(m - drop).fill(c)
      visit(i + 1, [...chosen, ...keep], coef * binom * (drop % 2 === 0 ? 1 : -1))
      binom = (binom * (m - drop)) / (drop + 1)
    }
  }
  visit(0, [], 1)
  return s
}
