/**
 * Operator classes: a field content (multiplicity of every species) plus a number of
 * covariant derivatives, written as class keys by theory/classKey.ts ("D^2 H^2 H*^2").
 */
import { EngineInputError } from '../errors'
import type { TheoryModel } from '../theory/model'
import { classKeyOfCounts } from '../theory/classKey'

export interface OperatorClass {
  /** Multiplicity per species (TheoryModel.species order). */
  counts: number[]
  derivatives: number
  dimension: number
  key: string
}

/** A field content without derivatives, with the derivative numbers allowed up to maxDim. */
export interface FieldContent {
  counts: number[]
  /** Twice the mass dimension of the fields alone. */
  fieldDim2: number
  /** Derivative numbers k giving a dimension in [minDim, maxDim] and passing the Lorentz parity rule. */
  derivatives: number[]
}

/** Work limits of the enumeration (a run beyond them would not finish in reasonable time). */
export const MAX_ENUMERATION_NODES = 30_000_000
export const MAX_FIELD_CONTENTS = 400_000

/**
 * All field contents (at least one field) whose operators can reach a mass dimension in
 * [minDim, maxDim], that pass the necessary selection rules for a singlet: zero total U(1)
 * charges, Z_n charges = 0 mod n, SU(n) n-ality = 0 mod n, and Lorentz centre parity
 * (#(1/2,0) fermions + k and #(0,1/2) fermions + k even, k = number of derivatives).
 * @example enumerateFieldContents(realScalarModel, 5, 6).map(c => [c.counts[0], c.derivatives]) // [[1,[4]],[2,[4]],[3,[2]],[4,[2]],[5,[0]],[6,[0]]]
 * Method: depth-first over species with a dimension budget; selection rules are
 * common practice (the centre of each group must act trivially on a singlet).
 */
export function enumerateFieldContents(model: TheoryModel, minDim: number, maxDim: number): FieldContent[] {
  if (!Number.isInteger(minDim) || !Number.isInteger(maxDim) || minDim < 1 || maxDim > 30 || minDim > maxDim) {
    throw new EngineInputError('enumerateFieldContents', `The dimensions must be whole numbers with 1 ≤ lowest ≤ highest ≤ 30, not ${minDim} to ${maxDim}`)
  }
  const S = model.species.length
  const budget = 2 * maxDim
  const charges = selectionCharges(model)
  const G = charges.moduli.length
  const bounds = chargeBounds(model, charges)
  const out: FieldContent[] = []
  const counts = new Array<number>(S).fill(0)
  const sums = new Array<number>(G).fill(0)
  let left = 0
  let right = 0
  let visited = 0
  const rec = (s: number, used: number): void => {
    if (++visited > MAX_ENUMERATION_NODES || out.length > MAX_FIELD_CONTENTS) {
      throw new EngineInputError(
        'enumerateFieldContents',
        `Theory "${model.name}" has too many field contents up to dimension ${maxDim} (the search stopped after ${visited} steps and ${out.length} contents); lower the maximum dimension`,
      )
    }
    if (s === S) {
      if (used === 0 || (left - right) % 2 !== 0) return
      for (let g = 0; g < G; g++) {
        const m = charges.moduli[g]!
        if (m === 0 ? sums[g] !== 0 : sums[g]! % m !== 0) return
      }
      const derivatives = allowedDerivatives(left, used, minDim, maxDim)
      if (derivatives.length > 0) out.push({ counts: counts.slice(), fieldDim2: used, derivatives })
      return
    }
    if (!chargesReachable(sums, bounds, s, budget - used)) return
    const sp = model.species[s]!
    const q = charges.perSpecies[s]!
    const isL = sp.lorentz === 'L' ? 1 : 0
    const isR = sp.lorentz === 'R' ? 1 : 0
    let n = 0
    for (; used + n * sp.dim2 <= budget; n++) {
      counts[s] = n
      rec(s + 1, used + n * sp.dim2)
      for (let g = 0; g < G; g++) sums[g]! += q[g]!
      left += isL
      right += isR
    }
    for (let g = 0; g < G; g++) sums[g]! -= n * q[g]!
    left -= n * isL
    right -= n * isR
    counts[s] = 0
  }
  rec(0, 0)
  return out
}

/**
 * Integer "charges" whose totals must vanish modulo `moduli` (0 = exactly): U(1) charges
 * scaled to integers, Z_n charges, SU(n) n-alities (Σ_i i a_i mod n).
 */
