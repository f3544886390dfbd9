/**
 * SU(N) invariant contractions for legs in the fundamental (upper index), antifundamental
 * (lower index), adjoint (traceless X^i_j: one upper, one lower) or singlet. By the first
 * fundamental theorem of invariant theory for SL(N) every invariant is a combination of
 * products of δ^i_j and of ε tensors; a product ε_{…}ε^{…} reduces to δ's, so one kind of
 * ε suffices. Relations (tracelessness, Schouten-like identities, f/d relations) are left
 * to the numerical rank.
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import type { PrimeField } from '../finite/primeField'
import type { SuKind } from '../theory/model'
import { evaluateSuChains } from './suFastPath'
import { type TensorShape, boxColumns, boxes } from './tensorShape'
import { randomTensorWave } from './tensorWaves'
import { evaluateSuTensor } from './tensorContraction'

import type { Slot, SuStructure, SuWave } from './suStructure'

export type { Slot, SuStructure, SuWave }

/**
 * Slots of the legs for one SU(N) group, in leg order (upper before lower for adjoints).
 * @example suSlots(["fund","adj"]) // [{leg:0,upper:true},{leg:1,upper:true},{leg:1,upper:false}]
 */
export function suSlots(kinds: SuKind[]): Slot[] {
  const slots: Slot[] = []
  kinds.forEach((k, leg) => {
    if (k === 'fund' || k === 'adj') slots.push({ leg, upper: true })
    if (k === 'anti' || k === 'adj') slots.push({ leg, upper: false })
  })
  return slots
}

/**
 * Slots of legs written as tensors [α; β]: the upper boxes then the lower boxes of each leg.
 * For the fundamental, antifundamental and adjoint this is suSlots' order (box 0).
 * @example shapeSlots([{ upper: [2], lower: [1] }]) // three slots of leg 0: upper 0, upper 1, lower 0
 */
export function shapeSlots(shapes: TensorShape[]): Slot[] {
  const slots: Slot[] = []
  shapes.forEach((sh, leg) => {
    for (let b = 0; b < boxes(sh.upper); b++) slots.push({ leg, upper: true, box: b })
    for (let b = 0; b < boxes(sh.lower); b++) slots.push({ leg, upper: false, box: b })
  })
  return slots
}

function permutations<T>(xs: T[]): T[][] {
  if (xs.length <= 1) return [xs.slice()]
  const out: T[][] = []
  xs.forEach((x, i) => {
    for (const rest of permutations([...xs.slice(0, i), ...xs.slice(i + 1)])) out.push([x, ...rest])
  })
  return out
}

/** Partitions of `items` into blocks of size b (canonical: each block led by its smallest). */
function blockPartitions(items: number[], b: number): number[][][] {
  if (items.length === 0) return [[]]
  const [first, ...rest] = items as [number, ...number[]]
  const out: number[][][] = []
  for (const comb of combinations(rest, b - 1)) {
    const left = rest.filter((x) => !comb.includes(x))
    for (const p of blockPartitions(left, b)) out.push([[first, ...comb], ...p])
  }
  return out
}

function combinations(xs: number[], r: number): number[][] {
  if (r === 0) return [[]]
  if (xs.length < r) return []
  const [h, ...t] = xs as [number, ...number[]]
  return [...combinations(t, r - 1).map((c) => [h, ...c]), ...combinations(t, r)]
}

/**
 * All δ/ε contractions of the given legs' SU(N) indices (trace-zero self-contractions of
 * one adjoint leg are dropped). Legs of kind 'other' (tensors) need their shapes (tensorShape.ts).
 * @example suStructures('SU3', 3, ['adj','adj','adj']).length // 2: tr(X1X2X3), tr(X1X3X2)
 * Method: first fundamental theorem for SL(N) (Weyl, The Classical Groups, 1939, ch. II).
 */
export function suStructures(group: string, n: number, kinds: SuKind[], shapes?: TensorShape[]): SuStructure[] {
  const tensor = kinds.includes('other')
  if (tensor && !shapes) throw new EngineConsistencyError('suStructures', `${group}: tensor legs need their shapes`)
  const slots = tensor ? shapeSlots(shapes!) : suSlots(kinds)
  const ups = slots.map((s, i) => (s.upper ? i : -1)).filter((i) => i >= 0)
  const lows = slots.map((s, i) => (s.upper ? -1 : i)).filter((i) => i >= 0)
  const diff = ups.length - lows.length
  if (diff % n !== 0) return []
  const [many, few] = diff >= 0 ? [ups, lows] : [lows, ups]
  const m = Math.abs(diff) / n
  if (many.length > 12)
    throw new EngineInputError('suStructures', `A class with ${many.length} ${group} indices of one kind is beyond what explicit bases support (at most 12); lower the maximum dimension`)
  const out: SuStructure[] = []
  const seen = new Set<string>()
  const slotClass = tensor ? columnClasses(slots, shapes!) : []
  for (const chosen of combinations(many, m * n)) {
    const rest = many.filter((x) => !chosen.includes(x))
    for (const eps of blockPartitions(chosen, n)) {
      for (const perm of permutations(rest)) {
        const deltas = perm.map((r, i) => (diff >= 0 ? [r, few[i]!] : [few[i]!, r]) as [number, number])
        if (deltas.some(([u, l]) => slots[u]!.leg === slots[l]!.leg)) continue
        if (tensor) {
          const key = structureKey(slotClass, deltas, eps)
          if (seen.has(key)) continue
          seen.add(key)
        }
        out.push({ group, n, deltas, eps, slots })
      }
    }
  }
  return out
}

