import type { H3Event } from 'h3'
import { getQuery, setResponseHeader } from 'h3'
import { boardData } from './bases'
import { theoryOr404 } from './theories'
import { fail } from '../http/apiHandler'
import { compute } from '../compute/computePool'
import type { ExportInput } from '../../worker/boardTasks'

const TYPES = { latex: ['application/x-tex', 'tex'], csv: ['text/csv; charset=utf-8', 'csv'], json: ['application/json', 'json'] } as const
type Format = keyof typeof TYPES

/** What an export of a basis is made from, read from the database (the file itself is assembled in the compute pool). */
export async function exportInputOf(basisId: number): Promise<{ data: ExportInput; groupId: number }> {
  const d = await boardData(basisId)
  const theory = await theoryOr404(d.basis.theoryId)
  return {
    groupId: theory.group_id,
    data: {
      theory: { name: d.basis.theoryName, definition: theory.definition },
      countingRule: d.basis.countingRule,
      note: d.basis.note || 'modulo equations of motion and integration by parts; terms proportional to the equations of motion move into other classes',
      exportedAt: new Date().toISOString(),
      classes: d.basis.classes as never,
      operators: d.operators as never,
      tags: d.tags,
      notes: d.notes,
    },
  }
}

/**
 * Answer with the export of a basis in the format asked for (?format=latex|csv|json), as a
 * download. The format is checked before anything is read; the file is written in the
 * compute pool (a large basis with many notes is megabytes of text), asked for by `user`
 * (a share link asks as `share:<theory id>`) and counted against the basis's group.
 */
export async function sendExport(event: H3Event, basisId: number, user: string | number) {
  const format = String(getQuery(event).format ?? 'json')
  if (!(format in TYPES)) fail(400, `format must be latex, csv or json, not "${format}"`)
  const { data, groupId } = await exportInputOf(basisId)
  const text = await compute('boardExport', { data, format: format as Format, dirac: getQuery(event).notation === 'dirac' }, user, groupId)
  const [type, ext] = TYPES[format as Format]
  const base = data.theory.name.replace(/[^A-Za-z0-9_-]+/g, '-').toLowerCase() || 'basis'
  setResponseHeader(event, 'content-type', type)
  setResponseHeader(event, 'content-disposition', `attachment; filename="${base}-basis.${ext}"`)
  return text
}
