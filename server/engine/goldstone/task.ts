/**
 * One background task of a Goldstone-frame theory (the worker thread dispatches here by frame):
 * counts to the chosen chiral order, the explicit basis (SU(N) cosets, up to p⁶), or the
 * fingerprints of typed operators at a stored order's points (up to p⁴, typedGoldstone.ts).
 */
import type { Theory } from '../../../shared/schemas/theory'
import { EngineInputError } from '../errors'
import { countGoldstone, type GoldstoneCountResult } from './countGoldstone'
import { goldstoneBasis, MAX_EXPLICIT_ORDER, type GoldstoneBasisResult } from './explicit/goldstoneBasis'
import { goldstoneTypedFingerprints } from './explicit/typedGoldstone'
import type { Fingerprint } from '../board/fingerprints'

export interface GoldstoneTaskInput {
  kind: 'count' | 'basis' | 'fingerprint'
  maxOrder?: number
  /** For 'fingerprint': the board's class of one chiral order ("p^4") and the operator texts. */
  classKey?: string
  texts?: string[]
  priorities?: { keep?: Record<string, string[]> }
}

/**
 * Run the task; the theory must be in the Goldstone frame.
 * @example goldstoneTask(theory, { kind: 'count', maxOrder: 6 }, {}).byOrder.map(o => o.operators) // [2, 12, 117] for N = 3 with sources
 */
export function goldstoneTask(
  theory: Theory,
  task: GoldstoneTaskInput,
  o: { onProgress?: (f: number, label: string) => void; signal?: { aborted: boolean } },
): GoldstoneCountResult | GoldstoneBasisResult | Fingerprint[] {
  const g = theory.goldstone
  if (!g) throw new EngineInputError('goldstoneTask', 'a Goldstone-frame theory needs its "goldstone" block')
  if (task.kind === 'fingerprint') {
    const order = Number(/^p\^(\d+)$/.exec(task.classKey ?? '')?.[1])
    if (!Number.isInteger(order)) throw new EngineInputError('goldstoneTask', `a Goldstone-frame board class is one chiral order, written p^4 or p^6, not "${task.classKey}"`)
    const evaluatedAtN = g.N === 'general' ? Math.max(order, 3) : g.N
    return goldstoneTypedFingerprints({ N: g.N, sources: g.sources, order, evaluatedAtN, signal: o.signal }, task.texts ?? [])
  }
  const maxOrder = task.maxOrder ?? g.maxOrder
  if (task.kind === 'count') return countGoldstone({ coset: g.coset, N: g.N, sources: g.sources, theta: g.theta, maxOrder, onProgress: o.onProgress, signal: o.signal })
  if (g.coset !== 'chiral') throw new EngineInputError('goldstoneTask', 'explicit bases are built for SU(N)×SU(N)/SU(N); for O(N+1)/O(N) run the counts')
  if (g.theta) throw new EngineInputError('goldstoneTask', 'explicit bases are built for P-invariant theories; with the θ term run the counts (P-odd terms included)')
  if (g.sources.singletVector) throw new EngineInputError('goldstoneTask', 'explicit bases are built without the singlet vector source; switch it off for a basis, or run the counts (they include it)')
  return goldstoneBasis({ N: g.N, sources: g.sources, maxOrder: Math.min(maxOrder, MAX_EXPLICIT_ORDER), keep: task.priorities?.keep, onProgress: o.onProgress, signal: o.signal })
}
