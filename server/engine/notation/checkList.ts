/**
 * Bring your own basis: is a list of printed operators (with their Hermitian conjugates, as a
 * Lagrangian carries them) a complete and independent set at one mass dimension, one flavor?
 * Every operator is lowered onto each class of that dimension and rewritten exactly in the
 * kept operators of the class (modulo EOM and IBP); the list is complete when its span over
 * the complex numbers has the dimension of the whole order (= the number of real
 * parameters), independent when every operator adds its own real parameters (one for a
 * Hermitian operator, two for a non-Hermitian one).
 * Assumes: one flavor; the kept operators of each class are those the given priorities choose
 * (the run's, on the board), not later moves on the board.
 */
import { EngineCancelledError, EngineInputError } from '../errors'
import type { Theory } from '../../../shared/schemas/theory'
import { buildTheoryModel } from '../theory/model'
import { enumerateClasses } from '../counting/classes'
import { classBasis, type ClassBasis, type Priorities } from '../basis/classBasis'
import { conjugateClass, parseClassKey } from '../basis/classKey'
import { basisSpecies } from '../basis/species'
import { rewriteOperator } from '../basis/rewrite'
import { neg, toString as ratString, ONE, ZERO, type Rational } from '../exact/rational'
import type { ParsedOperator } from './ast'
import { parseNotation, parseOptions } from './parse'
import { lowerOperator } from './lower'
import { conjugateItems } from './conjugate'
import { RationalSpan } from './span'
import { notationColumnTerms } from './written'

export interface CheckOptions {
  aliases?: Record<string, string>
  signal?: { aborted: boolean }
  priorities?: Priorities
}

export interface Coordinate {
  class: string
  operator: string
  coefficient: string
}

export interface CheckReport {
  complete: boolean
  independent: boolean
  rank: number
  required: number
  /** Kept operators of the current basis outside the span of the list. */
  missing: { class: string; operator: string }[]
  /** Operators of the list already in the span of those before them, with the exact relation. */
  redundant: { operator: string; relation: { operator: string; coefficient: string }[] }[]
  /** Each listed operator in the kept basis (i· where the amplitude carries a factor i). */
  translation: { operator: string; timesI: boolean; hermitian: boolean; terms: Coordinate[] }[]
  classes: { key: string; required: number; rank: number }[]
}

interface Column {
  cls: string
  operator: string
}

function conjugateOperator(op: ParsedOperator): ParsedOperator {
  return {
    text: `(${op.text})^†`,
    terms: op.terms.map((t) => {
      const c = conjugateItems(t.items)
      return { ...t, iPower: -t.iPower, coeff: c.sign === 1 ? t.coeff : neg(t.coeff), items: c.items }
    }),
  }
}

/** The class bases of one dimension, every class and its conjugate. */
function orderBases(theory: Theory, dimension: number, signal?: { aborted: boolean }, priorities?: Priorities): ClassBasis[] {
  const particles = basisSpecies(theory)
  const model = buildTheoryModel(theory, { nf: 1 })
  const out: ClassBasis[] = []
  const seen = new Set<string>()
  for (const c of enumerateClasses(model, dimension)) {
    if (signal?.aborted) throw new EngineCancelledError('basis check')
    const parsed = parseClassKey(particles, c.key, 1)
    if (parsed.legs.length < 3) continue
    for (const cls of [parsed, conjugateClass(particles, parsed)]) {
      if (seen.has(cls.key)) continue
      seen.add(cls.key)
      const b = classBasis(theory, cls, { signal, priorities, printed: notationColumnTerms })
      if (b.rank > 0) out.push(b)
    }
  }
  return out
}

/** Coordinates of one operator in all kept operators (null entries: not in that class). */
function coordinates(theory: Theory, bases: ClassBasis[], op: ParsedOperator): { values: Rational[]; timesI: boolean | null } {
  const model = buildTheoryModel(theory)
  const values: Rational[] = []
  let timesI: boolean | null = null
  for (const b of bases) {
    let low
    try {
      low = lowerOperator(model, b.class, op)
    } catch (e) {
      if (e instanceof EngineInputError && /has no part in the class/.test(e.message)) {
        values.push(...b.kept.map(() => ZERO))
        continue
      }
      throw e
    }
    if (timesI !== null && timesI !== low.timesI)
      throw new EngineInputError('checkBasis', `"${op.text}" has parts with and without a factor i in different classes; list its Hermitian parts as separate operators`)
    timesI = low.timesI
    values.push(...rewriteOperator(b, { evaluate: low.evaluate, label: op.text }).coefficients.map((c) => c.coefficient))
  }
  return { values, timesI }
}

