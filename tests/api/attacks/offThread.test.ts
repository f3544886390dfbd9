import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, addBasis, type World } from '../../support/fixtures'
import { ApiClient, messageOf, type Reply } from '../../support/client'
import { hostileLadder, p95, timed } from '../../support/hostile'

// Attack suite, issue 12 item 1, for every route whose engine work moved into the compute pool:
// a burst of that route (export, rule view, rewrites, tower, ladder page, gauge running, board
// moves and imports) while 20 board reads of another group run. Asserted: the server's event
// loop never stalls (its longest stall, read from /api/health, stays within 200 ms of the longer
// one of the same 20 reads alone, just before and just after), and the burst is answered (200,
// or 429 naming a limit). The reads' p95 is printed for the report but not asserted: on this
// shared machine (load averages of 20–30 on 2 cores were seen) it swings by a second between two
// runs of the same reads, from the CPU the pool's threads take, while a stall of the event loop
// is what a computation on the request thread would cause.
let world: World
let other: World
let basisId: number
let ops: Awaited<ReturnType<typeof addBasis>>['operatorIds']
let token: string
let otherBasis: number

const otherRead = () => other.byRole.viewer.client.get(`/api/bases/${otherBasis}`)
const twentyReads = () => Promise.all(Array.from({ length: 20 }, () => timed(otherRead)))
/** The event loop's longest stall (ms) since the previous reading. */
const longestStall = async () => (await new ApiClient().get('/api/health')).body.longestStallMs as number

/** Run `burst` while 20 board reads of the other group run; the event loop must not stall (see above). */
async function readsStayFast(name: string, burst: () => Promise<Reply[]>) {
  await longestStall()
  const alone = await twentyReads()
  const stallBefore = await longestStall()
  const pending = burst()
  const reads = await twentyReads()
  const replies = await pending
  const stall = await longestStall()
  // The same reads alone once more after the burst: the machine's own stalls, on both sides of it.
  await twentyReads()
  const aloneStall = Math.max(stallBefore, await longestStall())
  console.log(`[attack] ${name}: board reads p95 ${Math.round(p95(alone))} ms alone, ${Math.round(p95(reads))} ms beside; longest event-loop stall ${aloneStall} ms alone, ${stall} ms beside`)
  expect(stall).toBeLessThan(200 + aloneStall)
  for (const r of replies) {
    expect([200, 429], `${name}: ${r.status} ${messageOf(r)}`).toContain(r.status)
    if (r.status === 429) expect(messageOf(r)).toMatch(/the limit is \d+/)
  }
  expect(
    replies.some((r) => r.status === 200),
    name,
  ).toBe(true)
  return replies
}

const times = <T>(n: number, f: (i: number) => Promise<T>) => Promise.all(Array.from({ length: n }, (_, i) => f(i)))

beforeAll(async () => {
  world = await buildWorld()
  other = await buildWorld()
  ;({ basisId, operatorIds: ops } = await addBasis(world))
  otherBasis = (await addBasis(other)).basisId
  token = (await world.owner.client.post(`/api/theories/${world.theoryId}/share-links`, { expiresInDays: 30 })).body.link.url.split('/share/')[1]
  await otherRead()
})

describe('reads whose engine work runs in the compute pool', () => {
  const viewer = () => world.byRole.viewer.client
  const gets: [string, () => string][] = [
    ['LaTeX export', () => `/api/bases/${basisId}/export?format=latex`],
    ['CSV export', () => `/api/bases/${basisId}/export?format=csv`],
    ['JSON export', () => `/api/bases/${basisId}/export?format=json`],
    ['rule view', () => `/api/bases/${basisId}/orders?rule=${encodeURIComponent('mass ratio (E/M)')}`],
    ['set-aside rewrite', () => `/api/operators/${ops.alternative}/rewrite`],
    ['tower', () => `/api/theories/${world.theoryId}/tower`],
    ['ladder page', () => `/api/theories/${world.theoryId}/scales`],
    ['gauge-running inputs', () => `/api/theories/${world.theoryId}/gauge-running`],
  ]
  for (const [name, path] of gets) {
    it(`${name}: 12 at once beside 20 board reads`, async () => {
      await readsStayFast(name, () => times(12, () => viewer().get(path())))
    })
  }

  it('share link: board, export and rule view, 12 at once beside 20 board reads', async () => {
    const guest = new ApiClient()
    const paths = [`/api/share/${token}`, `/api/share/${token}/export?format=latex`, `/api/share/${token}/orders?rule=${encodeURIComponent('mass ratio (E/M)')}`]
    await readsStayFast('share link', () => times(12, (i) => guest.get(paths[i % 3]!)))
  })

  it('typed rewrite: 6 at once beside 20 board reads', async () => {
    await readsStayFast('typed rewrite', () => times(6, (i) => viewer().post(`/api/bases/${basisId}/rewrite`, { classKey: 'phi^3 phi*^3', text: `${i + 2}` })))
  })

  it('gauge running over 30 decades: 4 at once beside 20 board reads (one per person at a time: 429 for the rest)', async () => {
    // Four different inputs (equal ones would share one computation).
    const body = (i: number) => ({ loops: 2, muFromGeV: 91.1876, alpha: { U: 0.01 + i / 1000 }, plotFromGeV: 1, plotToGeV: 1e30 })
    const replies = await readsStayFast('gauge running', () => times(4, (i) => viewer().post(`/api/theories/${world.theoryId}/gauge-running`, body(i))))
    const busy = replies.filter((r) => r.status === 429)
    expect(busy.length).toBeGreaterThan(0)
    for (const r of busy) expect(messageOf(r)).toMatch(/You already have 1 gauge-coupling calculations in progress \(the limit is 1 at a time\)/)
  })
})

describe('board writes whose math runs in the compute pool (under the board lock, before the write)', () => {
  it('a move out and back beside 20 board reads; answers as before', async () => {
    const editor = world.byRole.editor.client
    const version = async (id: number) => (await world.byRole.viewer.client.get(`/api/bases/${basisId}`)).body.operators.find((o: { id: number }) => o.id === id).version as number
    const [out] = await readsStayFast('move', async () => [await editor.post(`/api/operators/${ops.sextic}/move`, { column: 'set_aside', position: 0, version: await version(ops.sextic) })])
    expect(out!.body.coverage).toMatchObject({ rank: 0, required: 1, complete: false })
    const back = await editor.post(`/api/operators/${ops.sextic}/move`, { column: 'kept', position: 0, version: await version(ops.sextic) })
    expect(back.status).toBe(200)
    expect(back.body.coverage).toMatchObject({ rank: 1, required: 1, complete: true })
  })

  it("an import of the basis's own export beside 20 board reads", async () => {
    const file = (await world.byRole.viewer.client.get(`/api/bases/${basisId}/export?format=json`)).body
    const [res] = await readsStayFast('import', async () => [await world.byRole.editor.client.post(`/api/bases/${basisId}/import`, file)])
    expect(res!.body.columnChanges).toBe(0)
  })

  it('a hostile ladder save beside 20 board reads of another group is refused by the size budget', async () => {
    let saved: Reply | undefined
    await readsStayFast('hostile ladder save', async () => {
      saved = await world.byRole.editor.client.request('PUT', `/api/theories/${world.theoryId}/scales`, { ladder: hostileLadder(), version: 0 })
      return [await world.byRole.viewer.client.get(`/api/theories/${world.theoryId}/scales`)]
    })
    expect(saved!.status).toBe(400)
    expect(messageOf(saved!)).toMatch(/the limit is 2,000/)
  })
})
