/**
 * Flavor integrals over the orthogonal group O(N) (both components) for the coset
 * O(N+1)/O(N): ∫_{O(N)} Π_i χ_{R_i}(h^{c_i}) dh with R the vector V or the adjoint Λ²V.
 * In power sums p_k(h) = tr h^k: χ_V(h^c) = p_c, χ_{Λ²V}(h^c) = (p_c² − p_{2c})/2.
 *
 * ∫ p_ν (|ν| = m) is the trace of a permutation of type ν on (V^{⊗m})^{O(N)}. For 2N ≥ m the
 * invariants are the perfect matchings of the m slots, linearly independent (Brauer), so the
 * integral counts the matchings the permutation fixes: Π_j E[(√j Z + η_j)^{a_j}] with a_j parts
 * equal to j, Z a standard normal variable and η_j = 1 for even j, 0 for odd j.
 * For smaller N the Weyl integration formula is used on each component: SO(N) with its positive
 * roots (B_r or D_r), and O(N)⁻: −SO(N) for odd N, and for even N = 2r the elements
 * diag(R(θ_1), …, R(θ_{r−1}), 1, −1) with the measure of type C_{r−1}.
 * References: Brauer, Ann. Math. 38 (1937) 857; Diaconis & Shahshahani, J. Appl. Probab. 31A
 * (1994) 49 (moments of traces); Weyl integration: Bump, Lie Groups (2nd ed., 2013), ch. 17;
 * the twisted component of O(2r): Fulton & Harris §23.
 */
import { EngineConsistencyError, EngineInputError } from '../errors'

export type OrthogonalRep = 'vector' | 'adjoint'

const cache = new Map<string, number>()

/** Power-sum expansion of 2^{#adjoints} Π χ_{R_i}(h^{c_i}): list of [integer coefficient, parts]. */
function powerSums(factors: readonly { rep: OrthogonalRep; cycle: number }[]): [number, number[]][] {
  let terms: [number, number[]][] = [[1, []]]
  for (const f of factors) {
    const choices: [number, number[]][] =
      f.rep === 'vector'
        ? [[1, [f.cycle]]]
        : [
            [1, [f.cycle, f.cycle]],
            [-1, [2 * f.cycle]],
          ]
    terms = terms.flatMap(([c, p]) => choices.map(([c2, p2]) => [c * c2, [...p, ...p2]] as [number, number[]]))
  }
  return terms
}

/**
 * ∫_{O(N)} Π χ_{R_i}(h^{c_i}) dh, exact.
 * @example orthogonalSinglets(3, [{rep:'vector',cycle:1},{rep:'vector',cycle:1}]) // 1 (δ_ab)
 */
export function orthogonalSinglets(N: number, factors: readonly { rep: OrthogonalRep; cycle: number }[]): number {
  if (!Number.isInteger(N) || N < 1) throw new EngineInputError('orthogonalSinglets', `N must be a positive integer, got ${N}`)
  let s = 0
  for (const [c, parts] of powerSums(factors)) s += c * powerSumIntegral(N, parts)
  const den = 2 ** factors.filter((f) => f.rep === 'adjoint').length
  if (!Number.isSafeInteger(s) || s % den !== 0) throw new EngineConsistencyError('orthogonalSinglets', `singlet count ${s}/${den} is not an integer`)
  return s / den
}

/** ∫_{O(N)} p_ν(h) dh. @example powerSumIntegral(2, [1, 1, 1, 1]) // 3 */
export function powerSumIntegral(N: number, nu: readonly number[]): number {
  const parts = [...nu].sort((a, b) => b - a)
  const key = `${N}|${parts.join(',')}`
  const hit = cache.get(key)
  if (hit !== undefined) return hit
  const m = parts.reduce((a, b) => a + b, 0)
  const v = 2 * N >= m ? matchingCount(parts) : averageOfComponents(N, parts)
  cache.set(key, v)
  return v
}

/**
 * ∫_{O(N)} p_ν by Weyl integration over both components, for any N (slow; the oracle of tests).
 * @example averageOfComponents(2, [2, 2, 2]) // 4 = (0 + 8)/2
 */
