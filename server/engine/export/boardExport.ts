/** The data an export is made from: one basis as the board shows it. */
export interface ExportOperator {
  id: number
  column: 'kept' | 'set_aside'
  text: string
  latex: string
  latexDirac?: string | null
  hermitian: boolean
  realParameters: number
  flavorComponents?: number
  tags: { kind: string, label: string }[]
  notes: { author: string, body: string, createdAt: string }[]
}
export interface ExportClass { key: string, rank: number, hilbert: number | null, tallyOk: boolean | null, operators: ExportOperator[] }
export interface ExportOrder { order: number, dimension: number | null, classes: ExportClass[] }
export interface BoardExport {
  format: 'scalewright-basis'
  formatVersion: 1
  theory: { name: string, definition: unknown }
  countingRule: string
  note: string
  exportedAt: string
  orders: ExportOrder[]
}

/** Group flat operator rows into orders and classes (orders ascending, classes in stored order). */
export function assembleExport(input: {
  theory: { name: string, definition: unknown }, countingRule: string, note: string, exportedAt: string,
  classes: { order: number, dimension: number | null, key: string, rank: number, hilbert: number | null, tallyOk: boolean | null }[],
  operators: (Omit<ExportOperator, 'tags' | 'notes'> & { order: number, classKey: string })[],
  tags: { operatorId: number, kind: string, label: string }[],
  notes: { operatorId: number | null, authorName: string | null, body: string, createdAt: string | Date }[],
}): BoardExport {
  const orders = new Map<number, ExportOrder>()
  for (const c of input.classes) {
    const order = c.order
    if (!orders.has(order)) orders.set(order, { order, dimension: c.dimension ?? null, classes: [] })
    orders.get(order)!.classes.push({ key: c.key, rank: c.rank, hilbert: c.hilbert, tallyOk: c.tallyOk, operators: [] })
  }
  for (const op of input.operators) {
    const cls = orders.get(op.order)?.classes.find((c) => c.key === op.classKey)
    if (!cls) continue
    const { order: _o, classKey: _k, ...rest } = op
    cls.operators.push({
      ...rest,
      tags: input.tags.filter((t) => t.operatorId === op.id).map(({ kind, label }) => ({ kind, label })),
      notes: input.notes.filter((n) => n.operatorId === op.id).map((n) => ({ author: n.authorName ?? 'former member', body: n.body, createdAt: new Date(n.createdAt).toISOString() })),
    })
  }
  return {
    format: 'scalewright-basis', formatVersion: 1, theory: input.theory, countingRule: input.countingRule,
    note: input.note, exportedAt: input.exportedAt, orders: [...orders.values()].sort((a, b) => a.order - b.order),
  }
}
