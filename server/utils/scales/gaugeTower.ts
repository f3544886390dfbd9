import type { TowerNode } from '../db/towers'

/** A tower step as the engine thread receives it: the stored theory file, not yet parsed. */
export interface StoredTowerStep {
  id: number
  name: string
  theory: unknown
  thresholdGeV: number | null
}

/**
 * The theories whose thresholds the running of a theory's gauge couplings goes through: its
 * ancestors up to the root, the theory itself, and the theories below it as long as each has
 * exactly one child (with several, the page of the lower theory says which branch to follow).
 */
export function gaugeTowerPath(nodes: readonly TowerNode[], id: number): { steps: StoredTowerStep[]; note: string | null } {
  const byId = new Map(nodes.map((n) => [n.id, n]))
  const path: TowerNode[] = []
  for (let n = byId.get(id); n && !path.includes(n); n = n.parentId === null ? undefined : byId.get(n.parentId)) path.unshift(n)
  let note: string | null = null
  for (;;) {
    const last = path[path.length - 1]!
    const children = nodes.filter((n) => n.parentId === last.id && !path.includes(n))
    if (children.length !== 1) {
      if (children.length > 1)
        note = `“${last.name}” has ${children.length} theories below it (${children.map((c) => `“${c.name}”`).join(', ')}); open the couplings page of the one whose thresholds the running should cross.`
      break
    }
    path.push(children[0]!)
  }
  const steps = path.map((n, i) => ({ id: n.id, name: n.name, theory: n.definition, thresholdGeV: i === 0 || !n.threshold ? null : n.threshold.valueMeV / 1000 }))
  return { steps, note }
}
