/**
 * Lorentz part of the Goldstone-frame Hilbert series for one cycle type: the coefficients of
 * q^0..q^K of
 *   untwisted:  ∫_{SO(4)} dμ  (1/P)            Π_i χ_{t_i}(g^{c_i})
 *   twisted:    ∫_{O(4)⁻} dμ  det(1 − qT)      Π_i χ_{t_i}(T^{c_i})
 * where a cycle of length c of the cycle-index sum raises the letter's group element to the
 * c-th power (Adams operation) and q to q^c, and 1/P = det(1 − q g) removes total derivatives.
 * On O(4)⁻ every element is conjugate to T = σ(g, 1) (σ exchanging the two SU(2) factors,
 * g ∈ SU(2) with eigenvalues z^{±1}); T² = (g, g), so an even power T^{2m} is the ordinary
 * element (g^m, g^m) and an odd power is conjugate to σ(g^{2m+1}, 1). The map
 * (a, b) ↦ ba carries the Haar measure of SO(4) to that of SU(2), so the coset integral is
 * CT_z[(1 − z²) f(z)] (Weyl's formula for SU(2), Fulton & Harris §26.2).
 * Reference: Henning, Lu, Melia, Murayama, JHEP 10 (2017) 199, sect. 5 (parity as the second
 * component of O(4)).
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import { TOWER_ORDER, towerCharacter, twistedTowerCharacter, type TowerKind } from './towers'
// 1/P, the momentum factor of the Lorentz integral: the same expansion as the relativistic counting's.
import { MOMENTUM_TERMS } from '../counting/lorentz'

/** One factor of the integrand: a tower raised as a cycle of length `cycle`. */
export interface TowerCycle {
  kind: TowerKind
  cycle: number
}

const LIMIT = 2 ** 52

function checkFactors(fn: string, factors: readonly TowerCycle[], K: number): void {
  if (!Number.isInteger(K) || K < 0 || K > 24) throw new EngineInputError(fn, `the highest chiral order must be 0..24, got ${K}`)
  for (const f of factors) {
    if (!(f.kind in TOWER_ORDER) || !Number.isInteger(f.cycle) || f.cycle < 1) throw new EngineInputError(fn, `bad factor ${JSON.stringify(f)}`)
  }
}

/** Sum of the lowest chiral orders of the factors (no operator of the class below it). */
export function lowestOrder(factors: readonly TowerCycle[]): number {
  return factors.reduce((s, f) => s + f.cycle * TOWER_ORDER[f.kind], 0)
}

/** Sparse list of the non-zero cells (index, value) of a dense array. */
function nonZero(data: Float64Array): [number[], number[]] {
  const idx: number[] = []
  const val: number[] = []
  for (let i = 0; i < data.length; i++)
    if (data[i] !== 0) {
      idx.push(i)
      val.push(data[i]!)
    }
  return [idx, val]
}

function checkRange(fn: string, data: Float64Array): void {
  for (let i = 0; i < data.length; i++) {
    const v = data[i]!
    if (v > LIMIT || v < -LIMIT) throw new EngineConsistencyError(fn, `multiplicity ${v} beyond 2^52: exactness lost`)
  }
}

/**
 * Untwisted SO(4) integral with 1/P, coefficients of q^0..q^K.
 * @example lorentzSeries([{kind:'goldstone',cycle:1},{kind:'goldstone',cycle:1}], 2) // [0, 0, 1]: u_μ u^μ (ordered pair; the class average happens outside)
 * Method: dense weight arrays multiplied factor by factor (largest spins first); cells that can no
 * longer reach the weights the Haar measure reads, or the order budget, are dropped.
 */
