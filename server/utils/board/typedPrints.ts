import { compute } from '../compute/computePool'
import type { Fingerprint } from '../../engine/board/fingerprints'
import type { Priorities } from '../../engine/basis/classBasis'
import type { SourceSwitch } from '../../engine/goldstone/blocks'

/** The parts of a stored board class a typed rewrite reads. */
export interface TypedClass {
  key: string
  order: number
  frame?: string
  evaluatedAtN?: number
  role?: string
}

interface Kept {
  id: number
  latex: string
  text: string
  fingerprint: Fingerprint
}

export interface TypedRewriteAnswer {
  vanishes: boolean
  terms: { operatorId: number; latex: string; coefficient: string }[]
  timesI: boolean
}

/**
 * A typed operator written onto the kept operators of its class, computed in the compute pool
 * (worker/boardTasks.ts `typedRewrite`). A Goldstone-frame order recomputes its points from
 * (order, N, sources) and fingerprints its kept operators again from their texts; other classes
 * follow the fingerprint version (engine/board/fingerprintVersion.ts). Null: not a combination.
 */
export async function typedRewriteOnto(args: {
  theory: unknown
  cls: TypedClass
  kept: Kept[]
  text: string
  version: number | null
  priorities?: Priorities
  userId: number
  groupId: number
}): Promise<TypedRewriteAnswer | null> {
  const { cls, theory } = args
  let goldstone
  if (cls.frame === 'goldstone') {
    const g = (theory as { goldstone: { N: number | 'general'; sources: SourceSwitch } }).goldstone
    goldstone = { N: g.N, sources: g.sources, order: cls.order, evaluatedAtN: cls.evaluatedAtN ?? (g.N === 'general' ? Math.max(cls.order, 3) : g.N) }
  }
  const input = { theory, classKey: cls.key, typed: args.text, priorities: args.priorities, fingerprintVersion: args.version, kept: args.kept, goldstone }
  return (await compute('typedRewrite', input, args.userId, args.groupId)) as TypedRewriteAnswer | null
}
