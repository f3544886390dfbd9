import type { Knex } from 'knex'
import type { HeavyEnumeration, HeavyOperator } from '../engine/heavy/enumerate'
import type { RunParams } from './runParams'
import type { OrderZeroReport } from '../engine/basis/orderZero'
import { orderZeroClassRows, orderZeroOperators, orderZeroRow } from './orderZeroBasis'

/**
 * Store a heavy-frame enumeration as a basis: per order in 1/m, the ψ†…ψ bilinears kept,
 * the published operators of that order set aside with their rewrite onto the enumerated
 * basis and their coefficient relations, the χ copies and the leading four-fermion sector.
 */
export async function writeHeavyBasis(trx: Knex.Transaction, run: { id: number; theory_id: number; params: RunParams }, e: HeavyEnumeration & { orderZero?: OrderZeroReport }): Promise<number> {
  const p = e.particle
  const a = e.antiparticle
  const classes: Record<string, unknown>[] = []
  const rows: Record<string, unknown>[] = []
  const next = new Map<string, number>()
  const add = (order: number, key: string, column: 'kept' | 'set_aside', op: HeavyOperator, extra: Record<string, unknown> = {}, realParameters = 1) => {
    const slot = `${order}|${column}`
    const position = next.get(slot) ?? 0
    next.set(slot, position + 1)
    rows.push({
      order,
      class_key: key,
      column,
      position,
      text: op.id,
      latex: op.latex,
      latex_dirac: null,
      // An anti-Hermitian operator as written is i × a Hermitian one: one real coefficient.
      hermitian: true,
      real_parameters: realParameters,
      structure: JSON.stringify({
        antiHermitian: !!op.antiHermitian,
        terms: op.terms,
        relations: op.relations,
        gaugeEomNote: op.gaugeEomNote ?? null,
        source: op.source ?? null,
        coefficient: op.coefficient ?? null,
        fixedBy: op.fixedBy ?? null,
        ...extra,
      }),
    })
  }
  // Order 0: ψ†iD_tψ and the light fields' renormalizable Lagrangian.
  if (e.orderZero) {
    classes.push(...orderZeroClassRows(e.orderZero))
    const at = { kept: 0, set_aside: 0 }
    for (const o of orderZeroOperators(e.orderZero)) rows.push(orderZeroRow(o, at[o.column]++))
  }
  for (const o of e.orders) {
    const key = `${p}* ${p} (1/m^${o.order})`
    const spans = o.conventionalSpansBasis
    const redundant = o.conventionalRedundant ? ` (${o.conventionalRedundant} of them redundant here)` : ''
    classes.push({
      order: o.order,
      dimension: null,
      key,
      rank: o.count,
      hilbert: null,
      tallyOk: null,
      message:
        spans === null
          ? null
          : spans
            ? redundant
              ? `the published operators of this order span this space${redundant}`
              : 'the published operators of this order span exactly this space'
            : 'the published operators of this order do NOT span this space',
    })
    for (const op of o.basis) add(o.order, key, 'kept', op)
    for (const op of o.conventional) add(o.order, key, 'set_aside', op, { publishedRewrite: op.rewrite ?? [] })
    if (a && o.antiparticle.length) {
      // χ's bilinears repeat ψ's with fixed coefficients: cards for the record, no free parameter.
      const ckey = `${a}* ${a} (1/m^${o.order})`
      classes.push({
        order: o.order,
        dimension: null,
        key: ckey,
        rank: o.antiparticle.length,
        realParameters: 0,
        hilbert: null,
        tallyOk: null,
        message: 'coefficients fixed by charge conjugation: no free coefficient (see the antiparticle convention)',
      })
      for (const op of o.antiparticle) add(o.order, ckey, 'kept', op, {}, 0)
    }
  }
  // The particle–antiparticle four-fermion sector, enumerated order by order; the published
  // (BBL) forms are set aside with a note on whether they span the space.
  for (const f of a ? (e.fourFermionOrders ?? []) : []) {
    const key = `${p}* ${p} ${a}* ${a} (1/m^${f.order})`
    const spans = f.conventionalSpansBasis
      ? 'the published operators span exactly this space'
      : f.conventionalSpansRestFrame
        ? `the published operators span the ${f.restFrameCount} operators that survive with the pair at rest, not the ${f.count - f.restFrameCount} that depend on its total momentum`
        : 'the published operators do not span this space'
    const withB = f.fieldStrength?.length ? `; plus ${f.fieldStrength.length} with one field strength B` : ''
    classes.push({
      order: f.order,
      dimension: null,
      key,
      rank: f.count + (f.fieldStrength?.length ?? 0),
      hilbert: null,
      tallyOk: null,
      message: `${spans}${withB}; ${e.fourFermionNote ?? ''}`.slice(0, 600),
    })
    for (const op of [...f.basis, ...(f.fieldStrength ?? [])]) add(f.order, key, 'kept', op)
    for (const op of f.conventional) add(f.order, key, 'set_aside', op)
  }
  // Two heavy particles of the same kind: (ψ†ψ)(ψ†ψ) contact operators.
  for (const h of e.heavyHeavy ?? []) {
    const key = `${p}* ${p} ${p}* ${p} (1/m^${h.order})`
    classes.push({
      order: h.order,
      dimension: null,
      key,
      rank: h.count,
      hilbert: null,
      tallyOk: null,
      message: `${h.restFrameCount} of them survive with the pair at rest; ${e.heavyHeavyNote}`.slice(0, 600),
    })
    for (const op of h.basis) add(h.order, key, 'kept', op)
  }
  // Heavy–light contact operators, class by class (light content and order).
  for (const c of e.heavyLight ?? []) {
    classes.push({ order: c.order, dimension: null, key: c.key, rank: c.count, realParameters: c.realParameters, hilbert: null, tallyOk: null, message: (e.heavyLightNote ?? '').slice(0, 600) })
    for (const op of c.basis) add(c.order, c.key, 'kept', op, {}, c.realParameters / c.count)
  }
  const [basis] = await trx('bases')
    .insert({
      theory_id: run.theory_id,
      run_id: run.id,
      theory_version: run.params.theoryVersion,
      counting_rule: '1/m',
      max_order: Math.max(0, ...e.orders.map((o) => o.order), ...(e.heavyLight ?? []).map((c) => c.order)),
      classes: JSON.stringify(classes),
      note: [e.eomNote, e.antiparticleNote, e.orderZero?.note].filter(Boolean).join('\n'),
      coverage: JSON.stringify(Object.fromEntries(classes.map((c) => [c.key, { rank: c.rank, required: c.rank, complete: true }]))),
    })
    .returning('id')
  if (rows.length) await trx('operators').insert(rows.map((r) => ({ ...r, basis_id: basis.id })))
  return basis.id
}
