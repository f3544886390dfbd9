// Representations and charges of one field as editor text per group uid, and back: shared by the
// field roster and the heavy particle. (Outside composables/' top level: not auto-imported.)
import type { DraftGroup, DraftIssue } from './draftTypes'
import { groupInputKind } from '../../shared/schemas/groupKinds'

export interface DraftLabels {
  /** Dynkin labels ("1,0") or a finite group's irrep name ("3") per group uid (empty = singlet). */
  reps: Record<string, string>
  /** Charge per group uid, typed as "1/6" (empty = 0). */
  charges: Record<string, string>
  /** reps/charges keyed by names that are not groups of the draft (kept so validation names them). */
  strayReps: Record<string, unknown>
  strayCharges: Record<string, unknown>
}

export const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v)
/** A typed value as form text (missing → empty). */
export const asText = (v: unknown) => (v === undefined || v === null ? '' : String(v))

export function emptyLabels(): DraftLabels {
  return { reps: {}, charges: {}, strayReps: {}, strayCharges: {} }
}

/** The text of a file's `reps` and `charges` objects, keyed by the uid of the group each names. */
export function labelsToDraft(reps: unknown, charges: unknown, byName: Map<string, string>): DraftLabels {
  const out = emptyLabels()
  for (const [g, labels] of Object.entries(isRecord(reps) ? reps : {})) {
    const uid = byName.get(g)
    if (uid && Array.isArray(labels)) out.reps[uid] = labels.join(',')
    else if (uid && typeof labels === 'string') out.reps[uid] = labels
    else out.strayReps[g] = labels
  }
  for (const [g, q] of Object.entries(isRecord(charges) ? charges : {})) {
    const uid = byName.get(g)
    if (uid && (typeof q === 'string' || typeof q === 'number')) out.charges[uid] = String(q)
    else out.strayCharges[g] = q
  }
  return out
}

/**
 * Set `reps` and `charges` on `out` (left out when empty). Labels that are not numbers are
 * reported at `[...at, 'reps', group]` and left out of the file.
 */
export function labelsToTheory(d: DraftLabels, groups: DraftGroup[], out: Record<string, unknown>, at: (string | number)[], issues: DraftIssue[]) {
  const reps: Record<string, unknown> = { ...d.strayReps }
  const charges: Record<string, unknown> = { ...d.strayCharges }
  for (const g of groups) {
    const rep = (d.reps[g.uid] ?? '').trim()
    const q = (d.charges[g.uid] ?? '').trim()
    const kind = groupInputKind(g.type)
    if (kind === 'labels' && rep) {
      const labels = rep.split(/[\s,]+/).filter(Boolean)
      if (labels.every((a) => /^\d{1,2}$/.test(a))) reps[g.name] = labels.map(Number)
      else issues.push({ path: [...at, 'reps', g.name], message: `Dynkin labels are whole numbers separated by commas, e.g. "1,0", but got "${rep}"` })
    }
    if (kind === 'irrep' && rep) reps[g.name] = rep
    if (kind === 'charge' && q) charges[g.name] = q
  }
  if (Object.keys(reps).length) out.reps = reps
  if (Object.keys(charges).length) out.charges = charges
}
