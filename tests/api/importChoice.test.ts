import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, addBasis, addMember, type World } from '../support/fixtures'
import { messageOf } from '../support/client'
import { rowCounts, testDb } from '../support/db'
import { boardHealth, operatorVersion } from '../support/boardCheck'

// Importing a JSON export: all or nothing, validated (redundant kept sets, repeated or unknown
// operators are refused with the class and operator named), the manual order restored, tags
// and notes carried with their authors and dates, and `changed` counting what really changed.
let world: World

beforeAll(async () => {
  world = await buildWorld()
})

type ExportFile = { orders: { order: number; classes: { key: string; operators: { text: string; column: string; position: number; tags: any[]; notes: any[] }[] }[] }[] }
const allOps = (file: ExportFile) => file.orders.flatMap((o) => o.classes.flatMap((c) => c.operators))

async function exportOf(basisId: number): Promise<ExportFile> {
  const res = await world.byRole.viewer.client.get(`/api/bases/${basisId}/export?format=json`)
  expect(res.status).toBe(200)
  return res.body
}
const importInto = (basisId: number, file: unknown) => world.byRole.editor.client.post(`/api/bases/${basisId}/import`, file)
const placesOf = (basisId: number) => testDb()('operators').where({ basis_id: basisId }).orderBy(['order', 'column', 'position']).select('id', 'column', 'position')

describe('import refuses what would corrupt the board, and changes nothing then', () => {
  it('every operator "kept": refused naming the class and the operator, nothing written', async () => {
    const { basisId } = await addBasis(world)
    const file = await exportOf(basisId)
    for (const op of allOps(file)) op.column = 'kept'
    const before = { rows: await rowCounts(), places: await placesOf(basisId) }
    const res = await importInto(basisId, file)
    expect(res.status).toBe(422)
    expect(messageOf(res)).toMatch(/would make the kept set of 1 class redundant: order 2, class D\^2 phi\^2 phi\*\^2: ".+" is a combination of the kept operators before it/)
    expect({ rows: await rowCounts(), places: await placesOf(basisId) }).toEqual(before)
  })

  it('an operator listed twice, or one the basis does not have: refused with it named', async () => {
    const { basisId } = await addBasis(world)
    const file = await exportOf(basisId)
    const cls = file.orders[0]!.classes[0]!
    const twice = structuredClone(file)
    twice.orders[0]!.classes[0]!.operators.push(structuredClone(cls.operators[0]!))
    const res = await importInto(basisId, twice)
    expect(res.status).toBe(422)
    expect(messageOf(res)).toContain(`more than once: order ${file.orders[0]!.order}, class ${cls.key}: "${cls.operators[0]!.text}"`)
    const unknown = structuredClone(file)
    unknown.orders[0]!.classes[0]!.operators[0]!.text = 'no such operator'
    const res2 = await importInto(basisId, unknown)
    expect(res2.status).toBe(422)
    expect(messageOf(res2)).toContain(`not in this basis (was the file exported from another basis?): order ${file.orders[0]!.order}, class ${cls.key}: "no such operator"`)
  })
})