export function lorentzSeries(factors: readonly TowerCycle[], K: number): number[] {
  checkFactors('lorentzSeries', factors, K)
  const W = K + 2
  const side = 2 * W + 1
  const plane = side * side
  let acc = new Float64Array((K + 1) * plane)
  acc[W * side + W] = 1
  const order = [...factors].sort((a, b) => b.cycle - a.cycle || a.kind.localeCompare(b.kind))
  let restMin = lowestOrder(order)
  for (const f of order) {
    restMin -= f.cycle * TOWER_ORDER[f.kind]
    const terms = towerCharacter(f.kind, Math.floor(K / f.cycle))
    const out = new Float64Array(acc.length)
    const [idx, val] = nonZero(acc)
    for (let n = 0; n < idx.length; n++) {
      const i = idx[n]!
      const d0 = Math.floor(i / plane)
      const ml0 = Math.floor((i % plane) / side) - W
      const mr0 = (i % side) - W
      const v = val[n]!
      for (const t of terms) {
        const d = d0 + f.cycle * t.d
        if (d + restMin > K) continue
        const reach = K - d + 2
        const ml = ml0 + f.cycle * t.ml
        const mr = mr0 + f.cycle * t.mr
        if (ml > reach || ml < -reach || mr > reach || mr < -reach) continue
        out[d * plane + (ml + W) * side + mr + W]! += v * t.c
      }
    }
    checkRange('lorentzSeries', out)
    acc = out
  }
  const get = (d: number, ml: number, mr: number) => (d < 0 || Math.abs(ml) > W || Math.abs(mr) > W ? 0 : acc[d * plane + (ml + W) * side + mr + W]!)
  const result: number[] = []
  for (let d = 0; d <= K; d++) {
    let s = 0
    for (const [hl, hr, hs] of [
      [0, 0, 1],
      [2, 0, -1],
      [0, 2, -1],
      [2, 2, 1],
    ] as const) {
      for (const [deg, ml, mr, sign] of MOMENTUM_TERMS) s += hs * sign * get(d - deg, hl - ml, hr - mr)
    }
    if (!Number.isSafeInteger(s)) throw new EngineConsistencyError('lorentzSeries', `unsafe coefficient ${s} at q^${d}`)
    result.push(s)
  }
  return result
}

/** det(1 − qT) = 1 − q(z + 1/z) + q³(z + 1/z) − q⁴: terms [degree, m, coefficient]. */
const TWISTED_MOMENTUM: readonly (readonly [number, number, number])[] = [
  [0, 0, 1],
  [1, 1, -1],
  [1, -1, -1],
  [3, 1, 1],
  [3, -1, 1],
  [4, 0, -1],
]

function twistedFactorTerms(f: TowerCycle, K: number): { d: number; m: number; c: number }[] {
  const c = f.cycle
  const budget = Math.floor(K / c)
  if (c % 2 === 1) return twistedTowerCharacter(f.kind, budget).map((t) => ({ d: c * t.d, m: c * t.m, c: t.c }))
  return towerCharacter(f.kind, budget).map((t) => ({ d: c * t.d, m: (c / 2) * (t.ml + t.mr), c: t.c }))
}

/**
 * Integral over the parity-odd component O(4)⁻ with det(1 − qT), coefficients of q^0..q^K: the
 * trace of spatial reflection on the Lorentz-invariant operators (scalars count +1, pseudoscalars −1).
 * @example twistedLorentzSeries([{kind:'goldstone',cycle:1},{kind:'goldstone',cycle:1}], 2) // [0, 0, 1]
 */
export function twistedLorentzSeries(factors: readonly TowerCycle[], K: number): number[] {
  checkFactors('twistedLorentzSeries', factors, K)
  const W = 2 * K + 4
  const side = 2 * W + 1
  let acc = new Float64Array((K + 1) * side)
  acc[W] = 1
  let restMin = lowestOrder(factors)
  for (const f of factors) {
    restMin -= f.cycle * TOWER_ORDER[f.kind]
    const terms = twistedFactorTerms(f, K)
    const out = new Float64Array(acc.length)
    const [idx, val] = nonZero(acc)
    for (let n = 0; n < idx.length; n++) {
      const d0 = Math.floor(idx[n]! / side)
      const m0 = (idx[n]! % side) - W
      for (const t of terms) {
        const d = d0 + t.d
        const m = m0 + t.m
        if (d + restMin > K || m > W || m < -W) continue
        out[d * side + m + W]! += val[n]! * t.c
      }
    }
    checkRange('twistedLorentzSeries', out)
    acc = out
  }
  const get = (d: number, m: number) => (d < 0 || Math.abs(m) > W ? 0 : acc[d * side + m + W]!)
  const result: number[] = []
  for (let d = 0; d <= K; d++) {
    let s = 0
    for (const [hm, hs] of [
      [0, 1],
      [2, -1],
    ] as const) {
      for (const [deg, m, c] of TWISTED_MOMENTUM) s += hs * c * get(d - deg, hm - m)
    }
    if (!Number.isSafeInteger(s)) throw new EngineConsistencyError('twistedLorentzSeries', `unsafe coefficient ${s} at q^${d}`)
    result.push(s)
  }
  return result
}
