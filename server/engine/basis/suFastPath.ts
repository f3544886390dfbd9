/**
 * Fast evaluation of ε-free SU(N) contractions: the δ contractions of fundamental,
 * antifundamental and adjoint (matrix) legs form chains v·X…X·u and closed traces
 * tr(X…X), evaluated by matrix–vector products instead of explicit index sums.
 */
import type { PrimeField } from '../finite/primeField'
import type { SuStructure, SuWave } from './suStructure'

type Step = { kind: 'chain'; start: number; mids: number[]; end: number } | { kind: 'trace'; mids: number[] }

const cache = new WeakMap<SuStructure, Step[]>()

/**
 * Chains and traces of an ε-free structure (legs in contraction order).
 * @example suChains(δ-structure of (fund, adj, anti)) // [{kind:"chain", start:0, mids:[1], end:2}]
 */
export function suChains(s: SuStructure): Step[] {
  const hit = cache.get(s)
  if (hit) return hit
  const lowerOfUpper = new Map<number, number>(s.deltas.map(([u, l]) => [u, l]))
  const upperSlotOfLeg = new Map<number, number>()
  s.slots.forEach((sl, i) => {
    if (sl.upper) upperSlotOfLeg.set(sl.leg, i)
  })
  const isAdj = (leg: number): boolean => s.slots.filter((x) => x.leg === leg).length === 2
  const seen = new Set<number>()
  const steps: Step[] = []
  const follow = (fromUpper: number): { mids: number[]; end: number; closedAt?: number } => {
    const mids: number[] = []
    let u = fromUpper
    for (;;) {
      const leg = s.slots[lowerOfUpper.get(u)!]!.leg
      if (!isAdj(leg)) return { mids, end: leg }
      if (seen.has(leg)) return { mids, end: -1, closedAt: leg }
      seen.add(leg)
      mids.push(leg)
      u = upperSlotOfLeg.get(leg)!
    }
  }
  s.slots.forEach((sl, i) => {
    if (sl.upper && !isAdj(sl.leg)) {
      const r = follow(i)
      steps.push({ kind: 'chain', start: sl.leg, mids: r.mids, end: r.end })
    }
  })
  s.slots.forEach((sl, i) => {
    if (sl.upper && isAdj(sl.leg) && !seen.has(sl.leg)) {
      seen.add(sl.leg)
      const r = follow(i)
      steps.push({ kind: 'trace', mids: [sl.leg, ...r.mids] })
    }
  })
  cache.set(s, steps)
  return steps
}

function matVec(F: PrimeField, x: number[][], v: number[]): number[] {
  return x.map((row) => row.reduce((acc, a, j) => (acc + a * v[j]!) % F.p, 0))
}

/**
 * Value of an ε-free contraction for waves[leg].
 * @example evaluateSuChains(F, δ(fund, anti), [[1,2,3],[4,5,6]]) // 32
 */
export function evaluateSuChains(F: PrimeField, s: SuStructure, waves: SuWave[]): number {
  let total = 1
  for (const st of suChains(s)) {
    let val: number
    if (st.kind === 'chain') {
      let v = waves[st.start] as number[]
      for (const m of st.mids) v = matVec(F, waves[m] as number[][], v)
      const w = waves[st.end] as number[]
      val = v.reduce((acc, a, j) => (acc + a * w[j]!) % F.p, 0)
    } else {
      // tr(X_last … X_first): propagate each basis vector.
      val = 0
      for (let i = 0; i < s.n; i++) {
        let v: number[] = Array.from({ length: s.n }, (_, j) => (j === i ? 1 : 0))
        for (const m of st.mids) v = matVec(F, waves[m] as number[][], v)
        val = F.add(val, v[i]!)
      }
    }
    total = F.mul(total, val)
    if (total === 0) return 0
  }
  return total
}
