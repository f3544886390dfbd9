import { TAG_KINDS } from '../../../shared/schemas/boardRequests'
import { describeOperator, type FileEntry } from './importPlan'

// The tags and notes an imported file brings, decided before anything is written: which can be
// taken over (and by whom they count as written), and what is left out and why. Pure.
export interface Author {
  id: number | null
  name: string | null
}
export interface PlannedTag {
  operatorId: number
  kind: string
  label: string
  author: Author
  createdAt: Date | undefined
  what: string
}
export interface PlannedNote {
  operatorId: number
  body: string
  author: Author
  createdAt: Date
  what: string
}
export interface LeftOut {
  operator: string
  item: string
  reason: string
}

const MAX_LABEL = 120
const MAX_NOTE = 10_000

/**
 * The account a file's author is, when a member of the group: the same account id with the
 * same name, or (no id given) the one member of that name. Otherwise the name is kept as text.
 */
export function matchAuthor(members: Map<number, string>, name: string | null | undefined, id: number | null | undefined): Author {
  const clean = name?.trim() || null
  if (id != null && members.get(id) === clean) return { id, name: null }
  if (id == null && clean) {
    const same = [...members].filter(([, n]) => n === clean)
    if (same.length === 1) return { id: same[0]![0], name: null }
  }
  return { id: null, name: clean }
}

function dateOf(text: string | null | undefined): Date | null {
  if (!text) return null
  const d = new Date(text)
  return Number.isNaN(d.getTime()) || d.getTime() > Date.now() + 86_400_000 ? null : d
}

function tagProblem(kind: string, label: string): string | null {
  if (!(TAG_KINDS as readonly string[]).includes(kind)) return `"${kind}" is not a tag kind here (${TAG_KINDS.join(', ')})`
  if ((kind === 'threshold' || kind === 'custom') && !label) return `a ${kind} tag needs a label`
  if (label.length > MAX_LABEL) return `its label is longer than ${MAX_LABEL} characters`
  return null
}

/** Tags and notes to write, and what is left out, for the matched file entries. */
export function planAnnotations(entries: FileEntry[], members: Map<number, string>) {
  const tags: PlannedTag[] = []
  const notes: PlannedNote[] = []
  const leftOut: LeftOut[] = []
  for (const { row, op } of entries) {
    const operator = describeOperator(row)
    for (const t of op.tags ?? []) {
      const label = (t.label ?? '').trim()
      const what = `tag ${t.kind}${label ? ` "${label}"` : ''}`
      const problem = tagProblem(t.kind, label)
      if (problem) leftOut.push({ operator, item: what, reason: problem })
      else tags.push({ operatorId: row.id, kind: t.kind, label, author: matchAuthor(members, t.author, t.authorId), createdAt: dateOf(t.createdAt) ?? undefined, what })
    }
    for (const n of op.notes ?? []) {
      const body = n.body.trim()
      const what = `note "${body.slice(0, 40)}${body.length > 40 ? '…' : ''}"${n.author ? ` by ${n.author}` : ''}`
      const createdAt = dateOf(n.createdAt)
      if (!body) leftOut.push({ operator, item: what, reason: 'the note is empty' })
      else if (body.length > MAX_NOTE) leftOut.push({ operator, item: what, reason: `the note is longer than ${MAX_NOTE} characters` })
      else if (!createdAt) leftOut.push({ operator, item: what, reason: `its date ("${n.createdAt ?? ''}") is missing or not a date` })
      else notes.push({ operatorId: row.id, body, author: matchAuthor(members, n.author, n.authorId), createdAt, what })
    }
  }
  return { tags, notes, leftOut }
}
