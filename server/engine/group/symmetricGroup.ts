/**
 * Characters and conjugacy classes of the symmetric group S_k (exact integers).
 */
import { EngineInputError } from '../errors'

/** Partitions of k in reverse lexicographic order, e.g. 3 -> [[3],[2,1],[1,1,1]]. */
export function partitionsOf(k: number): number[][] {
  const out: number[][] = []
  const rec = (left: number, max: number, cur: number[]): void => {
    if (left === 0) {
      out.push(cur.slice())
      return
    }
    for (let p = Math.min(left, max); p >= 1; p--) {
      cur.push(p)
      rec(left - p, p, cur)
      cur.pop()
    }
  }
  rec(k, k, [])
  return out
}

/**
 * Size k!/z_μ of the conjugacy class of cycle type μ in S_k, z_μ = Π_i i^{m_i} m_i!.
 * @example classSize([2, 1]) // 3n (the three transpositions of S_3)
 * Reference: Sagan, The Symmetric Group (Springer 2001), Prop. 1.1.1.
 */
export function classSize(mu: readonly number[]): bigint {
  const k = mu.reduce((a, b) => a + b, 0)
  let z = 1n
  const counts = new Map<number, number>()
  for (const p of mu) counts.set(p, (counts.get(p) ?? 0) + 1)
  for (const [p, m] of counts) z *= BigInt(p) ** BigInt(m) * factorial(m)
  return factorial(k) / z
}

/** k! as a bigint. @example factorial(5) // 120n */
export function factorial(k: number): bigint {
  let f = 1n
  for (let i = 2; i <= k; i++) f *= BigInt(i)
  return f
}

const memo = new Map<string, number>()

/**
 * Irreducible character χ^λ(μ) of S_k (λ the irrep, μ the cycle type).
 * @example symmetricCharacter([2, 1], [3]) // -1
 * Method: Murnaghan–Nakayama rule on beta-numbers (remove a rim hook of length μ_1 = move a
 * bead r places down; sign (-1)^(beads jumped over)).
 * Reference: Sagan, The Symmetric Group, Thm 4.10.2; James & Kerber (1981), 2.4.
 */
export function symmetricCharacter(lambda: readonly number[], mu: readonly number[]): number {
  const kl = lambda.reduce((a, b) => a + b, 0)
  const km = mu.reduce((a, b) => a + b, 0)
  if (kl !== km) {
    throw new EngineInputError(
      'symmetricCharacter',
      `The partitions ${JSON.stringify(lambda)} and ${JSON.stringify(mu)} have different sizes; a character of the symmetric group needs two partitions of the same number`,
    )
  }
  const len = lambda.length
  const beta = lambda.map((p, i) => p + len - 1 - i)
  return mn(
    beta,
    [...mu].sort((a, b) => b - a),
  )
}

function mn(beta: number[], mu: number[]): number {
  if (mu.length === 0) return 1
  const key = `${beta.join(',')}|${mu.join(',')}`
  const hit = memo.get(key)
  if (hit !== undefined) return hit
  const r = mu[0]!
  const rest = mu.slice(1)
  const occupied = new Set(beta)
  let total = 0
  for (let i = 0; i < beta.length; i++) {
    const b = beta[i]!
    const t = b - r
    if (t < 0 || occupied.has(t)) continue
    let jumped = 0
    for (const x of beta) if (x > t && x < b) jumped++
    const next = beta.slice()
    next[i] = t
    next.sort((a, c) => c - a)
    total += (jumped % 2 === 0 ? 1 : -1) * mn(next, rest)
  }
  if (memo.size > 200_000) memo.clear()
  memo.set(key, total)
  return total
}