/**
 * Class of each slot: leg, upper/lower and Young column (the indices of one column are
 * antisymmetric); all indices of a one-row shape form one class (they are symmetric).
 */
function columnClasses(slots: Slot[], shapes: TensorShape[]): string[] {
  return slots.map((sl) => {
    const part = sl.upper ? shapes[sl.leg]!.upper : shapes[sl.leg]!.lower
    const column = part.length === 1 ? 0 : boxColumns(part)[sl.box ?? 0]
    return `${sl.leg}${sl.upper ? 'u' : 'l'}${column}`
  })
}

/**
 * Contractions with equal keys differ by permutations of indices within one slot class, so
 * they are equal up to a sign: one of them is kept.
 */
function structureKey(slotClass: string[], deltas: [number, number][], eps: number[][]): string {
  const edges = [
    ...deltas.map(([u, l]) => `d${slotClass[u]}:${slotClass[l]}`),
    ...eps.map(
      (b) =>
        `e${b
          .map((x) => slotClass[x]!)
          .sort()
          .join(':')}`,
    ),
  ]
  return edges.sort().join('|')
}

/**
 * Draw a random wave-function mod p for a leg of the given kind.
 * @example randomSuWave(F, 2, "adj", draw) // 2×2 matrix with zero trace
 */
export function randomSuWave(F: PrimeField, n: number, kind: SuKind, draw: () => number, shape?: TensorShape): SuWave {
  if (kind === 'singlet') return null
  if (kind === 'other') {
    if (!shape) throw new EngineConsistencyError('randomSuWave', 'a tensor leg needs its shape')
    return randomTensorWave(F, n, shape, draw)
  }
  if (kind !== 'adj') return Array.from({ length: n }, draw)
  const x = Array.from({ length: n }, () => Array.from({ length: n }, draw))
  let tr = 0
  for (let i = 0; i < n - 1; i++) tr = F.add(tr, x[i]![i]!)
  x[n - 1]![n - 1] = F.neg(tr)
  return x
}

function levi(n: number): { perm: number[]; sign: number }[] {
  return permutations(Array.from({ length: n }, (_, i) => i)).map((perm) => {
    let sign = 1
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) if (perm[i]! > perm[j]!) sign = -sign
    return { perm, sign }
  })
}
const leviCache = new Map<number, { perm: number[]; sign: number }[]>()

/**
 * Value mod p of a contraction for the given legs' wave-functions (waves[leg]).
 * @example evaluateSu(F, δ^i_j structure of (fund, anti), [[u],[v]]) // Σ_i u^i v_i
 * Method: explicit index sums. Reference: common practice.
 */
export function evaluateSu(F: PrimeField, s: SuStructure, waves: SuWave[]): number {
  if (s.slots.some((sl) => sl.box !== undefined && sl.box > 0) || waves.some((w) => w !== null && !Array.isArray(w))) return evaluateSuTensor(F, s, waves)
  if (s.eps.length === 0) return evaluateSuChains(F, s, waves)
  return evaluateSuBrute(F, s, waves)
}

/**
 * Explicit index sums (used for structures with ε tensors, and as the reference in tests).
 * @example evaluateSuBrute(F, δ(fund, anti), [[1,2,3],[4,5,6]]) // 32
 */
export function evaluateSuBrute(F: PrimeField, s: SuStructure, waves: SuWave[]): number {
  const n = s.n
  if (!leviCache.has(n)) leviCache.set(n, levi(n))
  const lc = leviCache.get(n)!
  const idx = new Array<number>(s.slots.length).fill(0)
  let total = 0
  const leaf = (sign: number): void => {
    let v = sign === 1 ? 1 : F.p - 1
    let si = 0
    while (si < s.slots.length) {
      const w = waves[s.slots[si]!.leg]!
      if (!Array.isArray(w)) throw new EngineConsistencyError('evaluateSuBrute', 'tensor legs are evaluated by evaluateSuTensor')
      if (Array.isArray(w[0])) {
        v = F.mul(v, (w as number[][])[idx[si]!]![idx[si + 1]!]!)
        si += 2
      } else {
        v = F.mul(v, (w as number[])[idx[si]!]!)
        si += 1
      }
      if (v === 0) return
    }
    total = F.add(total, v)
  }
  const recEps = (e: number, sign: number): void => {
    if (e === s.eps.length) {
      leaf(sign)
      return
    }
    for (const { perm, sign: sg } of lc) {
      s.eps[e]!.forEach((slot, i) => {
        idx[slot] = perm[i]!
      })
      recEps(e + 1, sign * sg)
    }
  }
  const recDelta = (d: number): void => {
    if (d === s.deltas.length) {
      recEps(0, 1)
      return
    }
    const [u, l] = s.deltas[d]!
    for (let i = 0; i < n; i++) {
      idx[u] = i
      idx[l] = i
      recDelta(d + 1)
    }
  }
  recDelta(0)
  return total
}
