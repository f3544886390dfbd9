import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, SMALL_THEORY, type World } from '../support/fixtures'
import { testDb } from '../support/db'
import { messageOf } from '../support/client'
import { claimRun } from '../../server/worker/runLease'
import { persistRunResult } from '../../server/worker/persistRun'
import { settleRuns, RUN_LEASE } from '../../server/utils/jobs/orphans'

// Runs whose worker vanished, made by writing the runs row as a killed worker leaves it (the
// fault suite, npm run test:faults, kills real workers). The test worker finishes requeued runs.
let world: World
beforeAll(async () => {
  world = await buildWorld()
})

const PARAMS = JSON.stringify({ maxDim: 6, theory: SMALL_THEORY, theoryVersion: 1 })
async function orphan(fields: { attempts: number; heartbeatSecondsAgo: number; cancel?: boolean; progress?: number; label?: string }) {
  const [run] = await testDb()('runs')
    .insert({
      theory_id: world.theoryId,
      kind: 'count',
      params: PARAMS,
      status: 'running',
      attempts: fields.attempts,
      progress: fields.progress ?? 0.24,
      current_label: fields.label ?? 'dimension 6',
      cancel_requested: fields.cancel ?? false,
      started_at: testDb().raw(`now() - interval '5 minutes'`),
      heartbeat_at: testDb().raw(`now() - make_interval(secs => ?)`, [fields.heartbeatSecondsAgo]),
    })
    .returning('*')
  return run as { id: number; attempts: number }
}

async function poll(id: number, until: (run: any) => boolean, timeoutMs = 30_000) {
  const end = Date.now() + timeoutMs
  let last
  while (Date.now() < end) {
    const res = await world.byRole.viewer.client.get(`/api/runs/${id}`)
    expect(res.status).toBe(200)
    last = res.body.run
    if (until(last)) return last
    await new Promise((r) => setTimeout(r, 200))
  }
  throw new Error(`run ${id} did not settle; last ${JSON.stringify(last)}`)
}

describe('a run whose worker stopped', () => {
  it('is left alone while its heartbeat is recent', async () => {
    const run = await orphan({ attempts: 1, heartbeatSecondsAgo: RUN_LEASE.staleSeconds - 10 })
    const res = await world.byRole.viewer.client.get(`/api/runs/${run.id}`)
    expect(res.body.run).toMatchObject({ status: 'running', progress: 0.24 })
    await testDb()('runs').where({ id: run.id }).update({ status: 'failed', error: 'test cleanup' })
  })

  it('is retried once when read after its heartbeat lapsed, and the retry finishes', async () => {
    const run = await orphan({ attempts: 1, heartbeatSecondsAgo: RUN_LEASE.staleSeconds + 1 })
    const first = (await world.byRole.viewer.client.get(`/api/runs/${run.id}`)).body.run
    expect(['queued', 'running', 'done']).toContain(first.status)
    const done = await poll(run.id, (r) => r.status === 'done' || r.status === 'failed')
    expect(done.status).toBe('done')
    expect(done.summary.byDimension.at(-1).dimension).toBe(6)
    expect((await testDb()('runs').where({ id: run.id }).first('attempts')).attempts).toBe(2)
  })

  it('fails with a message saying the worker stopped once its retry stopped too', async () => {
    const run = await orphan({ attempts: 2, heartbeatSecondsAgo: RUN_LEASE.staleSeconds + 1, progress: 0.24, label: 'dimension 6' })
    const res = await world.byRole.viewer.client.get(`/api/runs/${run.id}`)
    expect(res.body.run.status).toBe('failed')
    expect(res.body.run.error).toBe(
      'The worker stopped while computing this run (at 24 %, "dimension 6") and stopped again on the retry, so the run was not finished and nothing of it was saved. ' +
        "Start it again; if it keeps stopping, it may need more memory than the worker has (the worker's log says why it stopped).",
    )
    expect(res.body.run.finishedAt).not.toBeNull()
  })

  it('is cancelled at once when its heartbeat is a few seconds old, and a second cancel says so', async () => {
    const run = await orphan({ attempts: 1, heartbeatSecondsAgo: RUN_LEASE.cancelStaleSeconds + 1 })
    const res = await world.byRole.editor.client.post(`/api/runs/${run.id}/cancel`)
    expect(res.status).toBe(200)
    expect(res.body.run.status).toBe('cancelled')
    const again = await world.byRole.editor.client.post(`/api/runs/${run.id}/cancel`)
    expect(again.status).toBe(409)
    expect(messageOf(again)).toBe('This run is already cancelled')
  })

  it('whose cancel was asked for ends as cancelled when its worker stops answering, not retried', async () => {
    const run = await orphan({ attempts: 1, heartbeatSecondsAgo: RUN_LEASE.cancelStaleSeconds + 1, cancel: true })
    const res = await world.byRole.viewer.client.get(`/api/runs/${run.id}`)
    expect(res.body.run.status).toBe('cancelled')
  })

  it('a queued run whose job was lost gets a new one and finishes', async () => {
    const [run] = await testDb()('runs')
      .insert({ theory_id: world.theoryId, kind: 'count', params: PARAMS, created_at: testDb().raw(`now() - interval '1 minute'`) })
      .returning('*')
    const done = await poll(run.id, (r) => r.status === 'done')
    expect(done.progress).toBe(1)
  })
})

describe('one run, one worker', () => {
  it('of workers handed the same queued run at once, exactly one claims it', async () => {
    const [run] = await testDb()('runs').insert({ theory_id: world.theoryId, kind: 'count', params: PARAMS, status: 'queued', job_id: 'test-no-job' }).returning('*')
    const claims = await Promise.all(Array.from({ length: 6 }, () => claimRun(testDb(), run.id)))
    expect(claims.filter(Boolean)).toHaveLength(1)
    expect(claims.find(Boolean)!.attempts).toBe(1)
    await testDb()('runs').where({ id: run.id }).update({ status: 'failed', error: 'test cleanup' })
  })

  it('a worker whose run was taken from it writes no result', async () => {
    const run = await orphan({ attempts: 1, heartbeatSecondsAgo: RUN_LEASE.staleSeconds + 1 })
    const stale = { ...run, params: JSON.parse(PARAMS) }
    await settleRuns(testDb(), async () => 'test-no-job', run.id) // another worker requeues it
    await expect(persistRunResult(testDb(), stale as never, { byDimension: [] })).rejects.toThrow(/no longer held by this worker/)
    const row = await testDb()('runs').where({ id: run.id }).first()
    expect(row.status).toBe('queued')
    expect(row.summary).toBeNull()
    await testDb()('runs').where({ id: run.id }).update({ status: 'failed', error: 'test cleanup' })
  })
})