export function averageOfComponents(N: number, parts: readonly number[]): number {
  const twice = weylIntegral(N, parts, false) + weylIntegral(N, parts, true)
  if (twice % 2 !== 0) throw new EngineConsistencyError('powerSumIntegral', `odd sum ${twice} of the two components of O(${N})`)
  return twice / 2
}

/** Π_j E[(√j Z + η_j)^{a_j}]: matchings fixed by a permutation of cycle type ν. */
function matchingCount(parts: readonly number[]): number {
  const mult = new Map<number, number>()
  for (const j of parts) mult.set(j, (mult.get(j) ?? 0) + 1)
  let total = 1
  for (const [j, a] of mult) {
    const eta = j % 2 === 0 ? 1 : 0
    let e = 0
    let binom = 1
    for (let i = 0; i <= a; i++) {
      if (i % 2 === 0) e += binom * eta ** (a - i) * j ** (i / 2) * doubleFactorial(i - 1)
      binom = (binom * (a - i)) / (i + 1)
    }
    total *= e
  }
  return total
}

function doubleFactorial(n: number): number {
  let f = 1
  for (let k = n; k > 1; k -= 2) f *= k
  return f
}

type Laurent = Map<string, number>

const exponents = (key: string): number[] => (key === '' ? [] : key.split(',').map(Number))

function mulLaurent(a: Laurent, b: Laurent): Laurent {
  const out: Laurent = new Map()
  for (const [ka, va] of a) {
    const ea = exponents(ka)
    for (const [kb, vb] of b) {
      const e = exponents(kb).map((x, i) => x + ea[i]!)
      const k = e.join(',')
      out.set(k, (out.get(k) ?? 0) + va * vb)
    }
  }
  for (const [k, v] of out) if (v === 0) out.delete(k)
  return out
}

function monomial(r: number, exps: Record<number, number>, c = 1): Laurent {
  const e = new Array<number>(r).fill(0)
  for (const [i, x] of Object.entries(exps)) e[Number(i)] = x
  return new Map([[e.join(','), c]])
}

function sumLaurent(terms: Laurent[]): Laurent {
  const out: Laurent = new Map()
  for (const t of terms) for (const [k, v] of t) out.set(k, (out.get(k) ?? 0) + v)
  return out
}

/**
 * ∫ p_ν over SO(N) (improper = false) or over the component O(N)⁻ (improper = true), by the Weyl
 * integration formula CT[f Π_{α>0}(1 − t^α)] on the (twisted) maximal torus.
 */
function weylIntegral(N: number, parts: readonly number[], improper: boolean): number {
  const odd = N % 2 === 1
  const r = improper && !odd ? N / 2 - 1 : Math.floor(N / 2)
  const trace = (k: number): Laurent => {
    const terms: Laurent[] = []
    for (let i = 0; i < r; i++) terms.push(monomial(r, { [i]: k }), monomial(r, { [i]: -k }))
    let constant = odd ? 1 : 0
    if (improper && !odd) constant = 1 + (k % 2 === 0 ? 1 : -1)
    if (constant !== 0) terms.push(monomial(r, {}, constant))
    const sign = improper && odd && k % 2 === 1 ? -1 : 1
    const t = sumLaurent(terms)
    if (sign === -1) for (const [key, v] of t) t.set(key, -v)
    return t
  }
  let f: Laurent = monomial(r, {})
  for (const k of parts) f = mulLaurent(f, trace(k))
  for (const root of positiveRoots(r, improper && !odd ? 'C' : odd ? 'B' : 'D')) {
    f = mulLaurent(f, sumLaurent([monomial(r, {}), monomial(r, root, -1)]))
  }
  return f.get(new Array<number>(r).fill(0).join(',')) ?? 0
}

function positiveRoots(r: number, type: 'B' | 'C' | 'D'): Record<number, number>[] {
  const roots: Record<number, number>[] = []
  for (let i = 0; i < r; i++) {
    for (let j = i + 1; j < r; j++) roots.push({ [i]: 1, [j]: -1 }, { [i]: 1, [j]: 1 })
    if (type === 'B') roots.push({ [i]: 1 })
    if (type === 'C') roots.push({ [i]: 2 })
  }
  return roots
}
