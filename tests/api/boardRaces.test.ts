import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, addBasis, type World } from '../support/fixtures'
import { messageOf, type Reply } from '../support/client'
import { testDb } from '../support/db'
import { boardHealth, operatorVersion } from '../support/boardCheck'

// Races on the basis board: moves and reorders of one order by several editors at once. Each
// class's kept set must stay independent, stored coverage must match the kept operators, and
// no request may end in a 5xx (a deadlock or a lost race is a 409 with a reason, never a 500).
let world: World
let basis: Awaited<ReturnType<typeof addBasis>>
const CLASS = 'D^2 phi^2 phi*^2' // rank 1: one kept operator, four redundant alternatives

beforeAll(async () => {
  world = await buildWorld()
  basis = await addBasis(world)
})

function move(client: World['owner']['client'], id: number, column: 'kept' | 'set_aside', position: number, version: number) {
  return client.post(`/api/operators/${id}/move`, { column, position, version })
}
async function classOps(column: 'kept' | 'set_aside') {
  return testDb()('operators').where({ basis_id: basis.basisId, class_key: CLASS, column }).orderBy('id').select('id', 'version')
}
const statuses = (replies: Reply[]) => replies.map((r) => r.status).sort()

describe('concurrent moves on the board', () => {
  it('two editors keeping two different alternatives of a rank-1 class at once: one wins, the other is told why (4 trials)', async () => {
    const editor = world.byRole.editor.client
    const owner = world.owner.client
    const kept = (await classOps('kept'))[0]!
    expect((await move(editor, kept.id, 'set_aside', 0, kept.version)).status).toBe(200)
    for (let trial = 0; trial < 4; trial++) {
      const [a, b] = await classOps('set_aside')
      const replies = await Promise.all([move(editor, a!.id, 'kept', 0, a!.version), move(owner, b!.id, 'kept', 0, b!.version)])
      expect(statuses(replies), JSON.stringify(replies.map((r) => r.body))).toEqual([200, 409])
      expect(messageOf(replies.find((r) => r.status === 409)!)).toMatch(/would make the kept set of class .+ redundant: it is a combination of the kept operator/)
      const keptNow = await classOps('kept')
      expect(keptNow).toHaveLength(1)
      expect(await boardHealth(basis.basisId)).toEqual({ redundant: [], staleCoverage: [] })
      const board = await editor.get(`/api/bases/${basis.basisId}`)
      expect(board.body.coverage[CLASS]).toEqual({ rank: 1, required: 1, complete: true })
      // Back to an empty kept set for the next trial.
      expect((await move(editor, keptNow[0]!.id, 'set_aside', 0, keptNow[0]!.version)).status).toBe(200)
    }
  })

  it('two editors reordering the same column never deadlock into a 500 (40 trials)', async () => {
    const kept = await testDb()('operators').where({ basis_id: basis.basisId, order: 2, column: 'kept' }).orderBy('position').select('id')
    expect(kept.length).toBeGreaterThanOrEqual(2)
    for (let trial = 0; trial < 40; trial++) {
      const [x, y] = [kept[trial % kept.length]!.id, kept[(trial + 1) % kept.length]!.id]
      const replies = await Promise.all([move(world.byRole.editor.client, x, 'kept', 0, await operatorVersion(x)), move(world.owner.client, y, 'kept', 2, await operatorVersion(y))])
      expect(statuses(replies), JSON.stringify(replies.map((r) => r.body))).toEqual([200, 200])
    }
    const positions = await testDb()('operators').where({ basis_id: basis.basisId, order: 2, column: 'kept' }).orderBy('position').pluck('position')
    expect(positions).toEqual(positions.map((_, i) => i))
  })

  it('a flood of 60 moves and reorders from three editors: no 5xx, no redundant kept set, coverage as stored', async () => {
    const ops = await testDb()('operators').where({ basis_id: basis.basisId, order: 2 }).select('id')
    const clients = [world.byRole.editor.client, world.owner.client, world.byRole.editor.client]
    const replies = await Promise.all(
      Array.from({ length: 60 }, async (_, i) => {
        const id = ops[(i * 7) % ops.length]!.id
        const column = i % 3 === 0 ? 'set_aside' : 'kept'
        return move(clients[i % 3]!, id, column, i % 5, await operatorVersion(id))
      }),
    )
    const bad = replies.filter((r) => r.status >= 500 || (r.status !== 200 && r.status !== 409))
    expect(bad.map((r) => `${r.status} ${messageOf(r)}`)).toEqual([])
    for (const r of replies.filter((x) => x.status === 409)) expect(messageOf(r)).toMatch(/redundant|meanwhile|busy|kept set/)
    expect(await boardHealth(basis.basisId)).toEqual({ redundant: [], staleCoverage: [] })
    for (const column of ['kept', 'set_aside']) {
      const positions = await testDb()('operators').where({ basis_id: basis.basisId, order: 2, column }).orderBy('position').pluck('position')
      expect(positions, column).toEqual(positions.map((_, i) => i))
    }
  })
})

describe('a move answers only after everything that can fail', () => {
  it("a set-aside rewrite beyond the exact lift's reach: 200 with the move and the rewrite marked, never an error after the write", async () => {
    const fresh = await addBasis(world)
    const { derivative, alternative } = fresh.operatorIds
    // The alternative's fingerprint made 123456789012 times the kept one's: a coefficient no
    // two-prime lift can give exactly (|n| ≤ 47 453 092, DEVELOPERS.md).
    const keptPrint = (await testDb()('operators').where({ id: derivative }).first('fingerprint')).fingerprint
    const scaled = { primes: keptPrint.primes, values: keptPrint.values.map((row: number[], i: number) => row.map((v) => Number((BigInt(v) * 123456789012n) % BigInt(keptPrint.primes[i])))) }
    await testDb()('operators')
      .where({ id: alternative })
      .update({ fingerprint: JSON.stringify(scaled) })
    const version = await operatorVersion(alternative)
    const res = await move(world.byRole.editor.client, alternative, 'set_aside', 0, version)
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body.operator).toMatchObject({ column: 'set_aside', position: 0, version: version + 1 })
    expect(res.body.rewrite).toMatchObject({ exact: false })
    expect(res.body.rewrite.message).toMatch(/cannot be given exactly/)
    expect(await operatorVersion(alternative)).toBe(version + 1)
  })
})
