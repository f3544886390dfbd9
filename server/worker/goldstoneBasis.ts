import type { Knex } from 'knex'
import type { GoldstoneBasisResult, GoldstoneOperator } from '../engine/goldstone/explicit/goldstoneBasis'
import type { RunParams } from './runParams'

/** A finished explicit-basis run of a Goldstone-frame theory. */
export function isGoldstoneBasis(result: unknown): result is GoldstoneBasisResult {
  return typeof result === 'object' && result !== null && 'evaluatedAtN' in result && 'byOrder' in result
}

/**
 * Store a Goldstone-frame basis: one board class per chiral order ("p^6"), because exact rewrites
 * reach across the Hilbert-series classes (the nonlinear terms of an operator carry more letters);
 * the fingerprints of one order share their configurations. Each operator keeps its Hilbert
 * class, intrinsic parity and contact flag in `structure`, set-aside ones their exact rewrite.
 */
export async function writeGoldstoneBasis(trx: Knex.Transaction, run: { id: number; theory_id: number; params: RunParams }, r: GoldstoneBasisResult): Promise<number> {
  const classes = r.byOrder.map((o) => ({
    order: o.order,
    dimension: null,
    frame: 'goldstone',
    key: o.key,
    rank: o.rank,
    hilbert: o.hilbert,
    tallyOk: o.tallyOk,
    message: o.message ?? null,
    contact: o.contact,
    hilbertClasses: o.classes,
    evaluatedAtN: r.evaluatedAtN,
  }))
  const rows: Record<string, unknown>[] = []
  const add = (order: number, key: string, column: 'kept' | 'set_aside', op: GoldstoneOperator, position: number) =>
    rows.push({
      order,
      class_key: key,
      column,
      position,
      text: op.text.slice(0, 400),
      latex: op.latex,
      latex_dirac: null,
      hermitian: true,
      real_parameters: 1,
      structure: JSON.stringify({ goldstone: true, classKey: op.classKey, letters: op.letters, parity: op.parity, contact: op.contact, rewrite: op.rewrite ?? null }),
      fingerprint: JSON.stringify(op.fingerprint),
    })
  for (const o of r.byOrder) {
    o.kept.forEach((op, i) => add(o.order, o.key, 'kept', op, i))
    o.alternatives.forEach((op, i) => add(o.order, o.key, 'set_aside', op, i))
  }
  const [basis] = await trx('bases')
    .insert({
      theory_id: run.theory_id,
      run_id: run.id,
      theory_version: run.params.theoryVersion,
      counting_rule: 'chiralOrder',
      max_order: Math.max(...r.byOrder.map((o) => o.order)),
      classes: JSON.stringify(classes),
      note: r.note,
      coverage: JSON.stringify(Object.fromEntries(classes.map((c) => [c.key, { rank: c.rank, required: c.hilbert, complete: c.rank === c.hilbert }]))),
    })
    .returning('id')
  for (let i = 0; i < rows.length; i += 500) await trx('operators').insert(rows.slice(i, i + 500).map((row) => ({ ...row, basis_id: basis.id })))
  return basis.id
}
