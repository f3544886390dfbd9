import type { BoardExport } from './boardExport'
import { classKeyTex } from '../theory/classKey'
import { fieldTexTable } from '../../../shared/schemas/fieldDisplay'
import { latexText } from './latexText'
import { commentText } from './commentText'

/** Class keys as math, e.g. "D^2 H^2 H*^2" → "D^{2}\\,H^{2}\\,H^{*2}". */
export const classKeyLatex = classKeyTex

// The document's preamble: amsmath, amssymb and bm (operators), T1 fonts (letters of user text
// such as ð or ŋ; Latin Modern makes them scalable), array (the operator column is a paragraph
// in math mode, so a long operator breaks across lines) and longtable (an order's table runs
// over as many pages as it needs, its header repeated). All are in Debian's texlive-latex-base
// and -recommended and load under article, amsart and the journal classes alike.
const PACKAGES = ['\\usepackage[T1]{fontenc}', '\\usepackage{lmodern}', '\\usepackage{amsmath,amssymb,bm}', '\\usepackage{array,longtable}']
const PREAMBLE = ['\\documentclass{article}', ...PACKAGES, '\\begin{document}', '']

/**
 * The kept basis per order as a LaTeX document of tables ready for a paper, with a short
 * legend of the conventions (two-component notation, counting, what "independent" assumes).
 * Every text a user wrote (theory name, tags, note) passes through latexText, so it is printed
 * and never run (in the header comments through commentText: one line, read by people); the
 * operators' LaTeX is the engine's own. One longtable per order, so hundreds of operators
 * flow over pages instead of off one.
 * @example toLatex(exportOfPhotons) // contains "\begin{longtable}"
 */
export function toLatex(data: BoardExport, opts: { dirac?: boolean } = {}): string {
  const rule = data.countingRule === '1/m' ? 'order n = power of 1/m in the heavy-particle frame' : 'order n = mass dimension - 4 under the mass-ratio rule'
  const out: string[] = [
    `% Scalewright basis export: ${latexText(data.theory.name)} (${commentText(data.exportedAt)})`,
    ...(data.countingRule === '1/m'
      ? [
          '% Legend: heavy-frame operators in two-component Pauli notation; derivatives act to their right.',
          ...(data.note || '')
            .split('\n')
            .filter(Boolean)
            .map((line) => `% Conventions: ${commentText(line)}`),
        ]
      : [
          '% Legend: operators in two-component notation with spinor brackets; derivatives act on the',
          `% field they follow. Independence holds ${commentText(data.note || 'modulo equations of motion and integration by parts')}.`,
        ]),
    `% Counting rule: ${commentText(data.countingRule)}; ${rule}.`,
    '% "real par." counts real Wilson-coefficient parameters for one flavor (2 for a non-Hermitian operator and its conjugate).',
    '% To paste the tables into a paper, load there the packages loaded below.',
    ...PREAMBLE,
  ]
  for (const order of data.orders) out.push(...orderTable(data, order, opts))
  out.push('\\end{document}', '')
  return out.join('\n')
}

function orderTable(data: BoardExport, order: BoardExport['orders'][number], opts: { dirac?: boolean }): string[] {
  const names = fieldTexTable(data.theory.definition)
  const kept = order.classes.flatMap((c) => c.operators.filter((o) => o.column === 'kept').map((o) => ({ c, o })))
  if (!kept.length) return []
  const lagrangian = order.order === 0 && data.countingRule !== '1/m' ? ' (the renormalizable Lagrangian, mass dimension at most 4)' : ''
  const dimension = order.dimension === null ? lagrangian : ` (mass dimension ${order.dimension})`
  const header = ['\\hline', 'class & operator & real par. & tags \\\\', '\\hline']
  const lines = [
    // Widths add up to less than the text (with the column gaps), so no row runs into the margin.
    '\\begin{longtable}{@{}>{\\raggedright\\arraybackslash$}p{0.2\\textwidth}<{$}>{\\raggedright\\arraybackslash$}p{0.42\\textwidth}<{$}c>{\\raggedright\\arraybackslash}p{0.15\\textwidth}@{}}',
    `\\caption{${latexText(data.theory.name)}: kept operators of order ${order.order}${dimension}.}\\\\`,
    ...header,
    '\\endfirsthead',
    ...header,
    '\\endhead',
    '\\hline',
    '\\endfoot',
  ]
  let last = ''
  for (const { c, o } of kept) {
    const tags = o.tags.map((t) => latexText(t.label ? `${t.kind}: ${t.label}` : t.kind)).join(', ')
    const body = opts.dirac && o.latexDirac ? o.latexDirac : o.latex
    // The class is named on its first operator only; the rest of its rows leave the cell empty.
    lines.push(`${c.key === last ? '' : breakable(classKeyLatex(c.key, names))} & ${breakable(body)} & ${o.realParameters} & ${tags} \\\\`)
    last = c.key
  }
  lines.push('\\end{longtable}', '')
  return lines
}

/** Allow a line break between the factors of a long operator (its top-level thin spaces). */
function breakable(latex: string): string {
  let depth = 0
  let out = ''
  for (let i = 0; i < latex.length; i++) {
    const ch = latex[i]!
    depth += ch === '{' ? 1 : ch === '}' ? -1 : 0
    out += ch
    if (depth === 0 && ch === ',' && latex[i - 1] === '\\') out += '\\allowbreak '
  }
  return out
}
