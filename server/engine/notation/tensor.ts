/**
 * Small dense tensors over F_p and the contraction of a network of them (every label shared
 * by exactly two tensors is summed). Used to evaluate a printed operator's Feynman rule at a
 * sample point: a handful of tensors with indices of size 2 to 9.
 */
import { EngineInputError } from '../errors'
import type { PrimeField } from '../finite/primeField'

export interface Tensor {
  labels: string[]
  dims: number[]
  /** Row-major values, the last label fastest. */
  data: number[]
}

/** A tensor from a function of its index values. @example build(['a'], [2], ([a]) => a + 1).data // [1, 2] */
export function build(labels: string[], dims: number[], f: (idx: number[]) => number): Tensor {
  const size = dims.reduce((x, y) => x * y, 1)
  const data = new Array<number>(size)
  const idx = new Array<number>(dims.length).fill(0)
  for (let n = 0; n < size; n++) {
    data[n] = f(idx)
    for (let d = dims.length - 1; d >= 0; d--) {
      if (++idx[d]! < dims[d]!) break
      idx[d] = 0
    }
  }
  return { labels, dims, data }
}

function strides(dims: number[]): number[] {
  const s = new Array<number>(dims.length).fill(1)
  for (let d = dims.length - 2; d >= 0; d--) s[d] = s[d + 1]! * dims[d + 1]!
  return s
}

/** Product of two tensors summed over their shared labels. */
export function contractPair(F: PrimeField, a: Tensor, b: Tensor): Tensor {
  const shared = a.labels.filter((l) => b.labels.includes(l))
  const outLabels = [...a.labels.filter((l) => !shared.includes(l)), ...b.labels.filter((l) => !shared.includes(l))]
  const dimOf = (l: string): number => (a.labels.includes(l) ? a.dims[a.labels.indexOf(l)]! : b.dims[b.labels.indexOf(l)]!)
  const all = [...outLabels, ...shared]
  const allDims = all.map(dimOf)
  const sa = strides(a.dims)
  const sb = strides(b.dims)
  const posA = a.labels.map((l) => all.indexOf(l))
  const posB = b.labels.map((l) => all.indexOf(l))
  const outSize = outLabels.map(dimOf).reduce((x, y) => x * y, 1)
  const inner = shared.map(dimOf).reduce((x, y) => x * y, 1)
  const data = new Array<number>(outSize).fill(0)
  const idx = new Array<number>(all.length).fill(0)
  for (let n = 0; n < outSize * inner; n++) {
    let ia = 0
    let ib = 0
    for (let d = 0; d < posA.length; d++) ia += idx[posA[d]!]! * sa[d]!
    for (let d = 0; d < posB.length; d++) ib += idx[posB[d]!]! * sb[d]!
    const v = F.mul(a.data[ia]!, b.data[ib]!)
    if (v !== 0) {
      const o = Math.floor(n / inner)
      data[o] = F.add(data[o]!, v)
    }
    for (let d = all.length - 1; d >= 0; d--) {
      if (++idx[d]! < allDims[d]!) break
      idx[d] = 0
    }
  }
  return { labels: outLabels, dims: outLabels.map(dimOf), data }
}

/**
 * Contract a whole network to a number (greedy: the pair with the smallest joint index space first).
 * Throws EngineInputError naming an index left free.
 */
export function contractAll(F: PrimeField, tensors: Tensor[]): number {
  const ts = tensors.slice()
  if (ts.length === 0) return 1 // no index at all: a product of scalars
  while (ts.length > 1) {
    let best: [number, number] = [0, 1]
    let bestCost = Infinity
    for (let i = 0; i < ts.length; i++) {
      for (let j = i + 1; j < ts.length; j++) {
        if (!ts[i]!.labels.some((l) => ts[j]!.labels.includes(l)) && ts[i]!.labels.length > 0 && ts[j]!.labels.length > 0) continue
        const cost = jointSize(ts[i]!, ts[j]!)
        if (cost < bestCost) {
          bestCost = cost
          best = [i, j]
        }
      }
    }
    const [i, j] = best
    const c = contractPair(F, ts[i]!, ts[j]!)
    ts.splice(j, 1)
    ts.splice(i, 1, c)
  }
  const last = ts[0]!
  if (last.labels.length > 0) throw new EngineInputError('readOperator', `The index ${last.labels.map((l) => l.split('#')[0]).join(', ')} is not contracted; every index must appear twice`)
  return last.data[0]!
}

function jointSize(a: Tensor, b: Tensor): number {
  let s = 1
  a.labels.forEach((l, i) => {
    s *= a.dims[i]!
  })
  b.labels.forEach((l, i) => {
    if (!a.labels.includes(l)) s *= b.dims[i]!
  })
  return s
}
