import { useDb } from './connection'
import { fail } from '../http/apiHandler'
import type { TheoryRow } from './theories'
import type { IntegrateOutResult } from '../../engine/scales/integrateOut'

export interface ThresholdRecord {
  name?: string
  scale: number
  unit: string
  valueMeV: number
  removedFields: string[]
}

/**
 * Store the child theory of an integrate-out step in the parent's group, linked to its parent,
 * with one threshold-tag row per (gauge kinetic term, removed field): one transaction.
 */
export async function createChildTheory(parent: TheoryRow, step: IntegrateOutResult, removedFields: string[], userId: number) {
  const threshold: ThresholdRecord = {
    ...(step.thresholdScale.name ? { name: step.thresholdScale.name } : {}),
    scale: step.thresholdScale.value,
    unit: step.thresholdScale.unit,
    valueMeV: step.thresholdScale.valueMeV,
    removedFields,
  }
  return useDb().transaction(async (trx) => {
    const clash = await trx('theories').where({ group_id: parent.group_id, name: step.child.name }).whereNull('deleted_at').first('id')
    if (clash) fail(409, `The group already has a theory named "${step.child.name}" (theory ${clash.id}); rename or delete it first`)
    const [child] = await trx('theories')
      .insert({
        group_id: parent.group_id,
        name: step.child.name,
        definition: JSON.stringify(step.child),
        parent_id: parent.id,
        threshold: JSON.stringify(threshold),
        created_by: userId,
      })
      .returning('*')
    const rows = step.thresholdTags.map((t) => ({
      theory_id: child.id,
      term: `kinetic term of ${t.group}`.slice(0, 120),
      field: t.field,
      text: t.text,
      details: JSON.stringify({ group: t.group, betaShift: t.betaShift, loop: 'one-loop', scale: threshold.scale, unit: threshold.unit, valueMeV: threshold.valueMeV, parentTheoryId: parent.id }),
    }))
    const tags = rows.length ? await trx('threshold_tags').insert(rows).returning(['id', 'term', 'field', 'text', 'details']) : []
    return { child: child as TheoryRow, tags }
  })
}

export interface TowerNode {
  id: number
  name: string
  parentId: number | null
  threshold: ThresholdRecord | null
  depth: number
  definition: unknown
}

/** The whole tower through a theory: up to its root (same group), then every descendant, depth-first. */
export async function towerOf(theory: TheoryRow): Promise<TowerNode[]> {
  const all = await useDb()('theories').where({ group_id: theory.group_id }).whereNull('deleted_at').orderBy('id').select('id', 'name', 'parent_id', 'threshold', 'definition')
  const byId = new Map(all.map((t) => [t.id as number, t]))
  let root = byId.get(theory.id)!
  const seen = new Set<number>([root.id])
  while (root.parent_id && byId.has(root.parent_id) && !seen.has(root.parent_id)) {
    root = byId.get(root.parent_id)!
    seen.add(root.id)
  }
  const out: TowerNode[] = []
  const visit = (t: typeof root, depth: number) => {
    if (out.some((n) => n.id === t.id) || depth > 50) return
    out.push({ id: t.id, name: t.name, parentId: t.parent_id, threshold: t.threshold, depth, definition: t.definition })
    for (const c of all.filter((x) => x.parent_id === t.id)) visit(c, depth + 1)
  }
  visit(root, 0)
  return out
}

/** Threshold tags of the given theories, by theory id. */
/** What a threshold tag stores beside its text (written by the integrate-out step above). */
export interface ThresholdTagDetails {
  group: string
  betaShift: string
  loop: string
  scale: number
  unit: string
  valueMeV: number
  parentTheoryId: number
}

export async function thresholdTagsOf(theoryIds: number[]) {
  const rows = theoryIds.length ? await useDb()('threshold_tags').whereIn('theory_id', theoryIds).orderBy('id').select('id', 'theory_id', 'term', 'field', 'text', 'details') : []
  const out: Record<number, { id: number; term: string; field: string; text: string; details: ThresholdTagDetails | null }[]> = {}
  for (const r of rows) (out[r.theory_id] ??= []).push({ id: r.id, term: r.term, field: r.field, text: r.text, details: r.details })
  return out
}