function selectionCharges(model: TheoryModel): { moduli: number[]; perSpecies: number[][] } {
  const u1 = integerCharges(model)
  const moduli = [...model.u1.map(() => 0), ...model.zn.map((g) => g.n), ...model.su.map((g) => g.n)]
  const perSpecies = model.species.map((sp, i) => [...u1.map((q) => q[i]!), ...model.zn.map((g) => sp.zn[g.name]!), ...model.su.map((g) => sp.reps[g.name]!.reduce((t, x, j) => t + x * (j + 1), 0))])
  return { moduli, perSpecies }
}

/** A charge per unit of doubled dimension, kept as an exact fraction q/d (d > 0). */
interface Ratio {
  q: number
  d: number
}

/** For U(1) totals: per suffix of species, the extreme charge per unit of doubled dimension. */
function chargeBounds(model: TheoryModel, charges: { perSpecies: number[][] }): { lo: Ratio[][]; hi: Ratio[][] } {
  const S = model.species.length
  const U = model.u1.length
  const zero: Ratio = { q: 0, d: 1 }
  const lo: Ratio[][] = [] // lo[s][g]: smallest ratio among species s.. (and 0: adding nothing)
  const hi: Ratio[][] = []
  lo[S] = new Array<Ratio>(U).fill(zero)
  hi[S] = new Array<Ratio>(U).fill(zero)
  for (let s = S - 1; s >= 0; s--) {
    lo[s] = []
    hi[s] = []
    for (let g = 0; g < U; g++) {
      const r = { q: charges.perSpecies[s]![g]!, d: model.species[s]!.dim2 }
      lo[s]![g] = r.q * lo[s + 1]![g]!.d < lo[s + 1]![g]!.q * r.d ? r : lo[s + 1]![g]!
      hi[s]![g] = r.q * hi[s + 1]![g]!.d > hi[s + 1]![g]!.q * r.d ? r : hi[s + 1]![g]!
    }
  }
  return { lo, hi }
}

/**
 * Can species s.. with this doubled-dimension budget bring every U(1) total back to 0?
 * Exact integer test: q + budget·(q_r/d_r) has the sign of q·d_r + budget·q_r.
 */
function chargesReachable(sums: number[], bounds: { lo: Ratio[][]; hi: Ratio[][] }, s: number, budget: number): boolean {
  const lo = bounds.lo[s]!
  const hi = bounds.hi[s]!
  for (let g = 0; g < lo.length; g++) {
    const q = sums[g]!
    if (q * hi[g]!.d + budget * hi[g]!.q < 0 || q * lo[g]!.d + budget * lo[g]!.q > 0) return false
  }
  return true
}

/**
 * All classes of one mass dimension passing the selection rules (their count may still be 0).
 * @example enumerateClasses(smeftModel, 6).some(c => c.key === 'H^3 H*^3') // true
 */
export function enumerateClasses(model: TheoryModel, dimension: number): OperatorClass[] {
  if (!Number.isInteger(dimension) || dimension < 1 || dimension > 30) {
    throw new EngineInputError('enumerateClasses', `The dimension must be a whole number from 1 to 30, not ${dimension}`)
  }
  const out: OperatorClass[] = []
  for (const fc of enumerateFieldContents(model, dimension, dimension)) {
    for (const k of fc.derivatives) {
      out.push({ counts: fc.counts, derivatives: k, dimension, key: classKeyOfCounts(model, fc.counts, k) })
    }
  }
  return out
}

function allowedDerivatives(left: number, used: number, minDim: number, maxDim: number): number[] {
  const out: number[] = []
  for (let k = left % 2; used + 2 * k <= 2 * maxDim; k += 2) {
    if (used + 2 * k >= 2 * minDim) out.push(k)
  }
  return out
}

/** U(1) charges scaled by the lcm of their denominators per group, so sums stay integer. */
function integerCharges(model: TheoryModel): number[][] {
  return model.u1.map(({ name }) => {
    let l = 1n
    for (const s of model.species) l = lcm(l, s.u1[name]!.den)
    return model.species.map((s) => {
      const v = (s.u1[name]!.num * l) / s.u1[name]!.den
      if (v > 1_000_000_000n || v < -1_000_000_000n) {
        throw new EngineInputError('enumerateFieldContents', `The ${name} charges have too large a common denominator (${l}); write them with smaller denominators`)
      }
      return Number(v)
    })
  })
}

function lcm(a: bigint, b: bigint): bigint {
  let x = a
  let y = b
  while (y !== 0n) [x, y] = [y, x % y]
  return (a / x) * b
}
