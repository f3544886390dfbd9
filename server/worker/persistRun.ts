import type { Knex } from 'knex'
import type { CountResult } from '../engine/counting/countOperators'
import type { BasisReport } from '../engine/basis/buildBasis'
import type { BasisOperator } from '../engine/basis/describe'
import type { HeavyEnumeration } from '../engine/heavy/enumerate'
import { writeHeavyBasis } from './heavyBasis'
import type { RunParams } from './runParams'
import { isGoldstoneBasis, writeGoldstoneBasis } from './goldstoneBasis'
import { heavyReport } from '../engine/heavy/report'
import { FINGERPRINT_VERSION } from '../engine/board/fingerprintVersion'
import { heldRun, RunLostError } from './runLease'
import { massRatioOrder } from '../engine/rules/defaultWeights'
import { orderZeroClassRows, orderZeroOperators, orderZeroRow, tagThresholdsOnOrderZero } from './orderZeroBasis'
import { ORDER_ZERO_NOTE } from '../engine/basis/orderZero'

/**
 * Write a finished run in one transaction: nothing of it is visible unless all of it is. The
 * run row is locked first and must still be this attempt's (see runLease.ts), so a worker
 * whose run was taken from it writes nothing.
 */
export async function persistRunResult(db: Knex, run: { id: number; attempts: number; theory_id: number; kind: string; params: RunParams }, result: unknown) {
  await db.transaction(async (trx) => {
    if (!(await heldRun(trx, run).forUpdate().first('id'))) throw new RunLostError(run.id)
    if (run.kind === 'count') {
      await finish(trx, run.id, result)
    } else if (isGoldstoneBasis(result)) {
      const basisId = await writeGoldstoneBasis(trx, run, result)
      await finish(trx, run.id, { goldstone: true, basisId, note: result.note, byOrder: result.byOrder.map((o) => ({ order: o.order, operators: o.rank, hilbert: o.hilbert, tallyOk: o.tallyOk })) })
    } else if (isHeavy(result)) {
      const basisId = await writeHeavyBasis(trx, run, result)
      await finish(trx, run.id, {
        heavy: true,
        basisId,
        note: result.eomNote,
        byOrder: heavyReport(result, false).map((o) => ({
          order: o.order,
          operators: o.operators,
          realParameters: o.realParameters,
          matchesPublished: result.orders.find((x) => x.order === o.order)?.conventionalSpansBasis ?? null,
        })),
      })
    } else {
      const basisId = await writeBasis(trx, run, result as BasisReport)
      await finish(trx, run.id, { ...basisSummary(result as BasisReport), basisId })
    }
  })
}

function isHeavy(result: unknown): result is HeavyEnumeration {
  return typeof result === 'object' && result !== null && 'eomNote' in result && 'orders' in result
}

async function finish(trx: Knex.Transaction, runId: number, summary: unknown) {
  await trx('runs')
    .where({ id: runId })
    .update({ status: 'done', progress: 1, current_label: 'done', summary: JSON.stringify(summary), finished_at: trx.fn.now() })
}

function basisSummary(report: BasisReport) {
  return {
    theory: report.theory,
    note: report.note,
    nf: report.nf,
    byDimension: report.byDimension.map((d) => ({ dimension: d.dimension, operators: d.operators, tallyOk: d.tallyOk, classes: d.classes.length })),
    ...(report.orderZero ? { orderZero: { classes: report.orderZero.classes.length, realParameters: report.orderZero.flavorParameters ?? report.orderZero.realParameters } } : {}),
  }
}

async function writeBasis(trx: Knex.Transaction, run: { id: number; theory_id: number; params: RunParams }, report: BasisReport): Promise<number> {
  const classes = report.byDimension.flatMap((d) =>
    d.classes.map((c) => ({
      order: d.order,
      dimension: d.dimension,
      key: c.key,
      conjugateKey: c.conjugateKey,
      rank: c.rank,
      hilbert: c.hilbert,
      tallyOk: c.tallyOk,
      message: c.message ?? null,
      realParameters: c.flavor?.realParameters ?? c.realParameters,
      flavor: c.flavor ?? null,
      // Discrete symmetries in real parameters (null where undefined), so the board can impose them.
      // With several flavors P also acts on flavor indices (not counted); CP comes from the CP-twisted count.
      ...(c.flavor
        ? { cpEven: c.cpEven ?? null, cpOdd: c.cpOdd ?? null, pEven: null, pOdd: null, parityReason: 'with several flavors, P also acts on flavor indices (not counted)' }
        : { cpEven: c.cpEven ?? null, cpOdd: c.cpOdd ?? null, pEven: c.pEven ?? null, pOdd: c.pOdd ?? null, parityReason: c.parityReason ?? null }),
    })),
  )
  const zeroClasses = report.orderZero ? orderZeroClassRows(report.orderZero) : []
  const [basis] = await trx('bases')
    .insert({
      theory_id: run.theory_id,
      run_id: run.id,
      theory_version: run.params.theoryVersion,
      fingerprint_version: FINGERPRINT_VERSION,
      counting_rule: 'massRatio',
      max_order: massRatioOrder(run.params.maxDim ?? 4),
      classes: JSON.stringify([...zeroClasses, ...classes]),
      note: report.orderZero ? `${report.note}\n${ORDER_ZERO_NOTE}` : report.note,
      // As computed, the kept operators of each class are independent and complete.
      coverage: JSON.stringify(Object.fromEntries([...zeroClasses, ...classes].map((c) => [c.key, { rank: c.rank, required: c.rank, complete: true }]))),
    })
    .returning('id')
  // Positions run per order and column, in class order: kept operators, then the alternatives.
  const next = { kept: new Map<number, number>(), set_aside: new Map<number, number>() }
  const row = (order: number, classKey: string, column: 'kept' | 'set_aside', op: BasisOperator) => {
    const position = next[column].get(order) ?? 0
    next[column].set(order, position + 1)
    const { fingerprint, ...structure } = op
    return {
      basis_id: basis.id,
      order,
      class_key: classKey,
      column,
      position,
      text: op.text.slice(0, 400),
      structure: JSON.stringify(structure),
      fingerprint: fingerprint ? JSON.stringify(fingerprint) : null,
      latex: op.latex,
      latex_dirac: op.latex4 ?? null,
      hermitian: op.hermitian,
      real_parameters: op.realParameters,
    }
  }
  const at = { kept: 0, set_aside: 0 }
  const zero = report.orderZero ? orderZeroOperators(report.orderZero).map((o) => ({ ...orderZeroRow(o, at[o.column]++), basis_id: basis.id })) : []
  const rows = zero.concat(
    report.byDimension.flatMap((d) =>
      d.classes.flatMap((c) => [...c.operators.map((op) => row(d.order, c.key, 'kept', op)), ...(c.alternatives ?? []).map((op) => row(d.order, c.key, 'set_aside', op))]),
    ),
  )
  for (let i = 0; i < rows.length; i += 500) await trx('operators').insert(rows.slice(i, i + 500))
  if (report.orderZero) await tagThresholdsOnOrderZero(trx, basis.id, run.theory_id, run.params.theory as never)
  return basis.id
}

export type { CountResult }
