import type { Knex } from 'knex'
import { fail } from '../http/apiHandler'
import { withBoardLock } from './boardLock'
import { basisOperators, ordersOfClasses, storeCoverage, type BoardOperatorRow, type StoredClass } from './boardMath'
import { addTag } from './tags'
import { compute } from '../compute/computePool'
import { planImport, type Placement, type FileEntry } from '../board/importPlan'
import { planAnnotations, type PlannedNote } from '../board/importAnnotations'
import type { ImportChoice } from '../../../shared/schemas/importChoice'

interface BasisRef {
  id: number
  theory_id: number
  group_id: number
  classes: unknown
}

/**
 * Apply a JSON export to a basis, all or nothing, under the board locks of all its orders:
 * columns and places as the file gives them, its tags and notes with their authors and dates.
 * Refused (422, nothing changed) when the file names operators the basis does not have, repeats
 * one, or would make any class's kept set redundant. Answers what changed and what was left out.
 * The kept sets are judged in the compute pool (board lane), under the locks and before any write.
 */
export function importChoice(basis: BasisRef, file: ImportChoice, userId: number) {
  const classes = basis.classes as StoredClass[]
  return withBoardLock(basis.id, ordersOfClasses(classes), async (trx) => {
    const rows = await basisOperators(trx, basis.id)
    const plan = planImport(rows, file)
    if ('refused' in plan) fail(422, plan.refused)
    const after = rows.map((r) => ({ ...r, ...plan.final.get(r.id)! }))
    const math = await compute('importMath', { after, classes }, userId, basis.group_id)
    if (math.refusal !== null) fail(422, math.refusal)
    await writePlacements(trx, rows, plan.final, userId)
    const annotations = await writeAnnotations(trx, basis, plan.entries)
    await storeCoverage(trx, basis.id, math.coverage)
    return { matched: plan.entries.length, changed: plan.columnChanges + plan.reordered, columnChanges: plan.columnChanges, reordered: plan.reordered, notInFile: plan.notInFile, ...annotations }
  })
}

/** Write the new columns and places (one statement); operators whose column or place changed get a new version. */
async function writePlacements(trx: Knex.Transaction, rows: BoardOperatorRow[], final: Map<number, Placement>, userId: number) {
  const changed = rows.filter((r) => final.get(r.id)!.column !== r.column || final.get(r.id)!.position !== r.position)
  if (!changed.length) return
  await trx.raw(
    `update operators o set "column" = x.col::operator_column, position = x.pos,
      version = o.version + 1, moved_by = ?, moved_at = now()
    from unnest(?::int[], ?::text[], ?::int[]) as x(id, col, pos) where o.id = x.id`,
    [userId, changed.map((r) => r.id), changed.map((r) => final.get(r.id)!.column), changed.map((r) => final.get(r.id)!.position)],
  )
}

/** Insert the file's tags and notes that can be taken over; the rest is reported, not written. */
async function writeAnnotations(trx: Knex.Transaction, basis: BasisRef, entries: FileEntry[]) {
  const members = new Map<number, string>(
    (await trx('memberships as m').join('users as u', 'u.id', 'm.user_id').where('m.group_id', basis.group_id).select('u.id', 'u.display_name')).map((m) => [m.id, m.display_name]),
  )
  const plan = planAnnotations(entries, members)
  let tagsAdded = 0
  for (const t of plan.tags) {
    if (await addTag({ operatorId: t.operatorId, kind: t.kind, label: t.label, createdBy: t.author.id, authorName: t.author.name, createdAt: t.createdAt }, trx)) tagsAdded++
  }
  const fresh = await notesNotThere(trx, basis.theory_id, plan.notes)
  if (fresh.length) {
    await trx('annotations').insert(
      fresh.map((n) => ({
        theory_id: basis.theory_id,
        operator_id: n.operatorId,
        author_id: n.author.id,
        author_name: n.author.name,
        body: n.body,
        created_at: n.createdAt,
        updated_at: n.createdAt,
      })),
    )
  }
  const asText = [...plan.tags.map((t) => t.author), ...fresh.map((n) => n.author)].filter((a) => a.id === null && a.name).map((a) => a.name!)
  return {
    tags: { added: tagsAdded, alreadyThere: plan.tags.length - tagsAdded },
    notes: { added: fresh.length, alreadyThere: plan.notes.length - fresh.length },
    authorsKeptAsText: [...new Set(asText)],
    leftOut: plan.leftOut,
  }
}

/** The planned notes that the operators do not carry yet (same text and time: already there). */
async function notesNotThere(trx: Knex.Transaction, theoryId: number, notes: PlannedNote[]) {
  if (!notes.length) return []
  const existing = await trx('annotations')
    .where({ theory_id: theoryId })
    .whereNull('deleted_at')
    .whereIn('operator_id', [...new Set(notes.map((n) => n.operatorId))])
    .select('operator_id', 'body', trx.raw('floor(extract(epoch from created_at) * 1000)::bigint as ms'))
  const seen = new Set(existing.map((e) => `${e.operator_id}|${Number(e.ms)}|${e.body}`))
  return notes.filter((n) => {
    const key = `${n.operatorId}|${n.createdAt.getTime()}|${n.body}`
    if (seen.has(key)) return false
    seen.add(key)
    return true
  })
}
