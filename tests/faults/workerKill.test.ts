import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { startStack, groupWithTheory, waitUntil, type Stack } from './support/stack'
import type { ApiClient } from '../support/client'
import { findPreset } from '../../shared/presets/index'
import { RUN_LEASE } from '../../server/utils/jobs/orphans'

// kill -9 of the queue worker in the middle of a run, under `npm start`'s supervisor. A long
// run: SMEFT counts to dimension 16 with three flavors (about 10 s of computing here).
let stack: Stack
let owner: ApiClient
let smeftId: number
let smallId: number

beforeAll(async () => {
  stack = await startStack('worker')
  const world = await groupWithTheory(stack)
  owner = world.owner
  smallId = world.theoryId
  const t = await owner.post(`/api/groups/${world.slug}/theories`, { definition: { ...findPreset('smeft')!.theory, name: 'SMEFT for the fault suite' } })
  expect(t.status).toBe(201)
  smeftId = t.body.theory.id
})
afterAll(async () => {
  await stack?.stop()
})

async function run(id: number) {
  const res = await owner.get(`/api/runs/${id}`)
  expect(res.status).toBe(200)
  return res.body.run
}
async function startRun(theoryId: number, body: object) {
  const res = await owner.post(`/api/theories/${theoryId}/runs`, body)
  expect(res.status).toBe(201)
  return res.body.run.id as number
}
const LONG = { kind: 'count', maxDim: 16, nf: 3 }

/** The worker process computing the run, once it has made progress (from runs.worker, host:pid). */
async function workerOf(runId: number, notPid?: number) {
  let pid = 0
  await waitUntil(
    async () => {
      const row = await stack.db('runs').where({ id: runId }).first('status', 'progress', 'worker')
      pid = Number(
        String(row.worker ?? '')
          .split(':')
          .pop(),
      )
      return row.status === 'running' && row.progress > 0 && pid > 0 && pid !== notPid
    },
    90_000,
    () => `run ${runId} was not taken by a worker`,
  )
  return pid
}

/** kill -9 the worker; returns seconds until the run left "running" and the state it reached. */
async function killAndTime(runId: number, pid: number) {
  process.kill(pid, 'SIGKILL')
  const t0 = Date.now()
  let now: any
  await waitUntil(
    async () => {
      now = await run(runId)
      return now.status !== 'running'
    },
    90_000,
    () => `run ${runId} still running: ${JSON.stringify(now)}`,
  )
  return { seconds: (Date.now() - t0) / 1000, run: now }
}

describe('the worker killed (kill -9) mid-run', () => {
  it('the run is retried once, then fails with a clear message, each within a minute; other runs go on', async () => {
    const id = await startRun(smeftId, LONG)
    const first = await workerOf(id)
    const killed = killAndTime(id, first)
    // While the orphan waits, npm start has restarted the worker and a new run goes through.
    const small = await startRun(smallId, { kind: 'count', maxDim: 6 })
    await waitUntil(
      async () => (await run(small)).status === 'done',
      60_000,
      () => 'a new run queued behind the orphan',
    )
    const retry = await killed
    console.log(`[faults] orphaned run noticed after ${retry.seconds.toFixed(1)} s (first kill): ${retry.run.status}`)
    expect(retry.seconds).toBeLessThan(60)
    expect(['queued', 'running', 'done']).toContain(retry.run.status)
    expect(stack.log()).toMatch(new RegExp(`\\[supervisor\\] the worker \\(pid ${first}\\) stopped: killed by SIGKILL .*; restarting it in 1 s`))

    const second = await workerOf(id, first)
    const failed = await killAndTime(id, second)
    console.log(`[faults] orphaned run noticed after ${failed.seconds.toFixed(1)} s (second kill): ${failed.run.status}`)
    expect(failed.seconds).toBeLessThan(60)
    expect(failed.run.status).toBe('failed')
    expect(failed.run.error).toMatch(/^The worker stopped while computing this run \(at \d+ %.*\) and stopped again on the retry, so the run was not finished and nothing of it was saved\./)
    expect((await stack.db('runs').where({ id }).first('attempts')).attempts).toBe(RUN_LEASE.maxAttempts)
  })

  it('cancel ends a run whose worker was killed within seconds, and it is not retried', async () => {
    const id = await startRun(smeftId, LONG)
    const pid = await workerOf(id)
    process.kill(pid, 'SIGKILL')
    const cancel = await owner.post(`/api/runs/${id}/cancel`)
    expect(cancel.status).toBe(200)
    const t0 = Date.now()
    await waitUntil(
      async () => (await run(id)).status === 'cancelled',
      15_000,
      () => 'cancel did not end the orphaned run',
    )
    console.log(`[faults] cancel of an orphaned run took effect after ${((Date.now() - t0) / 1000).toFixed(1)} s`)
    await new Promise((r) => setTimeout(r, RUN_LEASE.sweepMs + 1000))
    expect((await run(id)).status).toBe('cancelled')
  })
})
