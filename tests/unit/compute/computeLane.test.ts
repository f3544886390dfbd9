import { describe, it, expect } from 'vitest'
import { ComputeLane } from '../../../server/utils/compute/computeLane'
import { ComputeBudgetError, ComputeBusyError } from '../../../server/utils/compute/computeErrors'
import { ResultCache, canonicalJson } from '../../../server/utils/compute/resultCache'

const LADDER = {
  doc: {
    scales: [
      { name: 'E', value: '10', unit: 'GeV' },
      { name: 'M', value: '1', unit: 'TeV' },
    ],
    parameters: [{ name: 'eps', numerator: 'E', denominator: 'M' }],
    orders: [1, 2],
  },
  frame: 'relativistic',
}

describe('compute lane (real threads)', () => {
  it('computes in a thread; over the time budget the thread is ended and the message says so; the next task still runs', async () => {
    const lane = new ComputeLane('computations', { threads: 1, queue: 4, perUser: 4, perGroup: 8, idleMs: 1000 })
    // 1 ms cannot even start the thread: the budget must fire.
    await expect(lane.run('ladder', LADDER, { user: 'u', budgetMs: 1, what: 'This scale ladder' })).rejects.toThrow(ComputeBudgetError)
    await expect(lane.run('ladder', LADDER, { user: 'u', budgetMs: 1, what: 'This scale ladder' })).rejects.toThrow(/takes longer than its budget of 0.001 s/)
    const ok = (await lane.run('ladder', LADDER, { user: 'u', budgetMs: 30_000, what: 'This scale ladder' })) as { parameters: { exact: string }[] }
    // ε = 10 GeV / 1 TeV = 1/100 exactly (arithmetic).
    expect(ok.parameters[0]!.exact).toBe('1/100')
    expect(lane.stats.threads).toBeLessThanOrEqual(1)
  }, 60_000)

  it('refuses past the per-user and the queue limits with ComputeBusyError', async () => {
    const lane = new ComputeLane('quick counts', { threads: 1, queue: 1, perUser: 2, perGroup: 8, idleMs: 1000 })
    const opts = (user: string) => ({ user, budgetMs: 30_000, what: 'x' })
    const a = lane.run('ladder', LADDER, opts('u'))
    const b = lane.run('ladder', LADDER, opts('u'))
    expect(() => lane.run('ladder', LADDER, opts('u'))).toThrow(/You already have 2 quick counts in progress \(the limit is 2 at a time\)/)
    expect(() => lane.run('ladder', LADDER, opts('v'))).toThrow(ComputeBusyError)
    await Promise.all([a, b])
  }, 60_000)

  it('refuses past the per-group limit whoever in the group asks, and counts the group off again when its tasks end', async () => {
    const lane = new ComputeLane('computations', { threads: 1, queue: 8, perUser: 4, perGroup: 3, idleMs: 1000 })
    const opts = (user: string, group: string) => ({ user, group, budgetMs: 30_000, what: 'x' })
    const mine = [lane.run('ladder', LADDER, opts('u', 'g')), lane.run('ladder', LADDER, opts('v', 'g')), lane.run('ladder', LADDER, opts('w', 'g'))]
    expect(() => lane.run('ladder', LADDER, opts('x', 'g'))).toThrow(/Your group already has 3 computations in progress \(the limit is 3 per group at a time\)/)
    // Another group is not held up by the first group's limit.
    const other = lane.run('ladder', LADDER, opts('y', 'h'))
    await Promise.all([...mine, other])
    await expect(lane.run('ladder', LADDER, opts('x', 'g'))).resolves.toBeDefined()
  }, 60_000)

  it('groups take turns: a task of another group starts before the waiting burst of a group already computing', async () => {
    const lane = new ComputeLane('computations', { threads: 1, queue: 8, perUser: 8, perGroup: 8, idleMs: 1000 })
    const order: string[] = []
    const run = (group: string, i: number) => lane.run('ladder', LADDER, { user: `${group}${i}`, group, budgetMs: 30_000, what: 'x' }).then(() => order.push(`${group}${i}`))
    const burst = [0, 1, 2, 3].map((i) => run('g', i))
    const other = run('h', 0)
    await Promise.all([...burst, other])
    // g0 took the one thread at once; h0 arrived last but goes next, ahead of g1–g3.
    expect(order.slice(0, 2)).toEqual(['g0', 'h0'])
  }, 60_000)
})

describe('result cache', () => {
  it('canonical JSON ignores key order; the cache drops the least recently used past its caps', () => {
    expect(canonicalJson({ b: 1, a: { d: 2, c: 3 } })).toBe(canonicalJson({ a: { c: 3, d: 2 }, b: 1 }))
    const cache = new ResultCache(2, 1000)
    cache.set('x', { ok: true, value: 1 })
    cache.set('y', { ok: true, value: 2 })
    cache.get('x')
    cache.set('z', { ok: true, value: 3 })
    expect(cache.get('y')).toBeUndefined()
    expect(cache.get('x')).toEqual({ ok: true, value: 1 })
  })
})
