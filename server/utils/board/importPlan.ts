import type { ImportChoice, ImportedOperator } from '../../../shared/schemas/importChoice'

// What an imported JSON export asks of a stored basis: each operator's column and place, as
// the file gives them, matched by order, class and text. Pure: no database. Operators of the
// basis that the file does not list keep their column and follow the file's ones in it.
type Column = 'kept' | 'set_aside'
export interface StoredOperator {
  id: number
  order: number
  class_key: string
  text: string
  column: Column
  position: number
}
export interface Placement {
  column: Column
  position: number
}
export interface FileEntry {
  row: StoredOperator
  op: ImportedOperator
}
export interface ImportPlan {
  entries: FileEntry[]
  /** Every operator of the basis, with its column and place after the import. */
  final: Map<number, Placement>
  columnChanges: number
  reordered: number
  notInFile: number
}

/** How a user sees an operator: its order, class and text. */
export function describeOperator(o: { order: number; class_key: string; text: string }): string {
  return `order ${o.order}, class ${o.class_key}: "${o.text}"`
}

function listed(items: string[], max = 3): string {
  return items.slice(0, max).join('; ') + (items.length > max ? `; and ${items.length - max} more` : '')
}

/** Match the file's operators to stored ones; a refusal names what is unknown or repeated. */
function matchFile(rows: StoredOperator[], file: ImportChoice): FileEntry[] | { refused: string } {
  const unused = new Map<string, StoredOperator[]>()
  for (const r of rows) unused.set(`${r.order}|${r.class_key}|${r.text}`, [...(unused.get(`${r.order}|${r.class_key}|${r.text}`) ?? []), r])
  const entries: FileEntry[] = []
  const missing: string[] = []
  const repeated: string[] = []
  for (const o of file.orders) {
    for (const c of o.classes) {
      for (const op of c.operators) {
        const key = `${o.order}|${c.key}|${op.text}`
        const what = describeOperator({ order: o.order, class_key: c.key, text: op.text })
        const row = unused.get(key)?.shift()
        if (row) entries.push({ row, op })
        else if (rows.some((r) => `${r.order}|${r.class_key}|${r.text}` === key)) repeated.push(what)
        else missing.push(what)
      }
    }
  }
  if (missing.length) return { refused: `${missing.length} operator(s) of the file are not in this basis (was the file exported from another basis?): ${listed(missing)}. Nothing was changed.` }
  if (repeated.length)
    return { refused: `The file lists ${repeated.length === 1 ? 'an operator' : 'operators'} more than once: ${listed(repeated)}. Each operator may appear once; nothing was changed.` }
  return entries
}

/** Places per (order, column): the file's operators by their position (else file order), then the rest as stored. */
function placements(rows: StoredOperator[], entries: FileEntry[]): Map<number, Placement> {
  const fromFile = new Map(entries.map((e, i) => [e.row.id, { column: e.op.column, rank: e.op.position ?? Number.MAX_SAFE_INTEGER, index: i }]))
  const slots = new Map<string, { id: number; inFile: boolean; rank: number; index: number }[]>()
  for (const r of rows) {
    const f = fromFile.get(r.id)
    const slot = `${r.order}|${f?.column ?? r.column}`
    const item = f ? { id: r.id, inFile: true, rank: f.rank, index: f.index } : { id: r.id, inFile: false, rank: r.position, index: r.id }
    slots.set(slot, [...(slots.get(slot) ?? []), item])
  }
  const final = new Map<number, Placement>()
  for (const [slot, items] of slots) {
    const column = slot.split('|')[1] as Column
    items.sort((a, b) => Number(b.inFile) - Number(a.inFile) || a.rank - b.rank || a.index - b.index)
    items.forEach((it, position) => final.set(it.id, { column, position }))
  }
  return final
}

/** The current place of every operator in its column (0, 1, …), whatever gaps positions have. */
function currentPlaces(rows: StoredOperator[]): Map<number, number> {
  const sorted = [...rows].sort((a, b) => a.order - b.order || a.column.localeCompare(b.column) || a.position - b.position || a.id - b.id)
  const next = new Map<string, number>()
  const out = new Map<number, number>()
  for (const r of sorted) {
    const slot = `${r.order}|${r.column}`
    out.set(r.id, next.get(slot) ?? 0)
    next.set(slot, (next.get(slot) ?? 0) + 1)
  }
  return out
}

/** The plan of an import, or a refusal (unknown or repeated operators) with its reason. */
export function planImport(rows: StoredOperator[], file: ImportChoice): ImportPlan | { refused: string } {
  const entries = matchFile(rows, file)
  if ('refused' in entries) return entries
  const final = placements(rows, entries)
  const now = currentPlaces(rows)
  let columnChanges = 0
  let reordered = 0
  for (const r of rows) {
    const f = final.get(r.id)!
    if (f.column !== r.column) columnChanges++
    else if (f.position !== now.get(r.id)) reordered++
  }
  return { entries, final, columnChanges, reordered, notInFile: rows.length - entries.length }
}
