import type { H3Event } from 'h3'
import { getQuery, setResponseHeader } from 'h3'
import { boardData } from './bases'
import { theoryOr404 } from './theories'
import { fail } from '../http/apiHandler'
import { assembleExport, type BoardExport } from '../../engine/export/boardExport'
import { toLatex } from '../../engine/export/toLatex'
import { toCsv } from '../../engine/export/toCsv'

export async function exportOfBasis(basisId: number): Promise<BoardExport> {
  const d = await boardData(basisId)
  const theory = await theoryOr404(d.basis.theoryId)
  return assembleExport({
    theory: { name: d.basis.theoryName, definition: theory.definition },
    countingRule: d.basis.countingRule,
    note: d.basis.note || 'modulo equations of motion and integration by parts; terms proportional to the equations of motion move into other classes',
    exportedAt: new Date().toISOString(),
    classes: d.basis.classes as never,
    operators: d.operators as never,
    tags: d.tags,
    notes: d.notes,
  })
}

/** Answer with the export in the format asked for (?format=latex|csv|json), as a download. */
export function sendExport(event: H3Event, data: BoardExport) {
  const format = String(getQuery(event).format ?? 'json')
  const dirac = getQuery(event).notation === 'dirac'
  const base = data.theory.name.replace(/[^A-Za-z0-9_-]+/g, '-').toLowerCase() || 'basis'
  const types = { latex: ['application/x-tex', 'tex'], csv: ['text/csv; charset=utf-8', 'csv'], json: ['application/json', 'json'] } as const
  if (!(format in types)) fail(400, `format must be latex, csv or json, not "${format}"`)
  const [type, ext] = types[format as keyof typeof types]
  setResponseHeader(event, 'content-type', type)
  setResponseHeader(event, 'content-disposition', `attachment; filename="${base}-basis.${ext}"`)
  if (format === 'latex') return toLatex(data, { dirac })
  if (format === 'csv') return toCsv(data)
  return JSON.stringify(data, null, 2)
}