describe('import restores what the file says', () => {
  it('the manual order comes back exactly, and `changed` counts the operators that moved', async () => {
    const { basisId, operatorIds } = await addBasis(world)
    // A manual order across classes: the sextic operator dragged to the top of kept.
    const move = (id: number, column: string, position: number) => operatorVersion(id).then((version) => world.byRole.editor.client.post(`/api/operators/${id}/move`, { column, position, version }))
    expect((await move(operatorIds.sextic, 'kept', 0)).status).toBe(200)
    const wanted = await placesOf(basisId)
    const file = await exportOf(basisId)
    // Scramble: the photon operator set aside, the sextic one to the end of kept.
    expect((await move(operatorIds.photon, 'set_aside', 0)).status).toBe(200)
    expect((await move(operatorIds.sextic, 'kept', 5)).status).toBe(200)
    const res = await importInto(basisId, file)
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(await placesOf(basisId)).toEqual(wanted)
    expect(res.body.columnChanges).toBe(1) // photon back to kept
    expect(res.body.changed).toBeGreaterThanOrEqual(2)
    expect(await boardHealth(basisId)).toEqual({ redundant: [], staleCoverage: [] })
    // Importing the same file again changes nothing, and says so.
    const again = await importInto(basisId, file)
    expect(again.body).toMatchObject({ changed: 0, columnChanges: 0, reordered: 0 })
  })

  it('tags and notes come along with their authors and dates; a non-member author is kept as text', async () => {
    const { basisId, operatorIds } = await addBasis(world)
    const leaver = await addMember(world, 'commenter')
    const c = world.byRole.commenter
    expect((await c.client.post(`/api/operators/${operatorIds.photon}/tags`, { kind: 'loop' })).status).toBe(201)
    expect((await c.client.post(`/api/theories/${world.theoryId}/annotations`, { body: 'from the commenter', operatorId: operatorIds.photon })).status).toBe(201)
    expect((await leaver.client.post(`/api/theories/${world.theoryId}/annotations`, { body: 'from someone who leaves', operatorId: operatorIds.sextic })).status).toBe(201)
    const file = await exportOf(basisId)
    const notesBefore = await testDb()('annotations').whereIn('operator_id', [operatorIds.photon, operatorIds.sextic]).orderBy('id').select('body', 'created_at')
    // A file with one tag and one note the import cannot take: they are named in the reply.
    const photon = allOps(file).find((o) => o.tags.some((t) => t.kind === 'loop'))!
    photon.tags.push({ kind: 'colourful', label: 'x', author: 'Somebody' })
    photon.notes.push({ author: 'Somebody', body: 'undated', createdAt: 'yesterday-ish' })
    await testDb()('annotations').whereIn('operator_id', [operatorIds.photon, operatorIds.sextic]).delete()
    await testDb()('tags').where({ operator_id: operatorIds.photon }).delete()
    await testDb()('memberships').where({ group_id: world.groupId, user_id: leaver.id }).delete()
    const res = await importInto(basisId, file)
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body.tags).toEqual({ added: 1, alreadyThere: 0 })
    expect(res.body.notes).toEqual({ added: 2, alreadyThere: 0 })
    expect(res.body.authorsKeptAsText).toEqual(['extra-commenter'])
    expect(res.body.leftOut).toEqual([
      { operator: expect.stringContaining('class phi phi* A_L^2'), item: 'tag colourful "x"', reason: expect.stringContaining('is not a tag kind here') },
      { operator: expect.stringContaining('class phi phi* A_L^2'), item: 'note "undated" by Somebody', reason: expect.stringContaining('not a date') },
    ])
    const notes = await testDb()('annotations').whereIn('operator_id', [operatorIds.photon, operatorIds.sextic]).orderBy('created_at').select('body', 'author_id', 'author_name', 'created_at')
    expect(notes.map((n) => [n.body, n.author_id, n.author_name, n.created_at.getTime()])).toEqual([
      ['from the commenter', c.id, null, notesBefore[0]!.created_at.getTime()],
      ['from someone who leaves', null, 'extra-commenter', notesBefore[1]!.created_at.getTime()],
    ])
    const tag = await testDb()('tags').where({ operator_id: operatorIds.photon, kind: 'loop' }).first('created_by')
    expect(tag.created_by).toBe(c.id)
    // The board shows the author kept as text, marked as imported.
    const board = await c.client.get(`/api/bases/${basisId}`)
    expect(board.body.notes.find((n: any) => n.body === 'from someone who leaves')).toMatchObject({ authorId: null, authorName: 'extra-commenter', authorImported: true })
    // Again: everything is already there, nothing is doubled.
    const again = await importInto(basisId, file)
    expect(again.body.tags).toEqual({ added: 0, alreadyThere: 1 })
    expect(again.body.notes).toEqual({ added: 0, alreadyThere: 2 })
  })
})

describe('imports racing moves', () => {
  it('an import and moves of the same order at once: no 5xx, no redundant kept set, coverage as stored', async () => {
    const { basisId } = await addBasis(world)
    const file = await exportOf(basisId)
    const ops = await testDb()('operators').where({ basis_id: basisId }).select('id')
    const replies = await Promise.all([
      importInto(basisId, file),
      importInto(basisId, file),
      ...ops.slice(0, 8).map(async (o, i) => world.owner.client.post(`/api/operators/${o.id}/move`, { column: i % 2 ? 'kept' : 'set_aside', position: 0, version: await operatorVersion(o.id) })),
    ])
    expect(replies.filter((r) => r.status >= 500 || ![200, 409].includes(r.status)).map((r) => `${r.status} ${messageOf(r)}`)).toEqual([])
    expect(await boardHealth(basisId)).toEqual({ redundant: [], staleCoverage: [] })
  })
})
