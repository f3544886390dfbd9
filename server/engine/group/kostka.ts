/**
 * Kostka numbers K_{λμ}: the number of semistandard Young tableaux of shape λ and content μ.
 * They are the weight multiplicities of GL(n)/SU(n) irreps (weight μ in the irrep λ).
 */

const memo = new Map<string, number>()

/**
 * Kostka number K_{λμ} for partitions λ, μ of the same size (trailing zeros allowed).
 * @example kostka([2, 1], [1, 1, 1]) // 2 (the zero weight of the SU(3) adjoint)
 * Method: the boxes filled with the largest letter form a horizontal strip, so
 * K_{λ,μ} = Σ_{λ/ν horizontal strip of size μ_last} K_{ν, μ without its last part}.
 * Reference: Fulton, Young Tableaux (CUP 1997), §2.2; Macdonald, Symmetric Functions, I.6.
 */
export function kostka(lambda: readonly number[], mu: readonly number[]): number {
  const l = trim(lambda)
  const m = trim([...mu].sort((a, b) => b - a))
  return kostkaRec(l, m)
}

function trim(p: readonly number[]): number[] {
  let e = p.length
  while (e > 0 && p[e - 1] === 0) e--
  return p.slice(0, e)
}

function kostkaRec(lambda: number[], mu: number[]): number {
  if (mu.length === 0) return lambda.length === 0 ? 1 : 0
  if (lambda.length > mu.length) return 0
  const key = `${lambda.join(',')}|${mu.join(',')}`
  const hit = memo.get(key)
  if (hit !== undefined) return hit
  const s = mu[mu.length - 1]!
  const rest = mu.slice(0, -1)
  let total = 0
  forEachHorizontalStrip(lambda, s, (nu) => {
    total += kostkaRec(trim(nu), rest)
  })
  if (memo.size > 500_000) memo.clear()
  memo.set(key, total)
  return total
}

/** Call f(ν) for every ν ⊂ λ such that λ/ν is a horizontal strip of s boxes. */
function forEachHorizontalStrip(lambda: number[], s: number, f: (nu: number[]) => void): void {
  const nu = lambda.slice()
  const rec = (i: number, left: number): void => {
    if (i === lambda.length) {
      if (left === 0) f(nu.slice())
      return
    }
    const lower = i + 1 < lambda.length ? lambda[i + 1]! : 0
    const maxTake = Math.min(lambda[i]! - lower, left)
    for (let t = 0; t <= maxTake; t++) {
      nu[i] = lambda[i]! - t
      rec(i + 1, left - t)
    }
    nu[i] = lambda[i]!
  }
  rec(0, s)
}

/**
 * All partitions μ of |λ| with at most n parts and μ ⊴ λ (dominance order), padded to n.
 * These are exactly the dominant weights of the GL(n) irrep λ (K_{λμ} > 0 iff μ ⊴ λ).
 * @example dominatedPartitions([2, 0, 0], 3) // [[2,0,0],[1,1,0]]
 * Reference: Macdonald, Symmetric Functions and Hall Polynomials, I.6 (Kostka matrix).
 */
export function dominatedPartitions(lambda: readonly number[], n: number): number[][] {
  const total = lambda.reduce((a, b) => a + b, 0)
  const prefix: number[] = []
  let acc = 0
  for (let i = 0; i < n; i++) {
    acc += lambda[i] ?? 0
    prefix.push(acc)
  }
  const out: number[][] = []
  const cur = new Array<number>(n).fill(0)
  const rec = (i: number, sum: number, maxPart: number): void => {
    if (i === n) {
      if (sum === total) out.push(cur.slice())
      return
    }
    const remainingSlots = n - i
    const hi = Math.min(maxPart, prefix[i]! - sum, total - sum)
    for (let p = hi; p >= 0; p--) {
      if (sum + p + p * (remainingSlots - 1) < total) break
      cur[i] = p
      rec(i + 1, sum + p, p)
    }
    cur[i] = 0
  }
  rec(0, 0, total)
  return out
}
