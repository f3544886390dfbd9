/**
 * Twining characters of the CP index swap on real SU(n) irreps: for R = [α; α], the traceless
 * tensors with upper indices of Young shape α and lower indices of shape α, CP acts as
 * J: T^{i…}_{j…} ↦ T^{j…}_{i…}, and tr_R(J ρ(x)) is a class function τ_R of M = x x̄.
 * On the whole of V_α ⊗ V̄_α the swap-trace identity tr(J (A ⊗ B)) = tr(AB) gives χ_α(M);
 * its traceless parts [δ; ε] with δ ≠ ε are swapped in pairs (trace 0), and [δ; δ] appears
 * once per LR pair (γ, δ) with c^α_{γδ} ≠ 0 on the diagonal, so
 *   τ_[α;α] = χ_α − Σ_{δ ⊊ α} (Σ_γ c^α_{γδ}) τ_[δ;δ],  τ_[∅;∅] = 1
 * (stable range n ≥ 2ℓ(α), always met by real irreps). Example: the adjoint, τ = χ_fund − 1.
 * Reference: Koike, Adv. Math. 74 (1989) 57 (mixed tensor decomposition of V_α ⊗ V̄_β);
 * Fulton & Harris, Representation Theory, §6.1 (Littlewood–Richardson coefficients).
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import { characterSum, trivialCharacter } from '../group/character'
import { tensorProduct } from '../group/products'
import { suWeights } from '../group/weights'
import { MAX_N } from '../group/labels'
import type { Character } from '../group/types'

/**
 * The partition α of a real SU(n) irrep [α; α] (palindromic labels; an even middle label for even n).
 * @example mixedTensorShape(3, [1, 1]) // [1] (the adjoint)
 */
export function mixedTensorShape(n: number, dynkin: readonly number[]): number[] {
  const k = Math.floor(n / 2)
  const alpha: number[] = []
  for (let i = 0; i < k; i++) {
    let s = n % 2 === 0 ? dynkin[k - 1]! / 2 : 0
    for (let j = i; j < (n % 2 === 0 ? k - 1 : k); j++) s += dynkin[j]!
    if (!Number.isInteger(s)) throw new EngineInputError('mixedTensorShape', `SU(${n}) [${dynkin.join(',')}] has an odd middle label: not of the form [α; α]`)
    alpha.push(s)
  }
  while (alpha.length > 0 && alpha[alpha.length - 1] === 0) alpha.pop()
  return alpha
}

function dynkinOf(partition: readonly number[], n: number): number[] {
  const p = [...partition, ...new Array<number>(Math.max(0, n - partition.length)).fill(0)]
  return Array.from({ length: n - 1 }, (_, i) => p[i]! - p[i + 1]!)
}

/** Partitions δ ⊆ α (all of them, α included). */
function subpartitions(alpha: readonly number[]): number[][] {
  const out: number[][] = []
  const rec = (i: number, cur: number[]): void => {
    if (i === alpha.length) {
      out.push(cur.filter((x) => x > 0))
      return
    }
    const max = Math.min(alpha[i]!, i === 0 ? alpha[0]! : cur[i - 1]!)
    for (let v = 0; v <= max; v++) rec(i + 1, [...cur, v])
  }
  rec(0, [])
  return out
}

function partitionsOfSize(k: number, maxPart: number): number[][] {
  if (k === 0) return [[]]
  const out: number[][] = []
  for (let p = Math.min(k, maxPart); p >= 1; p--) for (const rest of partitionsOfSize(k - p, p)) out.push([p, ...rest])
  return out
}

/**
 * Littlewood–Richardson coefficient c^α_{γδ} (|γ| + |δ| = |α|), from an SU(M) tensor product
 * with M = ℓ(α) + 1: it vanishes unless γ, δ ⊆ α, and in SU(M) only α plus whole columns of
 * length M shares α's Dynkin labels, which has more boxes than γ ⊗ δ; so the SU(M) multiplicity
 * is the GL one. Real irreps of SU(n ≤ 8) have ℓ(α) ≤ 4, so M ≤ 5.
 * Reference: Fulton & Harris, Representation Theory, §15.3 (SL(M) irreps as partitions modulo columns).
 */
function lr(alpha: number[], gamma: number[], delta: number[]): number {
  if (gamma.length === 0) return delta.join() === alpha.join() ? 1 : 0
  if (delta.length === 0) return gamma.join() === alpha.join() ? 1 : 0
  if (gamma.length > alpha.length || delta.length > alpha.length) return 0
  const m = alpha.length + 1
  if (m > MAX_N) throw new EngineConsistencyError('twiningCharacter', `shape [${alpha.join(',')}] of a real irrep is longer than SU(8) allows`)
  return tensorProduct(m, dynkinOf(gamma, m), dynkinOf(delta, m)).get(dynkinOf(alpha, m).join(',')) ?? 0
}

const memo = new Map<string, Character>()

function tau(n: number, alpha: number[]): Character {
  if (alpha.length === 0) return trivialCharacter(n)
  const key = `${n}:${alpha.join(',')}`
  const hit = memo.get(key)
  if (hit) return hit
  const size = alpha.reduce((s, x) => s + x, 0)
  const terms: [number, Character][] = [[1, suWeights(n, dynkinOf(alpha, n))]]
  for (const delta of subpartitions(alpha)) {
    const rest = size - delta.reduce((s, x) => s + x, 0)
    if (rest === 0) continue
    const coeff = partitionsOfSize(rest, alpha[0]!).reduce((s, gamma) => s + lr(alpha, gamma, delta), 0)
    if (coeff !== 0) terms.push([-coeff, tau(n, delta)])
  }
  const out = characterSum(terms)
  memo.set(key, out)
  return out
}

/**
 * τ_R as a virtual SU(n) character (weights), for a real irrep R = [α; α].
 * @example twiningCharacter(3, [1, 1]) // weights of 3 minus the zero weight once
 */
export function twiningCharacter(n: number, dynkin: readonly number[]): Character {
  return tau(n, mixedTensorShape(n, dynkin))
}
