/**
 * The translation matrix of a basis check (checkList.ts) as CSV and as LaTeX: one row per
 * listed operator, one column per kept operator it touches, exact rational entries; a row
 * whose amplitude carries a factor i is marked (its entries are the coefficients of the
 * amplitude divided by i).
 */
import type { CheckReport } from './checkList'

function columnsOf(r: CheckReport): string[] {
  const seen = new Map<string, true>()
  for (const t of r.translation) for (const c of t.terms) seen.set(`${c.class} | ${c.operator}`, true)
  return [...seen.keys()]
}

const csvCell = (s: string): string => (/[",\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s)

/** @example translationCsv(report).split('\n')[0] // "operator,times i,D^2 H^2 H*^2 | …" */
export function translationCsv(r: CheckReport): string {
  const cols = columnsOf(r)
  const lines = [['operator', 'times i', ...cols].map(csvCell).join(',')]
  for (const t of r.translation) {
    const by = new Map(t.terms.map((c) => [`${c.class} | ${c.operator}`, c.coefficient]))
    lines.push([t.operator, t.timesI ? 'yes' : 'no', ...cols.map((c) => by.get(c) ?? '0')].map(csvCell).join(','))
  }
  return lines.join('\n') + '\n'
}

/** LaTeX for a rational written "a/b". */
function texNumber(q: string): string {
  const m = /^(-?)(\d+)\/(\d+)$/.exec(q)
  return m ? `${m[1]}\\tfrac{${m[2]}}{${m[3]}}` : q
}

const texText = (s: string): string =>
  s
    .replace(/([#$%&_{}])/g, '\\$1')
    .replace(/\^/g, '\\^{}')
    .replace(/~/g, '\\~{}')
    .replace(/\*/g, '$^*$')

/**
 * A longtable: each listed operator (as typed, in math mode) = Σ coefficient × kept operator.
 * @example translationLatex(report).startsWith('% Translation') // true
 */
export function translationLatex(r: CheckReport): string {
  const out = [
    '% Translation of a typed operator list into the kept basis (needs \\usepackage{longtable,amsmath}).',
    `% Complete: ${r.complete ? 'yes' : 'no'}; independent: ${r.independent ? 'yes' : 'no'}; rank ${r.rank} of ${r.required}.`,
    '\\begin{longtable}{p{0.45\\textwidth}p{0.5\\textwidth}}',
    'Operator & In the kept basis (class: operator) \\\\ \\hline \\endhead',
  ]
  for (const t of r.translation) {
    const sum =
      t.terms
        .map((c) => `${texNumber(c.coefficient)}\\,[\\text{${texText(c.class)}: ${texText(c.operator)}}]`)
        .join(' + ')
        .replace(/\+ -/g, '- ') || '0'
    out.push(`$${t.operator}$ & $${t.timesI ? `i\\,(${sum})` : sum}$ \\\\`)
  }
  out.push('\\end{longtable}')
  return out.join('\n') + '\n'
}