/** The expensive half of a check: every listed operator (and its conjugate) in the kept operators. */
export interface ListCoordinates {
  columns: Column[]
  classes: { key: string; rank: number }[]
  entries: { line: string; own: Rational[]; conj: Rational[]; hermitian: boolean; timesI: boolean }[]
}

/**
 * Lower and rewrite every listed operator (one per entry; blank lines and lines starting
 * with % or # are skipped).
 * Throws EngineInputError for an operator that cannot be read (naming it and the position).
 */
export function listCoordinates(theory: Theory, dimension: number, texts: string[], opts: CheckOptions = {}): ListCoordinates {
  const lines = texts.map((t) => t.trim()).filter((t) => t !== '' && !t.startsWith('%') && !t.startsWith('#'))
  if (lines.length === 0) throw new EngineInputError('checkBasis', 'The list is empty; give one operator per line')
  const model = buildTheoryModel(theory)
  const bases = orderBases(theory, dimension, opts.signal, opts.priorities)
  const columns: Column[] = bases.flatMap((b) => b.kept.map((k) => ({ cls: b.key, operator: k.text })))
  const entries = lines.map((line) => {
    if (opts.signal?.aborted) throw new EngineCancelledError('basis check')
    const op = parseNotation(line, parseOptions(model, opts.aliases))
    const own = coordinates(theory, bases, op)
    if (own.timesI === null) throw new EngineInputError('checkBasis', `"${line}" has no part in any class of dimension ${dimension}; check its fields and derivatives`)
    const conj = coordinates(theory, bases, conjugateOperator(op))
    const pair = new RationalSpan(columns.length)
    pair.add(own.values)
    return { line, own: own.values, conj: conj.values, hermitian: pair.add(conj.values) !== null, timesI: own.timesI }
  })
  return { columns, classes: bases.map((b) => ({ key: b.key, rank: b.rank })), entries }
}

/**
 * Judge a list from its coordinates (all entries, or those at `keep`).
 * @example judgeList(listCoordinates(smeft, 6, warsaw)).complete // true
 */
export function judgeList(data: ListCoordinates, keep?: number[]): CheckReport {
  const { columns } = data
  const entries = keep ? keep.map((i) => data.entries[i]!) : data.entries
  const span = new RationalSpan(columns.length)
  const rowNames: string[] = []
  const rows: Rational[][] = []
  const report: CheckReport = { complete: false, independent: true, rank: 0, required: columns.length, missing: [], redundant: [], translation: [], classes: [] }
  for (const e of entries) {
    report.translation.push({
      operator: e.line,
      timesI: e.timesI,
      hermitian: e.hermitian,
      terms: e.own.map((c, j) => ({ class: columns[j]!.cls, operator: columns[j]!.operator, coefficient: ratString(c) })).filter((t) => t.coefficient !== '0'),
    })
    const own: [Rational[], string][] = e.hermitian
      ? [[e.own, e.line]]
      : [
          [e.own, e.line],
          [e.conj, `(${e.line})^†`],
        ]
    for (const [v, name] of own) {
      const rel = span.add(v)
      rowNames.push(name)
      rows.push(v)
      if (rel === null) continue
      report.independent = false
      report.redundant.push({ operator: name, relation: [...rel].map(([k, c]) => ({ operator: rowNames[k]!, coefficient: ratString(c) })) })
    }
  }
  report.rank = span.rank
  report.complete = span.rank === columns.length
  report.classes = data.classes.map((c) => {
    const idx = columns.map((col, j) => (col.cls === c.key ? j : -1)).filter((j) => j >= 0)
    const s = new RationalSpan(idx.length)
    for (const r of rows) s.add(idx.map((j) => r[j]!))
    return { key: c.key, required: c.rank, rank: s.rank }
  })
  columns.forEach((c, j) => {
    const unit = columns.map((_, i) => (i === j ? ONE : ZERO))
    if (span.add(unit) === null) report.missing.push({ class: c.cls, operator: c.operator })
  })
  return report
}

/**
 * Check a list of printed operators against the basis of one dimension.
 * @example checkOperatorList(smeft, 6, warsawTable).complete // true
 */
export function checkOperatorList(theory: Theory, dimension: number, texts: string[], opts: CheckOptions = {}): CheckReport {
  return judgeList(listCoordinates(theory, dimension, texts, opts))
}
