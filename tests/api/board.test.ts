import { describe, it, expect, beforeAll } from 'vitest'
import { get as httpGet } from 'node:http'
import { gunzipSync } from 'node:zlib'
import { buildWorld, addBasis, type World } from '../support/fixtures'
import { messageOf } from '../support/client'
import { testDb } from '../support/db'
import { FINGERPRINT_VERSION } from '../../server/engine/board/fingerprintVersion'

let world: World
let basis: Awaited<ReturnType<typeof addBasis>>
beforeAll(async () => {
  world = await buildWorld()
  basis = await addBasis(world)
})

async function version(id: number) {
  return (await testDb()('operators').where({ id }).first('version')).version as number
}

describe('the basis board API', () => {
  it('reads a basis with both columns for every member', async () => {
    const res = await world.byRole.viewer.client.get(`/api/bases/${basis.basisId}`)
    expect(res.status).toBe(200)
    expect(res.body.operators.filter((o: any) => o.column === 'kept')).toHaveLength(3)
    expect(res.body.operators.filter((o: any) => o.column === 'set_aside').length).toBeGreaterThan(0)
    expect(res.body.coverage['D^2 phi^2 phi*^2']).toEqual({ rank: 1, required: 1, complete: true })
  })

  it("moves an operator, and reports a collaborator's move of the same operator instead of losing it", async () => {
    const id = basis.operatorIds.sextic
    const v = await version(id)
    const first = await world.byRole.editor.client.post(`/api/operators/${id}/move`, { column: 'set_aside', position: 0, version: v })
    expect(first.status).toBe(200)
    expect(first.body.operator).toMatchObject({ column: 'set_aside', position: 0, version: v + 1 })
    expect(first.body.coverage).toEqual({ classKey: 'phi^3 phi*^3', rank: 0, required: 1, complete: false })
    expect(first.body.rewrite).toBeNull() // independent of what stays kept
    const stale = await world.owner.client.post(`/api/operators/${id}/move`, { column: 'kept', position: 0, version: v })
    expect(stale.status).toBe(409)
    expect(messageOf(stale)).toMatch(/moved this operator meanwhile/)
    // A move of a different operator by the other collaborator merges.
    const other = basis.operatorIds.photon
    const merged = await world.owner.client.post(`/api/operators/${other}/move`, { column: 'set_aside', position: 5, version: await version(other) })
    expect(merged.status).toBe(200)
    const positions = await testDb()('operators').where({ basis_id: basis.basisId, column: 'set_aside' }).orderBy('position').select('id', 'position')
    expect(positions.map((p) => p.position)).toEqual(positions.map((_, i) => i))
  })

  it('refuses a redundant keep, and rewrites a set-aside operator onto the kept ones exactly', async () => {
    const { derivative, alternative } = basis.operatorIds
    const redundant = await world.byRole.editor.client.post(`/api/operators/${alternative}/move`, { column: 'kept', position: 0, version: await version(alternative) })
    expect(redundant.status).toBe(409)
    expect(messageOf(redundant)).toMatch(/would make the kept set of class .+ redundant: it is a combination of the kept operator/)
    const rw = await world.byRole.viewer.client.get(`/api/operators/${alternative}/rewrite`)
    expect(rw.body.rewrite.terms).toHaveLength(1)
    expect(rw.body.rewrite.terms[0].operatorId).toBe(derivative)
    expect(rw.body.rewrite.terms[0].coefficient).toMatch(/^-?\d+(\/\d+)?$/)
    // Swap: set the kept one aside (coverage drops), keep the alternative (coverage returns).
    const out = await world.byRole.editor.client.post(`/api/operators/${derivative}/move`, { column: 'set_aside', position: 0, version: await version(derivative) })
    expect(out.body.coverage.complete).toBe(false)
    const back = await world.byRole.editor.client.post(`/api/operators/${alternative}/move`, { column: 'kept', position: 0, version: await version(alternative) })
    expect(back.status).toBe(200)
    expect(back.body.coverage).toMatchObject({ rank: 1, required: 1, complete: true })
    const swapped = await world.byRole.viewer.client.get(`/api/operators/${derivative}/rewrite`)
    expect(swapped.body.rewrite.terms[0].operatorId).toBe(alternative)
  })

  it('rewrites a typed operator; a total derivative in the class is a combination of the kept one (common practice)', async () => {
    const res = await world.byRole.viewer.client.post(`/api/bases/${basis.basisId}/rewrite`, { classKey: 'phi^3 phi*^3', text: '2' })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    const bad = await world.byRole.viewer.client.post(`/api/bases/${basis.basisId}/rewrite`, { classKey: 'phi^3 phi*^3', text: '<12' })
    expect(bad.status).toBe(422)
    expect(messageOf(bad)).toMatch(/^Cannot read "<12" in "<12"; write brackets such as <12>/)
  })

  it("rewrites typed operators with coefficients beyond one prime's reach (7001/3, 1/9000, 123457), on new and old bases alike", async () => {
    const fresh = await addBasis(world)
    const bases = () => testDb()('bases').where({ id: fresh.basisId })
    expect((await bases().first('fingerprint_version')).fingerprint_version).toBe(FINGERPRINT_VERSION)
    const ask = async (classKey: string, text: string) => {
      const res = await world.byRole.viewer.client.post(`/api/bases/${fresh.basisId}/rewrite`, { classKey, text })
      expect(res.status, JSON.stringify(res.body)).toBe(200)
      return res.body.rewrite.terms.map((t: { operatorId: number; coefficient: string }) => [t.operatorId, t.coefficient])
    }
    const { derivative, photon } = fresh.operatorIds
    const all = async () => [await ask('D^2 phi^2 phi*^2', '7001/3 <12>[12]'), await ask('D^2 phi^2 phi*^2', '-1/9000 <12>[12]'), await ask('phi phi* A_L^2', '123457 <34>^2')]
    const expected = [[[derivative, '7001/3']], [[derivative, '-1/9000']], [[photon, '123457']]]
    expect(await all()).toEqual(expected)
    // A basis stored before versions were recorded (null) is read as version 1 and rewrites the same.
    await bases().update({ fingerprint_version: null })
    expect(await all()).toEqual(expected)
    // From sampling code the current one does not reproduce: the stored kept fingerprints are
    // not used (spoiled here to prove it), the kept operators are fingerprinted from their texts.
    await bases().update({ fingerprint_version: FINGERPRINT_VERSION + 1000 })
    const spoiled = { primes: [67108837, 67108777], values: [new Array(20).fill(1), new Array(20).fill(1)] }
    await testDb()('operators')
      .whereIn('id', [derivative, photon])
      .update({ fingerprint: JSON.stringify(spoiled) })
    expect(await all()).toEqual(expected)
  }, 180_000) // nine rewrites through the engine thread: ~30 s on a shared machine, past the 60 s default under heavy load

  it('tags and filters: threshold tags name the field, duplicates are refused', async () => {
    const id = basis.operatorIds.photon
    const noLabel = await world.byRole.commenter.client.post(`/api/operators/${id}/tags`, { kind: 'threshold' })
    expect(noLabel.status).toBe(400)
    expect(messageOf(noLabel)).toBe('Label is required: name the heavy field whose integration shifts this coefficient')
    const tag = await world.byRole.commenter.client.post(`/api/operators/${id}/tags`, { kind: 'threshold', label: 'coefficient shifts when T is integrated out' })
    expect(tag.status).toBe(201)
    const dup = await world.byRole.commenter.client.post(`/api/operators/${id}/tags`, { kind: 'threshold', label: 'coefficient shifts when T is integrated out' })
    expect(dup.status).toBe(409)
  })

  it('notes keep their edit history', async () => {
    const note = await world.byRole.commenter.client.post(`/api/theories/${world.theoryId}/annotations`, { body: 'first', operatorId: basis.operatorIds.photon })
    expect(note.status).toBe(201)
    await world.byRole.commenter.client.patch(`/api/annotations/${note.body.annotation.id}`, { body: 'second' })
    const hist = await world.byRole.viewer.client.get(`/api/annotations/${note.body.annotation.id}/revisions`)
    expect(hist.body.revisions.map((r: any) => r.body)).toEqual(['first'])
  })

  it('exports LaTeX, CSV and JSON, and a JSON export imports back', async () => {
    const client = world.byRole.viewer.client
    const tex = await client.get(`/api/bases/${basis.basisId}/export?format=latex`)
    expect(tex.status).toBe(200)
    expect(String(tex.body)).toContain('kept operators of order 2')
    const csv = await client.get(`/api/bases/${basis.basisId}/export?format=csv`)
    expect(String(csv.body).split('\r\n')[0]).toMatch(/^order,dimension,class,column/)
    const json = await client.get(`/api/bases/${basis.basisId}/export?format=json`)
    expect(json.body.format).toBe('scalewright-basis')
    expect((await client.get(`/api/bases/${basis.basisId}/export?format=pdf`)).status).toBe(400)

    const snapshot = json.body
    // Move everything to kept, then import the snapshot back: the columns return.
    for (const op of await testDb()('operators').where({ basis_id: basis.basisId, column: 'set_aside' })) {
      await testDb()('operators').where({ id: op.id }).update({ column: 'kept' })
    }
    const imp = await world.byRole.editor.client.post(`/api/bases/${basis.basisId}/import`, snapshot)
    expect(imp.status, JSON.stringify(imp.body)).toBe(200)
    const after = await testDb()('operators').where({ basis_id: basis.basisId }).select('text', 'column')
    const expected = snapshot.orders.flatMap((o: any) => o.classes.flatMap((c: any) => c.operators.map((op: any) => ({ text: op.text, column: op.column }))))
    expect(after.sort((a, b) => a.text.localeCompare(b.text))).toEqual(expected.sort((a: any, b: any) => a.text.localeCompare(b.text)))

    const bad = structuredClone(snapshot)
    bad.orders[0].classes[0].operators[0].text = 'no such operator'
    const refused = await world.byRole.editor.client.post(`/api/bases/${basis.basisId}/import`, bad)
    expect(refused.status).toBe(422)
    expect(messageOf(refused)).toMatch(/not in this basis/)
  })

  it('sends the board gzip-compressed to clients that accept it, and the same JSON plainly otherwise', async () => {
    const path = `/api/bases/${basis.basisId}`
    const cookie = world.byRole.viewer.client.cookie
    const plain = await rawGet(path, { cookie, 'accept-encoding': 'identity' })
    expect(plain.headers['content-encoding']).toBeUndefined()
    const board = JSON.parse(plain.body.toString('utf8'))
    expect(board.role).toBe('viewer')
    for (const header of ['gzip', 'br, gzip;q=0.5', 'gzip, deflate, br, zstd', '*']) {
      const zipped = await rawGet(path, { cookie, 'accept-encoding': header })
      expect(zipped.headers['content-encoding'], header).toBe('gzip')
      expect(zipped.headers.vary).toMatch(/accept-encoding/i)
      expect(zipped.body.length).toBeLessThan(plain.body.length)
      expect(JSON.parse(gunzipSync(zipped.body).toString('utf8'))).toEqual(board)
    }
    for (const header of ['gzip;q=0', 'br', 'deflate, *;q=0']) {
      expect((await rawGet(path, { cookie, 'accept-encoding': header })).headers['content-encoding'], header).toBeUndefined()
    }
    // Each role gets its own bytes: the owner's copy says owner.
    const owner = await rawGet(path, { cookie: world.owner.client.cookie, 'accept-encoding': 'gzip' })
    expect(JSON.parse(gunzipSync(owner.body).toString('utf8')).role).toBe('owner')
  })
})

/** A GET through node:http, which (unlike fetch) leaves the body as the server encoded it. */
function rawGet(path: string, headers: Record<string, string>): Promise<{ headers: Record<string, string | string[] | undefined>; body: Buffer }> {
  return new Promise((resolve, reject) => {
    const req = httpGet(`${world.owner.client.baseUrl}${path}`, { headers }, (res) => {
      const chunks: Buffer[] = []
      res.on('data', (c: Buffer) => chunks.push(c))
      res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }))
      res.on('error', reject)
    })
    req.on('error', reject)
  })
}
