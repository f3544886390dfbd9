/**
 * Random wave-functions of an SU(N) leg written as a traceless tensor [α; β] (tensorShape.ts),
 * over F_p: g·v for a random g ∈ GL(N, F_p) and the highest-weight tensor v, which is
 * Q(e_{r(1)} ⊗ … ) on the upper boxes (r(b) = row of box b, Q the column antisymmetrizer,
 * so v lies in the image of Y = Q∘P) times the same on the lower boxes with e_{N−r}. The
 * GL action keeps the Young symmetry and the tracelessness; the span of the orbit is the whole
 * irrep, so multilinear invariants are told apart by such points (their values are multilinear
 * in each leg's tensor). Axes: upper boxes then lower boxes, row by row; index i of axis a at
 * offset Σ_a i_a N^a.
 */
import type { PrimeField } from '../finite/primeField'
import { type TensorShape, boxColumns, boxRows, boxes } from './tensorShape'

export interface TensorWave {
  kind: 'tensor'
  /** Number of axes (= the leg's slots). */
  axes: number
  data: number[]
}

/** Inverse of an invertible matrix over F_p (Gauss–Jordan), or null when singular. */
function inverse(F: PrimeField, m: number[][]): number[][] | null {
  const n = m.length
  const a = m.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0))])
  for (let c = 0; c < n; c++) {
    const p = a.findIndex((row, r) => r >= c && row[c] !== 0)
    if (p < 0) return null
    ;[a[p], a[c]] = [a[c]!, a[p]!]
    const inv = F.inv(a[c]![c]!)
    a[c] = a[c]!.map((x) => F.mul(x, inv))
    for (let r = 0; r < n; r++) {
      if (r === c || a[r]![c] === 0) continue
      const f = a[r]![c]!
      a[r] = a[r]!.map((x, k) => F.sub(x, F.mul(f, a[c]![k]!)))
    }
  }
  return a.map((row) => row.slice(n))
}

/** Column-antisymmetrized product over the boxes of one shape: value at one index tuple. */
function youngComponent(F: PrimeField, shape: readonly number[], vectors: number[][], idx: readonly number[]): number {
  const rows = boxRows(shape)
  const cols = boxColumns(shape)
  let v = 1
  for (let c = 0; c < (shape[0] ?? 0); c++) {
    const members = rows.map((_, b) => b).filter((b) => cols[b] === c)
    // det of the column: Σ_π sgn(π) Π_k vectors[row(π(k))][idx[k]]
    v = F.mul(
      v,
      determinant(
        F,
        members.map((b) => members.map((b2) => vectors[rows[b2]!]![idx[b]!]!)),
      ),
    )
    if (v === 0) return 0
  }
  return v
}

function determinant(F: PrimeField, m: number[][]): number {
  const n = m.length
  const a = m.map((r) => r.slice())
  let det = 1
  for (let c = 0; c < n; c++) {
    const p = a.findIndex((row, r) => r >= c && row[c] !== 0)
    if (p < 0) return 0
    if (p !== c) {
      ;[a[p], a[c]] = [a[c]!, a[p]!]
      det = F.neg(det)
    }
    det = F.mul(det, a[c]![c]!)
    const inv = F.inv(a[c]![c]!)
    for (let r = c + 1; r < n; r++) {
      const f = F.mul(a[r]![c]!, inv)
      if (f !== 0) for (let k = c; k < n; k++) a[r]![k] = F.sub(a[r]![k]!, F.mul(f, a[c]![k]!))
    }
  }
  return det
}

/**
 * A random element of the SU(n) irrep with tensor shape `shape`.
 * @example randomTensorWave(F, 2, { upper: [2], lower: [1] }, draw).data.length // 8 (the quartet)
 */
export function randomTensorWave(F: PrimeField, n: number, shape: TensorShape, draw: () => number): TensorWave {
  let g: number[][] = []
  let gi: number[][] | null = null
  while (gi === null) {
    g = Array.from({ length: n }, () => Array.from({ length: n }, draw))
    gi = inverse(F, g)
  }
  // upper vectors u_r = g e_r (column r of g); lower vectors l_r = g^{−T} e_{n−1−r} (row n−1−r of g^{−1})
  const up = Array.from({ length: n }, (_, r) => g.map((row) => row[r]!))
  const low = Array.from({ length: n }, (_, r) => gi![n - 1 - r]!.slice())
  const a = boxes(shape.upper)
  const b = boxes(shape.lower)
  const axes = a + b
  const data = new Array<number>(n ** axes).fill(0)
  const idx = new Array<number>(axes).fill(0)
  for (let off = 0; off < data.length; off++) {
    let x = off
    for (let k = 0; k < axes; k++) {
      idx[k] = x % n
      x = Math.floor(x / n)
    }
    const u = a ? youngComponent(F, shape.upper, up, idx.slice(0, a)) : 1
    data[off] = u === 0 ? 0 : b ? F.mul(u, youngComponent(F, shape.lower, low, idx.slice(a))) : u
  }
  return { kind: 'tensor', axes, data }
}
