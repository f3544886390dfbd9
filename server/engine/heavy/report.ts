/**
 * A heavy-frame enumeration as plain data, order by order and class by class, for the
 * command line and summaries: each class with its count, its real parameters and, when asked,
 * its operators (text, LaTeX, real parameters). Order = power of 1/m.
 */
import type { HeavyEnumeration, HeavyOperator } from './enumerate'

export interface ReportOperator {
  id: string
  text: string
  latex: string
  realParameters: number
  fixedBy?: { id: string; factor: number }
}
export interface ReportClass {
  key: string
  count: number
  realParameters: number
  note?: string
  operators?: ReportOperator[]
}
export interface ReportOrder {
  order: number
  operators: number
  realParameters: number
  classes: ReportClass[]
}

/** Plain text of a LaTeX operator (for terminals and spreadsheets). */
export function plainText(latex: string): string {
  return latex
    .replace(/\\left|\\right|\\,|\\mathrm/g, '')
    .replace(/\\dagger/g, '†')
    .replace(/\\bar\{([^}]*)\}/g, '$1bar')
    .replace(/\\overline\{([^}]*)\}/g, '($1)bar')
    .replace(
      /\\(psi|chi|sigma|epsilon|gamma|Sigma|phi|mu|nu|pi)/g,
      (_, g: string) => ({ psi: 'ψ', chi: 'χ', sigma: 'σ', epsilon: 'ε', gamma: 'γ', Sigma: 'Σ', phi: 'φ', mu: 'μ', nu: 'ν', pi: 'π' })[g] ?? g,
    )
    .replace(/[{}]/g, '')
    .replace(/\\/g, '')
    .replace(/\s+/g, ' ')
    .trim()
}

function ops(list: readonly HeavyOperator[], perOp: (op: HeavyOperator) => number): ReportOperator[] {
  return list.map((op) => ({ id: op.id, text: plainText(op.latex), latex: op.latex, realParameters: perOp(op), ...(op.fixedBy ? { fixedBy: op.fixedBy } : {}) }))
}

function push(out: Map<number, ReportClass[]>, order: number, key: string, list: readonly HeavyOperator[], real: number, withOps: boolean, note?: string): void {
  if (list.length === 0) return
  const perOp = list.length ? real / list.length : 0
  const c: ReportClass = { key, count: list.length, realParameters: real, ...(note ? { note } : {}), ...(withOps ? { operators: ops(list, () => perOp) } : {}) }
  out.set(order, [...(out.get(order) ?? []), c])
}

/**
 * Orders and classes of an enumeration (kept operators only; published forms are alternatives).
 * @example heavyReport(vexonium, false)[0] // { order: 0, operators: 1, … } the leading ψ†iD_tψ
 */
export function heavyReport(e: HeavyEnumeration, withOperators: boolean): ReportOrder[] {
  const p = e.particle
  const a = e.antiparticle
  const out = new Map<number, ReportClass[]>()
  push(out, 0, `${p}* ${p} (1/m^0)`, [e.leading as HeavyOperator], 0, withOperators, 'leading order, coefficient fixed by the normalisation of the field')
  for (const o of e.orders) {
    push(out, o.order, `${p}* ${p} (1/m^${o.order})`, o.basis, o.count, withOperators)
    if (a) push(out, o.order, `${a}* ${a} (1/m^${o.order})`, o.antiparticle, 0, withOperators, 'coefficients fixed by charge conjugation (or CPT)')
  }
  for (const f of e.fourFermionOrders) {
    const list = [...f.basis, ...f.fieldStrength]
    push(out, f.order, `${p}* ${p} ${a}* ${a} (1/m^${f.order})`, list, list.length, withOperators)
  }
  for (const h of e.heavyHeavy) push(out, h.order, `${p}* ${p} ${p}* ${p} (1/m^${h.order})`, h.basis, h.count, withOperators)
  for (const c of e.heavyLight) push(out, c.order, c.key, c.basis, c.realParameters, withOperators)
  return [...out.entries()]
    .sort((x, y) => x[0] - y[0])
    .map(([order, classes]) => ({
      order,
      operators: classes.reduce((s, c) => s + c.count, 0),
      realParameters: classes.reduce((s, c) => s + c.realParameters, 0),
      classes,
    }))
}
