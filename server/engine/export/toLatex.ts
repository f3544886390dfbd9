import type { BoardExport } from './boardExport'
import { classKeyTex, fieldTexTable } from '../theory/classKey'
import { latexText } from './latexText'

/** Class keys as math, e.g. "D^2 H^2 H*^2" → "D^{2}\\,H^{2}\\,H^{*2}". */
export const classKeyLatex = classKeyTex

// The document's preamble: the tables need amsmath, amssymb and bm (operators) and T1 fonts
// (letters of user text such as ð or ŋ); Latin Modern makes T1 fonts scalable.
const PREAMBLE = ['\\documentclass{article}', '\\usepackage[T1]{fontenc}', '\\usepackage{lmodern}', '\\usepackage{amsmath,amssymb,bm}', '\\begin{document}', '']

/**
 * The kept basis per order as a LaTeX document of tables ready for a paper, with a short
 * legend of the conventions (two-component notation, counting, what "independent" assumes).
 * Every text a user wrote (theory name, tags, note) passes through latexText, so it is printed
 * and never run; the operators' LaTeX is the engine's own.
 * @example toLatex(exportOfPhotons) // contains "\begin{tabular}"
 */
export function toLatex(data: BoardExport, opts: { dirac?: boolean } = {}): string {
  const rule = data.countingRule === '1/m' ? 'order n = power of 1/m in the heavy-particle frame' : 'order n = mass dimension - 4 under the mass-ratio rule'
  const out: string[] = [
    `% Scalewright basis export: ${latexText(data.theory.name)} (${latexText(data.exportedAt)})`,
    ...(data.countingRule === '1/m'
      ? ['% Legend: heavy-frame operators in two-component Pauli notation; derivatives act to their right.',
        ...(data.note || '').split('\n').filter(Boolean).map((line) => `% Conventions: ${latexText(line)}`)]
      : ['% Legend: operators in two-component notation with spinor brackets; derivatives act on the',
        `% field they follow. Independence holds ${latexText(data.note || 'modulo equations of motion and integration by parts')}.`]),
    `% Counting rule: ${latexText(data.countingRule)}; ${rule}.`,
    '% "real par." counts real Wilson-coefficient parameters for one flavor (2 for a non-Hermitian operator and its conjugate).',
    '% To paste the tables into a paper, load amsmath, amssymb and bm there, and fontenc with T1.',
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
  const lines = ['\\begin{table}[ht]', '\\centering', '\\begin{tabular}{llcl}', '\\hline', 'class & operator & real par. & tags \\\\', '\\hline']
  for (const { c, o } of kept) {
    const tags = o.tags.map((t) => latexText(t.label ? `${t.kind}: ${t.label}` : t.kind)).join(', ')
    const body = opts.dirac && o.latexDirac ? o.latexDirac : o.latex
    lines.push(`$${classKeyLatex(c.key, names)}$ & $${body}$ & ${o.realParameters} & ${tags} \\\\`)
  }
  const lagrangian = order.order === 0 && data.countingRule !== '1/m' ? ' (the renormalizable Lagrangian, mass dimension at most 4)' : ''
  const dimension = order.dimension === null ? lagrangian : ` (mass dimension ${order.dimension})`
  lines.push('\\hline', '\\end{tabular}', `\\caption{${latexText(data.theory.name)}: kept operators of order ${order.order}${dimension}.}`, '\\end{table}', '')
  return lines
}
