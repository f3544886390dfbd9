/**
 * Board writes under many editors: 50 and 200 concurrent clients move operators between kept
 * and set aside and reorder the columns of one order (SMEFT dimension 6, one flavor) of the
 * built server on a real database, for a fixed time each. Reported: the latency quantiles, the
 * answers by kind (200; 409 for a stale version or a redundant keep, and apart those refused
 * after waiting 10 s for the order's lock; 5xx must be 0) and, read from the tables afterwards,
 * the classes whose kept set is redundant or whose stored coverage is wrong (both must be 0). Each client keeps the versions it was answered, as a browser tab does, and
 * reads an operator's version again after a 409 (as the board reloads).
 */
import type { Knex } from 'knex'
import { buildBasis } from '../server/engine/basis/buildBasis'
import { persistRunResult } from '../server/worker/persistRun'
import { findPreset } from '../shared/presets/index'
import { boardHealth } from '../tests/support/boardHealth'
import { startApp, benchAccount, quantile } from './support/appServer'

const ORDER = 2
const SECONDS = Number(process.env.BENCH_BOARD_SECONDS || 12)
const EDITORS = 8 // accounts; the clients take turns with them

interface Op {
  id: number
  column: 'kept' | 'set_aside'
  version: number
}

async function seed(base: string, db: Knex) {
  const accounts = await Promise.all(Array.from({ length: EDITORS }, (_, i) => benchAccount(base, db, `editor${i}`)))
  const [group] = await db('groups').insert({ slug: 'bench-board', name: 'Bench board' }).returning('id')
  await db('memberships').insert(accounts.map((a, i) => ({ group_id: group.id, user_id: a.id, role: i ? 'editor' : 'owner' })))
  const theory = findPreset('smeft')!.theory
  const [t] = await db('theories')
    .insert({ group_id: group.id, name: 'SMEFT board bench', definition: JSON.stringify(theory) })
    .returning('id')
  const params = { maxDim: 6, nf: 1, theory, theoryVersion: 1 }
  const [run] = await db('runs')
    .insert({ theory_id: t.id, kind: 'basis', params: JSON.stringify(params), status: 'running' })
    .returning('*')
  await persistRunResult(db, { ...run, params }, buildBasis(theory, { maxDim: 6, nf: 1 }))
  const basis = await db('bases').where({ run_id: run.id }).first('id')
  return { cookies: accounts.map((a) => a.cookie), basisId: basis.id as number }
}

/** One editor's loop until `until`: a random operator of the order, moved or reordered at random. */
interface Answer {
  ms: number
  status: number
  lockWait: boolean
}

async function editor(base: string, cookie: string, ops: Op[], db: Knex, until: number, out: Answer[]) {
  while (Date.now() < until) {
    const op = ops[Math.floor(Math.random() * ops.length)]!
    const reorder = Math.random() < 0.5
    const column = reorder ? op.column : op.column === 'kept' ? 'set_aside' : 'kept'
    const t0 = performance.now()
    const res = await fetch(`${base}/api/operators/${op.id}/move`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: base, cookie },
      body: JSON.stringify({ column, position: Math.floor(Math.random() * 40), version: op.version }),
    })
    const body = (await res.json()) as { operator?: { version: number; column: Op['column'] }; message?: string }
    out.push({ ms: performance.now() - t0, status: res.status, lockWait: res.status === 409 && /waited too long/.test(body.message ?? '') })
    if (res.status === 200 && body.operator) Object.assign(op, { version: body.operator.version, column: body.operator.column })
    else Object.assign(op, await db('operators').where({ id: op.id }).first('version', 'column'))
  }
}

async function load(base: string, db: Knex, cookies: string[], basisId: number, clients: number) {
  const rows: Op[] = await db('operators').where({ basis_id: basisId, order: ORDER }).select('id', 'column', 'version')
  const answers: Answer[] = []
  const until = Date.now() + SECONDS * 1000
  await Promise.all(Array.from({ length: clients }, (_, i) => editor(base, cookies[i % cookies.length]!, rows, db, until, answers)))
  const ms = answers.map((a) => a.ms).sort((a, b) => a - b)
  const round = (x: number) => Math.round(x * 10) / 10
  const health = await boardHealth(db, basisId)
  return {
    p50_ms: round(quantile(ms, 0.5)),
    p95_ms: round(quantile(ms, 0.95)),
    p99_ms: round(quantile(ms, 0.99)),
    requests: answers.length,
    ok: answers.filter((a) => a.status === 200).length,
    conflicts_409: answers.filter((a) => a.status === 409).length,
    lock_wait_409: answers.filter((a) => a.lockWait).length,
    server_errors_5xx: answers.filter((a) => a.status >= 500).length,
    other: answers.filter((a) => ![200, 409].includes(a.status) && a.status < 500).length,
    redundant_classes: health.redundant.length,
    stale_coverage_classes: health.staleCoverage.length,
    operators_in_order: rows.length,
  }
}

export default async function bench() {
  const app = await startApp('scalewright_bench_board')
  try {
    const { cookies, basisId } = await seed(app.base, app.db)
    await load(app.base, app.db, cookies, basisId, 10) // warm-up (JIT, pool, caches); not reported
    return {
      [`moves and reorders in one order, 50 editors for ${SECONDS} s`]: await load(app.base, app.db, cookies, basisId, 50),
      [`moves and reorders in one order, 200 editors for ${SECONDS} s`]: await load(app.base, app.db, cookies, basisId, 200),
    }
  } finally {
    await app.stop()
  }
}
