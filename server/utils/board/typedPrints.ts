import { compute } from '../compute/computePool'
import { typedRewritePlan } from '../../engine/board/fingerprintVersion'
import type { Fingerprint } from '../../engine/board/fingerprints'
import type { Priorities } from '../../engine/basis/classBasis'
import type { SourceSwitch } from '../../engine/goldstone/blocks'

/** The parts of a stored board class a typed rewrite reads. */
export interface TypedClass { key: string, order: number, frame?: string, evaluatedAtN?: number }

interface Kept { text: string, fingerprint: Fingerprint }

/**
 * The fingerprints a typed rewrite compares: the kept operators' and the typed one's, at the
 * class's sample points, computed in the compute pool. A Goldstone-frame order recomputes its
 * points from (order, N, sources) and fingerprints its kept operators again from their texts;
 * other classes follow the fingerprint version (engine/board/fingerprintVersion.ts).
 */
export async function typedPrints(args: { theory: unknown, cls: TypedClass, kept: Kept[], text: string, version: number | null, priorities?: Priorities, userId: number }): Promise<{ kept: Fingerprint[], typed: Fingerprint }> {
  const { cls, kept, text, userId } = args
  if (cls.frame === 'goldstone') {
    const g = (args.theory as { goldstone: { N: number | 'general', sources: SourceSwitch } }).goldstone
    const input = { N: g.N, sources: g.sources, order: cls.order, evaluatedAtN: cls.evaluatedAtN ?? (g.N === 'general' ? Math.max(cls.order, 3) : g.N) }
    const prints = await compute('goldstoneTypedFingerprints', { input, texts: [...kept.map((k) => k.text), text] }, userId) as Fingerprint[]
    return { kept: prints.slice(0, -1), typed: prints[prints.length - 1]! }
  }
  const plan = typedRewritePlan(args.version, kept.map((k) => k.text), text)
  const prints = await compute('typedFingerprints', { theory: args.theory, classKey: cls.key, texts: plan.texts, priorities: args.priorities }, userId) as Fingerprint[]
  return { kept: plan.useStored ? kept.map((k) => k.fingerprint) : prints.slice(0, -1), typed: prints[prints.length - 1]! }
}
