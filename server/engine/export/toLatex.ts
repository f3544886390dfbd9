import type { BoardExport } from './boardExport'
import { classKeyTex } from '../theory/classKey'

function escapeText(s: string): string {
  return s.replace(/\\/g, '\\textbackslash{}').replace(/([&%$#_{}])/g, '\\$1').replace(/~/g, '\\textasciitilde{}').replace(/\^/g, '\\textasciicircum{}')
}

/** Class keys as math, e.g. "D^2 H^2 H*^2" → "D^{2}\\,H^{2}\\,H^{*2}". */
export const classKeyLatex = classKeyTex

/**
 * The kept basis per order as LaTeX tables ready for a paper, with a short legend of the
 * conventions (two-component notation, counting, what "independent" assumes).
 * @example toLatex(exportOfPhotons) // contains "\begin{tabular}"
 */
export function toLatex(data: BoardExport, opts: { dirac?: boolean } = {}): string {
  const out: string[] = [
    `% Scalewright basis export: ${data.theory.name} (${data.exportedAt})`,
    ...(data.countingRule === '1/m'
      ? ['% Legend: heavy-frame operators in two-component Pauli notation; derivatives act to their right.',
        ...(data.note || '').split('\n').filter(Boolean).map((line) => `% Conventions: ${line}`)]
      : ['% Legend: operators in two-component notation with spinor brackets; derivatives act on the',
        `% field they follow. Independence holds ${data.note || 'modulo equations of motion and integration by parts'}.`]),
    `% Counting rule: ${data.countingRule}; ${data.countingRule === '1/m' ? 'order n = power of 1/m in the heavy-particle frame' : 'order n = mass dimension - 4 under the mass-ratio rule'}.`,
    `% "real par." counts real Wilson-coefficient parameters for one flavor (2 for a non-Hermitian operator and its conjugate).`,
    '',
  ]
  for (const order of data.orders) {
    const kept = order.classes.flatMap((c) => c.operators.filter((o) => o.column === 'kept').map((o) => ({ c, o })))
    if (!kept.length) continue
    out.push('\\begin{table}[ht]', '\\centering', '\\begin{tabular}{llcl}', '\\hline',
      'class & operator & real par. & tags \\\\', '\\hline')
    for (const { c, o } of kept) {
      const tags = o.tags.map((t) => escapeText(t.label ? `${t.kind}: ${t.label}` : t.kind)).join(', ')
      const body = opts.dirac && o.latexDirac ? o.latexDirac : o.latex
      out.push(`$${classKeyLatex(c.key)}$ & $${body}$ & ${o.realParameters} & ${tags} \\\\`)
    }
    out.push('\\hline', '\\end{tabular}',
      `\\caption{${escapeText(data.theory.name)}: kept operators of order ${order.order}${order.dimension === null ? '' : ` (mass dimension ${order.dimension})`}.}`,
      '\\end{table}', '')
  }
  return out.join('\n')
}
