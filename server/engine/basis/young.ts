/**
 * Young symmetrizers of products of symmetric groups acting on identical legs, and
 * dimensions of GL(N) irreps, for the flavor decomposition of operators.
 */
import { perms, type LegPermutation } from './symmetry'

function parity(p: number[], base: number[]): number {
  const idx = p.map((x) => base.indexOf(x))
  let s = 1
  for (let i = 0; i < idx.length; i++) for (let j = i + 1; j < idx.length; j++) if (idx[i]! > idx[j]!) s = -s
  return s
}

/** All permutations of `legs` that preserve each group (given as lists of legs), as maps. */
function groupElements(groups: number[][]): { map: Map<number, number>; sign: number }[] {
  let out = [{ map: new Map<number, number>(), sign: 1 }]
  for (const g of groups) {
    const next: typeof out = []
    for (const base of out)
      for (const p of perms(g)) {
        const map = new Map(base.map)
        g.forEach((leg, i) => map.set(leg, p[i]!))
        next.push({ map, sign: base.sign * parity(p, g) })
      }
    out = next
  }
  return out
}

/**
 * Young symmetrizer Y = Σ_{p∈Row(T)} Σ_{q∈Col(T)} sgn(q) p∘q for the row-reading tableau T
 * of shape λ filled with `legs`, as weighted leg maps on n legs (weights multiplied by
 * `twist(σ)`, e.g. the Fermi sign). Terms with the same map are merged.
 * @example youngSymmetrizer([2], [0, 1], 2).length // 2: identity + swap
 * Method: Fulton & Harris, Representation Theory (Springer 1991), §4.1.
 */
export function youngSymmetrizer(lambda: number[], legs: number[], n: number, fermion: boolean): LegPermutation[] {
  const rows: number[][] = []
  let at = 0
  for (const len of lambda) {
    rows.push(legs.slice(at, at + len))
    at += len
  }
  const cols: number[][] = []
  for (let c = 0; c < (lambda[0] ?? 0); c++) cols.push(rows.filter((r) => r.length > c).map((r) => r[c]!))
  const acc = new Map<string, LegPermutation>()
  for (const p of groupElements(rows))
    for (const q of groupElements(cols)) {
      const map = Array.from({ length: n }, (_, i) => i)
      for (let i = 0; i < n; i++) map[i] = p.map.get(q.map.get(i) ?? i) ?? q.map.get(i) ?? i
      const total = legs.length > 1 ? permSign(map, legs) : 1
      const w = q.sign * (fermion ? total : 1)
      const key = map.join(',')
      const prev = acc.get(key)
      if (prev) prev.sign += w
      else acc.set(key, { map, sign: w })
    }
  return [...acc.values()].filter((t) => t.sign !== 0)
}

function permSign(map: number[], legs: number[]): number {
  return parity(
    legs.map((l) => map[l]!),
    legs,
  )
}

/**
 * Compose weighted permutation sums of disjoint leg blocks (tensor product).
 * @example composeBlocks(Y_[2] on legs 0,1, Y_[2] on legs 2,3).length // 4
 */
export function composeBlocks(a: LegPermutation[], b: LegPermutation[]): LegPermutation[] {
  const out: LegPermutation[] = []
  for (const x of a)
    for (const y of b) {
      out.push({ map: x.map.map((v, i) => (y.map[i] !== i ? y.map[i]! : v)), sign: x.sign * y.sign })
    }
  return out
}

/**
 * Dimension of the GL(N) irrep with Young diagram λ (0 when λ has more than N rows).
 * @example glDimension([2, 1], 3) // 8
 * Method: hook-content formula (Stanley, Enumerative Combinatorics 2, Cor. 7.21.4).
 */
export function glDimension(lambda: number[], N: number): number {
  let num = 1n
  let den = 1n
  lambda.forEach((len, i) => {
    for (let j = 0; j < len; j++) {
      const colLen = lambda.filter((l) => l > j).length
      num *= BigInt(N + j - i)
      den *= BigInt(len - j + colLen - i - 1)
    }
  })
  return num <= 0n ? 0 : Number(num / den)
}

/**
 * Dimension f^λ of the S_m irrep λ (number of standard tableaux).
 * @example standardTableaux([2, 1]) // 2
 * Method: hook length formula (Frame, Robinson & Thrall, Canad. J. Math. 6 (1954) 316).
 */
export function standardTableaux(lambda: number[]): number {
  let m = 0
  let den = 1n
  lambda.forEach((len, i) => {
    for (let j = 0; j < len; j++) {
      m++
      den *= BigInt(len - j + lambda.filter((l) => l > j).length - i - 1)
    }
  })
  let num = 1n
  for (let k = 2; k <= m; k++) num *= BigInt(k)
  return Number(num / den)
}
