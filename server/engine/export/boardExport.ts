/**
 * The data an export is made from: one basis as the board shows it. A JSON export is also what
 * import reads back (shared/schemas/importChoice.ts): each operator's column and its place in
 * that column of its order (`position`, from 0), its tags and notes with their authors (name,
 * and account id so that a member is recognised) and dates.
 */
export interface ExportTag {
  kind: string
  label: string
  author: string | null
  authorId: number | null
  createdAt: string | null
}
export interface ExportNote {
  author: string
  authorId: number | null
  body: string
  createdAt: string
}
export interface ExportOperator {
  id: number
  column: 'kept' | 'set_aside'
  position: number
  text: string
  latex: string
  latexDirac?: string | null
  hermitian: boolean
  realParameters: number
  flavorComponents?: number
  tags: ExportTag[]
  notes: ExportNote[]
}
export interface ExportClass {
  key: string
  rank: number
  hilbert: number | null
  tallyOk: boolean | null
  operators: ExportOperator[]
}
export interface ExportOrder {
  order: number
  dimension: number | null
  classes: ExportClass[]
}
export interface BoardExport {
  format: 'scalewright-basis'
  formatVersion: 1
  theory: { name: string; definition: unknown }
  countingRule: string
  note: string
  exportedAt: string
  orders: ExportOrder[]
}

/** Group flat operator rows into orders and classes (orders ascending, classes in stored order). */
export function assembleExport(input: {
  theory: { name: string; definition: unknown }
  countingRule: string
  note: string
  exportedAt: string
  classes: { order: number; dimension: number | null; key: string; rank: number; hilbert: number | null; tallyOk: boolean | null }[]
  operators: (Omit<ExportOperator, 'tags' | 'notes' | 'position'> & { order: number; classKey: string })[]
  tags: { operatorId: number; kind: string; label: string; authorId?: number | null; authorName?: string | null; createdAt?: string | Date | null }[]
  notes: { operatorId: number | null; authorId?: number | null; authorName: string | null; body: string; createdAt: string | Date }[]
}): BoardExport {
  const orders = new Map<number, ExportOrder>()
  for (const c of input.classes) {
    const order = c.order
    // Order 0 mixes mass dimensions 2 to 4 (the renormalizable Lagrangian): no single dimension.
    if (!orders.has(order)) orders.set(order, { order, dimension: order === 0 ? null : (c.dimension ?? null), classes: [] })
    orders.get(order)!.classes.push({ key: c.key, rank: c.rank, hilbert: c.hilbert, tallyOk: c.tallyOk, operators: [] })
  }
  // Operators come by order, column and position: their place in the column counts from 0.
  const places = new Map<string, number>()
  for (const op of input.operators) {
    const cls = orders.get(op.order)?.classes.find((c) => c.key === op.classKey)
    const slot = `${op.order}|${op.column}`
    const position = places.get(slot) ?? 0
    places.set(slot, position + 1)
    if (!cls) continue
    const { order: _o, classKey: _k, ...rest } = op
    cls.operators.push({
      ...rest,
      position,
      tags: input.tags
        .filter((t) => t.operatorId === op.id)
        .map((t) => ({
          kind: t.kind,
          label: t.label,
          author: t.authorName ?? null,
          authorId: t.authorId ?? null,
          createdAt: t.createdAt ? new Date(t.createdAt).toISOString() : null,
        })),
      notes: input.notes
        .filter((n) => n.operatorId === op.id)
        .map((n) => ({
          author: n.authorName ?? 'former member',
          authorId: n.authorId ?? null,
          body: n.body,
          createdAt: new Date(n.createdAt).toISOString(),
        })),
    })
  }
  return {
    format: 'scalewright-basis',
    formatVersion: 1,
    theory: input.theory,
    countingRule: input.countingRule,
    note: input.note,
    exportedAt: input.exportedAt,
    orders: [...orders.values()].sort((a, b) => a.order - b.order),
  }
}
