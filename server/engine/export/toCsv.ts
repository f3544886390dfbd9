import type { BoardExport } from './boardExport'

const HEADER = ['order', 'dimension', 'class', 'column', 'operator', 'latex', 'hermitian', 'real_parameters', 'flavor_components', 'tags', 'notes']

/**
 * RFC 4180 field: quoted when it holds a comma, quote or line break; quotes doubled. Text that
 * begins with = + - @, a tab or a carriage return gets a leading apostrophe, so a spreadsheet
 * shows it instead of running it as a formula (common practice, OWASP "CSV injection");
 * numbers and booleans are written as they are.
 * @example csvField('=1+1') // "'=1+1"
 */
export function csvField(value: unknown): string {
  let s = String(value ?? '')
  if (typeof value === 'string' && /^[=+\-@\t\r]/.test(s)) s = `'${s}`
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s
}

/**
 * One row per operator (kept and set aside), for fitting codes and spreadsheets.
 * @example toCsv(data).split('\n')[0] // "order,dimension,class,column,operator,..."
 */
export function toCsv(data: BoardExport): string {
  const rows = [HEADER.join(',')]
  for (const order of data.orders) {
    for (const c of order.classes) {
      for (const o of c.operators) {
        rows.push(
          [
            order.order,
            order.dimension ?? '',
            c.key,
            o.column,
            o.text,
            o.latex,
            o.hermitian,
            o.realParameters,
            o.flavorComponents ?? 1,
            o.tags.map((t) => (t.label ? `${t.kind}: ${t.label}` : t.kind)).join('; '),
            o.notes.map((n) => `${n.author}: ${n.body}`).join(' | '),
          ]
            .map(csvField)
            .join(','),
        )
      }
    }
  }
  return `${rows.join('\r\n')}\r\n`
}
