/**
 * SU(N) invariant contractions for legs in the fundamental (upper index), antifundamental
 * (lower index), adjoint (traceless X^i_j: one upper, one lower) or singlet. By the first
 * fundamental theorem of invariant theory for SL(N) every invariant is a combination of
 * products of δ^i_j and of ε tensors; a product ε_{…}ε^{…} reduces to δ's, so one kind of
 * ε suffices. Relations (tracelessness, Schouten-like identities, f/d relations) are left
 * to the numerical rank.
 */
import { EngineInputError } from '../errors'
import type { PrimeField } from '../finite/primeField'
import type { SuKind } from '../theory/model'
import { evaluateSuChains } from './suFastPath'

/** A slot is one SU(N) index of one leg. */
export interface Slot {
  leg: number
  upper: boolean
}

export interface SuStructure {
  group: string
  n: number
  /** δ contractions: [upper slot, lower slot] (indices into `slots`). */
  deltas: [number, number][]
  /** ε tensors, each contracting N slots of the same kind (upper slots for ε_{…}). */
  eps: number[][]
  slots: Slot[]
}

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
 * one adjoint leg are dropped).
 * @example suStructures('SU3', 3, ['adj','adj','adj']).length // 2: tr(X1X2X3), tr(X1X3X2)
 * Method: first fundamental theorem for SL(N) (Weyl, The Classical Groups, 1939, ch. II).
 */
export function suStructures(group: string, n: number, kinds: SuKind[]): SuStructure[] {
  const slots = suSlots(kinds)
  const ups = slots.map((s, i) => (s.upper ? i : -1)).filter((i) => i >= 0)
  const lows = slots.map((s, i) => (s.upper ? -1 : i)).filter((i) => i >= 0)
  const diff = ups.length - lows.length
  if (diff % n !== 0) return []
  const [many, few] = diff >= 0 ? [ups, lows] : [lows, ups]
  const m = Math.abs(diff) / n
  if (many.length > 12) throw new EngineInputError('suStructures', `A class with ${many.length} ${group} indices of one kind is beyond what explicit bases support (at most 12); lower the maximum dimension`)
  const out: SuStructure[] = []
  for (const chosen of combinations(many, m * n)) {
    const rest = many.filter((x) => !chosen.includes(x))
    for (const eps of blockPartitions(chosen, n)) {
      for (const perm of permutations(rest)) {
        const deltas = perm.map((r, i) => (diff >= 0 ? [r, few[i]!] : [few[i]!, r]) as [number, number])
        if (deltas.some(([u, l]) => slots[u]!.leg === slots[l]!.leg)) continue
        out.push({ group, n, deltas, eps, slots })
      }
    }
  }
  return out
}

/** Random wave-function of one leg for one SU(N): vector (fund/anti) or traceless matrix (adj). */
export type SuWave = number[] | number[][] | null

/**
 * Draw a random wave-function mod p for a leg of the given kind.
 * @example randomSuWave(F, 2, "adj", draw) // 2×2 matrix with zero trace
 */
export function randomSuWave(F: PrimeField, n: number, kind: SuKind, draw: () => number): SuWave {
  if (kind === 'singlet') return null
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
    if (e === s.eps.length) { leaf(sign); return }
    for (const { perm, sign: sg } of lc) {
      s.eps[e]!.forEach((slot, i) => { idx[slot] = perm[i]! })
      recEps(e + 1, sign * sg)
    }
  }
  const recDelta = (d: number): void => {
    if (d === s.deltas.length) { recEps(0, 1); return }
    const [u, l] = s.deltas[d]!
    for (let i = 0; i < n; i++) { idx[u] = i; idx[l] = i; recDelta(d + 1) }
  }
  recDelta(0)
  return total
}
