import type { Knex } from 'knex'
import type { OrderZeroReport } from '../engine/basis/orderZero'
import type { BasisOperator } from '../engine/basis/describe'
import { thresholdText } from '../../shared/schemas/boardRequests'

/** Order-0 classes as the basis stores them (beside the higher orders' classes). */
export function orderZeroClassRows(z: OrderZeroReport) {
  return z.classes.map((c) => ({
    order: 0,
    dimension: c.dimension,
    key: c.key,
    conjugateKey: c.conjugateKey,
    rank: c.rank,
    hilbert: null,
    tallyOk: null,
    role: c.role,
    realParameters: c.flavorParameters ?? c.realParameters,
    message: c.flavorParameters === null ? 'with several flavours of a repeated field the flavour count is not computed: real parameters for one flavour' : (c.message ?? null),
    flavor: null,
    cpEven: null,
    cpOdd: null,
    pEven: null,
    pOdd: null,
    parityReason: null,
  }))
}

/** Order-0 operators: kept (with their role and note), then the alternatives set aside. */
export function orderZeroOperators(z: OrderZeroReport): { classKey: string; column: 'kept' | 'set_aside'; op: BasisOperator }[] {
  return z.classes.flatMap((c) => [
    ...c.operators.map((op) => ({ classKey: c.key, column: 'kept' as const, op })),
    ...c.alternatives.map((op) => ({ classKey: c.key, column: 'set_aside' as const, op })),
  ])
}

/** A stored operator row of order 0 (the basis id is added by the caller). */
export function orderZeroRow(o: { classKey: string; column: 'kept' | 'set_aside'; op: BasisOperator }, position: number) {
  const { fingerprint, ...structure } = o.op
  return {
    order: 0,
    class_key: o.classKey,
    column: o.column,
    position,
    text: o.op.text.slice(0, 400),
    latex: o.op.latex,
    latex_dirac: o.op.latex4 ?? null,
    hermitian: o.op.hermitian,
    real_parameters: o.op.realParameters,
    structure: JSON.stringify(structure),
    fingerprint: fingerprint ? JSON.stringify(fingerprint) : null,
  }
}

interface ThresholdRow {
  field: string
  details: { group?: string; scale?: number; unit?: string }
}

/**
 * A child theory's threshold tags (from integrating out) on its board: each goes on the gauge
 * kinetic operator of the group it names, with the heavy field and the threshold scale.
 */
export async function tagThresholdsOnOrderZero(trx: Knex.Transaction, basisId: number, theoryId: number, theory: { fields?: { name: string; lorentz: string; gaugeOf?: string }[] }) {
  const thresholds: ThresholdRow[] = await trx('threshold_tags').where({ theory_id: theoryId }).select('field', 'details')
  if (!thresholds.length) return
  const kinetic = await trx('operators').where({ basis_id: basisId, order: 0 }).where('text', 'like', 'kinetic %').select('id', 'text')
  const strengthOf = new Map((theory.fields ?? []).filter((f) => f.lorentz === 'field-strength' && f.gaugeOf).map((f) => [f.gaugeOf!, f.name]))
  const rows = thresholds.flatMap((t) => {
    const op = kinetic.find((o) => o.text === `kinetic ${strengthOf.get(t.details?.group ?? '')}`)
    const at = t.details?.scale !== undefined ? ` at ${t.details.scale} ${t.details.unit ?? ''}`.trimEnd() : ''
    return op ? [{ operator_id: op.id, kind: 'threshold', label: `${thresholdText(t.field)}${at}`.slice(0, 120), created_by: null }] : []
  })
  if (rows.length) await trx('tags').insert(rows).onConflict(['operator_id', 'kind', 'label']).ignore()
}
