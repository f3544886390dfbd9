/**
 * One background task of a Goldstone-frame theory (the worker thread dispatches here by frame):
 * counts to the chosen chiral order, or the explicit basis (SU(N) cosets, up to p⁶).
 */
import type { Theory } from '../../../shared/schemas/theory'
import { EngineInputError } from '../errors'
import { countGoldstone, type GoldstoneCountResult } from './countGoldstone'
import { goldstoneBasis, MAX_EXPLICIT_ORDER, type GoldstoneBasisResult } from './explicit/goldstoneBasis'

export interface GoldstoneTaskInput {
  kind: 'count' | 'basis' | 'fingerprint'
  maxOrder?: number
  priorities?: { keep?: Record<string, string[]> }
}

/**
 * Run the task; the theory must be in the Goldstone frame.
 * @example goldstoneTask(theory, { kind: 'count', maxOrder: 6 }, {}).byOrder.map(o => o.operators) // [2, 12, 117] for N = 3 with sources
 */
export function goldstoneTask(theory: Theory, task: GoldstoneTaskInput, o: { onProgress?: (f: number, label: string) => void, signal?: { aborted: boolean } }): GoldstoneCountResult | GoldstoneBasisResult {
  const g = theory.goldstone
  if (!g) throw new EngineInputError('goldstoneTask', 'a Goldstone-frame theory needs its "goldstone" block')
  if (task.kind === 'fingerprint') {
    throw new EngineInputError('goldstoneTask', 'typed operators are not rewritten in the Goldstone frame yet: the set-aside column carries the rewrites')
  }
  const maxOrder = task.maxOrder ?? g.maxOrder
  if (task.kind === 'count') return countGoldstone({ coset: g.coset, N: g.N, sources: g.sources, theta: g.theta, maxOrder, onProgress: o.onProgress, signal: o.signal })
  if (g.coset !== 'chiral') throw new EngineInputError('goldstoneTask', 'explicit bases are built for SU(N)×SU(N)/SU(N); for O(N+1)/O(N) run the counts')
  if (g.theta) throw new EngineInputError('goldstoneTask', 'explicit bases are built for P-invariant theories; with the θ term run the counts (P-odd terms included)')
  return goldstoneBasis({ N: g.N, sources: g.sources, maxOrder: Math.min(maxOrder, MAX_EXPLICIT_ORDER), keep: task.priorities?.keep, onProgress: o.onProgress, signal: o.signal })
}
