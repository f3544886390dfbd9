import { useDb } from './connection'
import { fail } from '../http/apiHandler'
import { liveTheories } from './live'
import { MAX_HEAVY_ORDER, MAX_RUN_DIMENSION } from '../../../shared/schemas/runRequests'
import { sendRunJob } from '../jobs/queue'
import { settleRuns } from '../jobs/orphans'
import { massRatioDimension, massRatioOrder } from '../../engine/rules/defaultWeights'

export async function runOr404(id: number) {
  const row = await liveTheories(useDb()('runs as r').join('theories as t', 't.id', 'r.theory_id'))
    .where('r.id', id)
    .first('r.*', 't.group_id')
  if (!row) fail(404, `No run with id ${id}`)
  return row
}

export function publicRun(row: Record<string, any>) {
  return {
    id: row.id,
    theoryId: row.theory_id,
    kind: row.kind,
    status: row.status,
    progress: row.progress,
    currentLabel: row.current_label,
    maxDim: row.params?.maxDim ?? null,
    maxOrder: row.params?.maxOrder ?? null,
    nf: row.params?.nf ?? null,
    summary: row.summary,
    error: row.error,
    cancelRequested: row.cancel_requested,
    createdAt: row.created_at,
    startedAt: row.started_at,
    finishedAt: row.finished_at,
  }
}

/**
 * A queued or running run whose worker vanished is settled when read (retried once, failed with
 * a message, or cancelled if that was asked for): see server/utils/jobs/orphans.ts.
 */
export async function settleIfOrphaned(row: Record<string, any>) {
  if (!['queued', 'running'].includes(row.status)) return row
  const settled = await settleRuns(useDb(), sendRunJob, row.id)
  if (Object.values(settled).every((ids) => ids.length === 0)) return row
  return runOr404(row.id)
}

/**
 * The engine's priorities for a run. "Keep what basis N keeps" becomes, per class, the texts of
 * that basis's kept operators, Hermitian and parity combinations included (writtenOperator.ts).
 */
export async function runPriorities(theoryId: number, p: { derivativesOn?: string[]; preferHermitian?: boolean; keepFromBasis?: number } | undefined) {
  if (!p) return undefined
  const { keepFromBasis, ...rest } = p
  if (!keepFromBasis) return rest
  const basis = await useDb()('bases').where({ id: keepFromBasis, theory_id: theoryId }).whereNull('deleted_at').first('id')
  if (!basis) fail(404, `This theory has no basis ${keepFromBasis} to keep operators from; choose one of its own bases`)
  const rows = await useDb()('operators').where({ basis_id: keepFromBasis, column: 'kept' }).orderBy('position').select('class_key', 'text')
  const keep: Record<string, string[]> = {}
  for (const r of rows) (keep[r.class_key] ??= []).push(r.text)
  return { ...rest, keep }
}

/**
 * How far a run goes: a heavy-frame theory in powers of 1/m (maxOrder, default its own
 * heavy.maxOrder, at most 4); any other theory in mass dimension (maxDim, or maxOrder + 4).
 */
export function runReach(definition: unknown, body: { kind: 'count' | 'basis'; maxDim?: number; maxOrder?: number }): { maxDim?: number; maxOrder?: number } {
  const def = (definition ?? {}) as { frame?: string; heavy?: { maxOrder?: number }; goldstone?: { maxOrder?: number } }
  if (def.frame === 'goldstone') return { maxOrder: goldstoneReach(def.goldstone?.maxOrder, body) }
  if (def.frame === 'heavy') {
    const maxOrder = body.maxOrder ?? def.heavy?.maxOrder ?? 2
    if (maxOrder > MAX_HEAVY_ORDER) fail(400, `Maximum order must be at most ${MAX_HEAVY_ORDER} for a heavy-particle run (up to 1/m^${MAX_HEAVY_ORDER}), not ${maxOrder}`)
    return { maxOrder }
  }
  const maxDim = body.maxDim ?? massRatioDimension(body.maxOrder!)
  if (maxDim > MAX_RUN_DIMENSION[body.kind])
    fail(400, `Maximum order must be at most ${body.kind === 'basis' ? '4 for an explicit basis (dimension 8)' : '12 for a count (dimension 16)'}, not ${massRatioOrder(maxDim)}`)
  return { maxDim }
}

/** A Goldstone-frame run goes to a chiral order p^k (even; explicit bases to p^6), the theory's own when none is asked. */
function goldstoneReach(declared: number | undefined, body: { kind: 'count' | 'basis'; maxOrder?: number }): number {
  const highest = body.kind === 'basis' ? 6 : 12
  const maxOrder = body.maxOrder ?? Math.min(declared ?? 4, highest)
  if (maxOrder % 2 !== 0) fail(400, `Maximum order must be even for a Goldstone-frame run (operators exist at even powers of p only), not ${maxOrder}`)
  if (maxOrder > highest)
    fail(400, `Maximum order must be at most ${highest} for a Goldstone-frame ${body.kind === 'basis' ? 'run: an explicit basis is built up to p^6' : 'count run'}, not ${maxOrder}`)
  return maxOrder
}
