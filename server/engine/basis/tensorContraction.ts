/**
 * Value mod p of a δ/ε contraction of SU(N) tensors (legs of any shape), as a tensor network:
 * each δ is one summed index shared by an upper and a lower slot, each ε an antisymmetric
 * factor on its slots' indices, each leg its wave-function tensor; indices are summed out one
 * by one, each time the one whose merged factor is smallest (variable elimination).
 * Reference: common practice (tensor-network contraction by greedy elimination).
 */
import { EngineConsistencyError } from '../errors'
import type { PrimeField } from '../finite/primeField'
import type { SuStructure, SuWave } from './suStructure'
import type { TensorWave } from './tensorWaves'
import { loopPlan, runLoops } from './tensorLoops'

interface Factor {
  vars: number[]
  data: number[]
}

/** Contractions with at most this many index-loop terms are summed directly (tensorLoops.ts). */
const MAX_LOOP_LEAVES = 20_000

/** Largest dense factor (entries) formed while contracting. */
const MAX_FACTOR = 4_000_000

/**
 * Index loops of any contraction that needs a larger factor (an ε of SU(8) alone has 8^8
 * entries): classCandidates keeps every class with tensor legs within 1e7 loop terms.
 */
const MAX_FALLBACK_LEAVES = 10_000_000

/** Thrown inside the network when a factor would exceed MAX_FACTOR; caught below. */
class FactorTooLarge extends Error {}

function asTensor(w: SuWave, n: number): TensorWave | null {
  if (w === null) return null
  if (!Array.isArray(w)) return w
  if (Array.isArray(w[0])) {
    const m = w as number[][]
    const data = new Array<number>(n * n)
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) data[i + j * n] = m[i]![j]!
    return { kind: 'tensor', axes: 2, data }
  }
  return { kind: 'tensor', axes: 1, data: (w as number[]).slice() }
}

function epsilonFactor(F: PrimeField, n: number, vars: number[]): Factor {
  const size = n ** n
  if (size > MAX_FACTOR) throw new FactorTooLarge()
  const data = new Array<number>(size).fill(0)
  const perm = Array.from({ length: n }, (_, i) => i)
  const rec = (k: number, sign: number): void => {
    if (k === n) {
      let off = 0
      for (let a = n - 1; a >= 0; a--) off = off * n + perm[a]!
      data[off] = sign === 1 ? 1 : F.neg(1)
      return
    }
    for (let i = k; i < n; i++) {
      ;[perm[k], perm[i]] = [perm[i]!, perm[k]!]
      rec(k + 1, i === k ? sign : -sign)
      ;[perm[k], perm[i]] = [perm[i]!, perm[k]!]
    }
  }
  rec(0, 1)
  return { vars, data }
}

/** Product of factors, summed over `v`. */
function eliminate(F: PrimeField, n: number, factors: Factor[], v: number): Factor {
  const vars = [...new Set(factors.flatMap((f) => f.vars))].filter((x) => x !== v)
  const all = [...vars, v]
  if (n ** all.length > MAX_FACTOR) throw new FactorTooLarge()
  const pos = new Map(all.map((x, i) => [x, i]))
  const strides = factors.map((f) => {
    const s = new Array<number>(all.length).fill(0)
    let m = 1
    for (const x of f.vars) {
      s[pos.get(x)!] = m
      m *= n
    }
    return s
  })
  const out = new Array<number>(n ** vars.length).fill(0)
  const idx = new Array<number>(all.length).fill(0)
  const total = n ** all.length
  for (let t = 0; t < total; t++) {
    let x = t
    for (let k = 0; k < all.length; k++) {
      idx[k] = x % n
      x = Math.floor(x / n)
    }
    let prod = 1
    for (let f = 0; f < factors.length && prod !== 0; f++) {
      let off = 0
      const s = strides[f]!
      for (let k = 0; k < all.length; k++) off += s[k]! * idx[k]!
      prod = F.mul(prod, factors[f]!.data[off]!)
    }
    if (prod !== 0) {
      const o = t % out.length
      out[o] = F.add(out[o]!, prod)
    }
  }
  return { vars, data: out }
}

/**
 * Value of a contraction for waves[leg] (vectors, matrices or TensorWave).
 * @example evaluateSuTensor(F, structure of (quartet, quartet*), waves) // Σ T^{ij}_k T*_{ij}^k
 */
export function evaluateSuTensor(F: PrimeField, s: SuStructure, waves: SuWave[]): number {
  const plan = loopPlan(s)
  const data = (): (number[] | undefined)[] => waves.map((w) => asTensor(w, s.n)?.data)
  if (plan.leaves <= MAX_LOOP_LEAVES) return runLoops(F, plan, data())
  try {
    return evaluateNetwork(F, s, waves)
  } catch (e) {
    if (!(e instanceof FactorTooLarge)) throw e
    if (plan.leaves > MAX_FALLBACK_LEAVES) throw new EngineConsistencyError('evaluateSuTensor', `an SU(${s.n}) contraction of ${plan.leaves} loop terms passed the class budget`)
    return runLoops(F, plan, data())
  }
}

/** The contraction by greedy variable elimination; FactorTooLarge when a factor would be too big. */
function evaluateNetwork(F: PrimeField, s: SuStructure, waves: SuWave[]): number {
  const n = s.n
  const slotVar = new Array<number>(s.slots.length).fill(-1)
  s.deltas.forEach(([u, l], k) => {
    slotVar[u] = k
    slotVar[l] = k
  })
  let next = s.deltas.length
  s.eps.forEach((block) =>
    block.forEach((slot) => {
      slotVar[slot] = next++
    }),
  )
  let factors: Factor[] = s.eps.map((block) =>
    epsilonFactor(
      F,
      n,
      block.map((slot) => slotVar[slot]!),
    ),
  )
  const legs = [...new Set(s.slots.map((sl) => sl.leg))]
  for (const leg of legs) {
    const t = asTensor(waves[leg] ?? null, n)
    if (!t) throw new EngineConsistencyError('evaluateSuTensor', `leg ${leg} has SU(${n}) indices but no wave-function`)
    const vars = s.slots.map((sl, i) => (sl.leg === leg ? slotVar[i]! : -1)).filter((x) => x >= 0)
    factors.push({ vars, data: t.data })
  }
  for (let v = 0; v < next; v++) {
    // pick the variable whose merged factor is smallest
    let best = -1
    let bestSize = Infinity
    for (let x = 0; x < next; x++) {
      const touching = factors.filter((f) => f.vars.includes(x))
      if (touching.length === 0) continue
      const size = new Set(touching.flatMap((f) => f.vars)).size
      if (size < bestSize) {
        best = x
        bestSize = size
      }
    }
    if (best < 0) break
    const touching = factors.filter((f) => f.vars.includes(best))
    factors = [...factors.filter((f) => !f.vars.includes(best)), eliminate(F, n, touching, best)]
  }
  return factors.reduce((acc, f) => F.mul(acc, f.data[0]!), 1)
}
