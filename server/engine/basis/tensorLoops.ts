/**
 * Value mod p of a δ/ε contraction of SU(N) tensors by explicit index loops, compiled once per
 * contraction: every δ is a loop over N values, every ε a loop over the N! permutations with
 * their signs; each loop step adds a fixed offset into the tensors of the legs it touches.
 * Fast for the small contractions of one class; larger ones go to the tensor-network
 * evaluation (tensorContraction.ts). Reference: common practice (index sums).
 */
import type { PrimeField } from '../finite/primeField'
import type { SuStructure } from './suStructure'

interface Choice {
  sign: number
  /** [leg, offset increment] pairs. */
  steps: [number, number][]
}

export interface LoopPlan {
  loops: Choice[][]
  legs: number[]
  leaves: number
}

const plans = new WeakMap<SuStructure, LoopPlan>()

function signedPermutations(n: number): { perm: number[]; sign: number }[] {
  if (n === 1) return [{ perm: [0], sign: 1 }]
  const out: { perm: number[]; sign: number }[] = []
  for (const { perm, sign } of signedPermutations(n - 1)) {
    for (let pos = n - 1; pos >= 0; pos--) {
      out.push({ perm: [...perm.slice(0, pos), n - 1, ...perm.slice(pos)], sign: (n - 1 - pos) % 2 === 0 ? sign : -sign })
    }
  }
  return out
}

/** Offset stride of each slot in its leg's tensor (axis a of a leg has stride N^a). */
function slotStrides(s: SuStructure): number[] {
  const seen = new Map<number, number>()
  return s.slots.map((sl) => {
    const a = seen.get(sl.leg) ?? 0
    seen.set(sl.leg, a + 1)
    return s.n ** a
  })
}

/** The loop plan of a contraction (cached per contraction object). */
export function loopPlan(s: SuStructure): LoopPlan {
  const cached = plans.get(s)
  if (cached) return cached
  const n = s.n
  const stride = slotStrides(s)
  const loops: Choice[][] = s.deltas.map(([u, l]) =>
    Array.from({ length: n }, (_, i) => ({
      sign: 1,
      steps: [
        [s.slots[u]!.leg, i * stride[u]!],
        [s.slots[l]!.leg, i * stride[l]!],
      ] as [number, number][],
    })),
  )
  const perms = s.eps.length ? signedPermutations(n) : []
  for (const block of s.eps) {
    loops.push(perms.map(({ perm, sign }) => ({ sign, steps: block.map((slot, k) => [s.slots[slot]!.leg, perm[k]! * stride[slot]!] as [number, number]) })))
  }
  const legs = [...new Set(s.slots.map((sl) => sl.leg))]
  const leaves = loops.reduce((x, c) => x * c.length, 1)
  const plan = { loops, legs, leaves }
  plans.set(s, plan)
  return plan
}

/**
 * Σ over the loops of sign × Π_legs data[leg][offset]; data[leg] is the leg's flattened tensor.
 * @example runLoops(F, loopPlan(δ(fund 0, anti 1)), [u, v]) // Σ_i u^i v_i
 */
export function runLoops(F: PrimeField, plan: LoopPlan, data: (number[] | undefined)[]): number {
  const offset = new Array<number>(data.length).fill(0)
  let total = 0
  const rec = (k: number, sign: number): void => {
    if (k === plan.loops.length) {
      let v = sign === 1 ? 1 : F.p - 1
      for (const leg of plan.legs) {
        v = F.mul(v, data[leg]![offset[leg]!]!)
        if (v === 0) return
      }
      total = F.add(total, v)
      return
    }
    for (const c of plan.loops[k]!) {
      for (const [leg, inc] of c.steps) offset[leg]! += inc
      rec(k + 1, c.sign === 1 ? sign : -sign)
      for (const [leg, inc] of c.steps) offset[leg]! -= inc
    }
  }
  rec(0, 1)
  return total
}
