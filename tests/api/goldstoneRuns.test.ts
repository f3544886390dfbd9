import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, type World } from '../support/fixtures'
import { messageOf } from '../support/client'

let world: World
let theoryId: number
const definition = { name: 'Three light pions', frame: 'goldstone', groups: [], fields: [], goldstone: { coset: 'chiral', N: 3, sources: { scalar: true, vector: true }, maxOrder: 4 } }

beforeAll(async () => {
  world = await buildWorld()
  const t = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition })
  expect(t.status, JSON.stringify(t.body)).toBe(201)
  theoryId = t.body.theory.id
})

async function finished(body: Record<string, unknown>) {
  const start = await world.owner.client.post(`/api/theories/${theoryId}/runs`, body)
  expect(start.status, JSON.stringify(start.body)).toBe(201)
  const end = Date.now() + 120_000
  while (Date.now() < end) {
    const { body: r } = await world.owner.client.get(`/api/runs/${start.body.run.id}`)
    if (r.run.status === 'done') return r.run
    if (r.run.status === 'failed') throw new Error(r.run.error)
    await new Promise((res) => setTimeout(res, 200))
  }
  throw new Error('run did not finish')
}

describe('Goldstone frame through the run pipeline', () => {
  it('counts per chiral order to p⁸: 2, 12, 117, 1959 for N = 3 with sources (Graf, Henning, Lu, Melia, Murayama, JHEP 01 (2021) 142)', async () => {
    const run = await finished({ kind: 'count', maxOrder: 8 })
    expect(run.maxOrder).toBe(8)
    expect(run.summary.byOrder.map((o: { operators: number }) => o.operators)).toEqual([2, 12, 117, 1959])
  })

  it('stores the explicit p⁴ basis on the board, one class per order: L1 … L10, H1, H2 kept (Gasser & Leutwyler, Nucl. Phys. B 250 (1985) 465); setting one aside leaves the order incomplete', async () => {
    const run = await finished({ kind: 'basis', maxOrder: 4 }) // a run request names its reach: one with neither maxDim nor maxOrder is refused
    expect(run.summary.byOrder.map((o: { order: number; operators: number; tallyOk: boolean }) => [o.order, o.operators, o.tallyOk])).toEqual([
      [2, 2, true],
      [4, 12, true],
    ])
    const { body } = await world.byRole.viewer.client.get(`/api/bases/${run.summary.basisId}`)
    const p4 = body.basis.classes.find((c: { key: string }) => c.key === 'p^4')
    expect(p4).toMatchObject({ order: 4, rank: 12, hilbert: 12, tallyOk: true, frame: 'goldstone', contact: { hilbert: 2, rank: 2, kept: 2 } })
    const kept = body.operators.filter((o: { column: string; order: number }) => o.column === 'kept' && o.order === 4)
    expect(kept).toHaveLength(12)
    const target = kept.find((o: { text: string }) => o.text === '⟨u_μ u_ν u^μ u^ν⟩')
    const moved = await world.byRole.editor.client.post(`/api/operators/${target.id}/move`, { column: 'set_aside', position: 0, version: target.version })
    expect(moved.status, JSON.stringify(moved.body)).toBe(200)
    expect(moved.body.coverage).toEqual({ classKey: 'p^4', rank: 11, required: 12, complete: false })
    // N = 3: ⟨u·u⟩² is the Cayley–Hamilton partner of the term set aside (Gasser & Leutwyler 1985): kept instead, the order is complete again
    const square = body.operators.find((o: { text: string; column: string }) => o.text === '⟨u_μ u^μ⟩⟨u_ν u^ν⟩' && o.column === 'set_aside')
    const back = await world.byRole.editor.client.post(`/api/operators/${square.id}/move`, { column: 'kept', position: 0, version: square.version })
    expect(back.status, JSON.stringify(back.body)).toBe(200)
    expect(back.body.coverage).toEqual({ classKey: 'p^4', rank: 12, required: 12, complete: true })
    // exports carry the chiral orders and both columns
    const json = await world.byRole.viewer.client.get(`/api/bases/${run.summary.basisId}/export?format=json`)
    const p4json = json.body.orders.find((o: { order: number }) => o.order === 4)
    expect(p4json.classes[0].operators.filter((op: { column: string }) => op.column === 'kept')).toHaveLength(12)
    const tex = await world.byRole.viewer.client.get(`/api/bases/${run.summary.basisId}/export?format=latex`)
    expect(tex.status).toBe(200)
    expect(String(tex.body)).toContain('kept operators of order 4')
    // a new run that keeps first what this basis keeps makes the same choice
    const again = await finished({ kind: 'basis', maxOrder: 4, priorities: { keepFromBasis: run.summary.basisId } })
    const next = await world.byRole.viewer.client.get(`/api/bases/${again.summary.basisId}`)
    const keptNow = next.body.operators.filter((o: { column: string; order: number }) => o.column === 'kept' && o.order === 4).map((o: { text: string }) => o.text)
    expect(keptNow).toContain('⟨u_μ u^μ⟩⟨u_ν u^ν⟩')
    expect(keptNow).not.toContain('⟨u_μ u_ν u^μ u^ν⟩')
    expect(keptNow).toHaveLength(12)
  })

  it('rewrites a typed operator onto the kept p⁴ terms: ⟨u·u⟩² = 2⟨u_μ u_ν u^μ u^ν⟩ + 4⟨u_μ u^μ u_ν u^ν⟩ − 2⟨u_μ u_ν⟩⟨u^μ u^ν⟩ for N = 3 (Cayley–Hamilton; Gasser & Leutwyler, Nucl. Phys. B 250 (1985) 465)', async () => {
    const run = await finished({ kind: 'basis', maxOrder: 4 })
    const res = await world.byRole.viewer.client.post(`/api/bases/${run.summary.basisId}/rewrite`, { classKey: 'p^4', text: '<u_μ u^μ><u_ν u^ν>' })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    const { body } = await world.byRole.viewer.client.get(`/api/bases/${run.summary.basisId}`)
    const textOf = (id: number) => body.operators.find((o: { id: number }) => o.id === id).text
    const terms = Object.fromEntries(res.body.rewrite.terms.map((t: { operatorId: number; coefficient: string }) => [textOf(t.operatorId), t.coefficient]))
    expect(terms).toEqual({ '⟨u_μ u_ν u^μ u^ν⟩': '2', '⟨u_μ u^μ u_ν u^ν⟩': '4', '⟨u_μ u_ν⟩⟨u^μ u^ν⟩': '-2' })
    const bad = await world.byRole.viewer.client.post(`/api/bases/${run.summary.basisId}/rewrite`, { classKey: 'p^4', text: '<u_μ u_ν>' })
    expect(bad.status).toBe(422)
    expect(messageOf(bad)).toContain('the index μ appears 1 time')
  })

  it('the scale ladder counts p^k as (p/Λ_χ)^(k−2), as the board heading does: set aside below 1/10 takes p⁴ (1/16) and keeps p² (1) (Manohar and Georgi, Nucl. Phys. B 234 (1984) 189)', async () => {
    const run = await finished({ kind: 'basis', maxOrder: 4 })
    const ladder = {
      scales: [
        { name: 'p', value: '3/10', unit: 'GeV' },
        { name: 'Lambda_chi', value: '6/5', unit: 'GeV' },
      ],
      parameters: [{ name: 'eps', numerator: 'p', denominator: 'Lambda_chi' }],
      orders: [2, 4, 6],
    }
    const saved = await world.byRole.editor.client.request('PUT', `/api/theories/${theoryId}/scales`, { ladder, version: 0 })
    expect(saved.status, JSON.stringify(saved.body)).toBe(200)
    expect(saved.body.computed.orders.map((o: { order: number; exactEstimate: string }) => [o.order, o.exactEstimate])).toEqual([
      [2, '1'],
      [4, '1/16'],
      [6, '1/256'],
    ])
    const read = await world.byRole.viewer.client.get(`/api/theories/${theoryId}/scales`)
    expect(read.body).toMatchObject({ frame: 'goldstone', computed: { leadingOrder: 2 } })
    const res = await world.byRole.editor.client.post(`/api/bases/${run.summary.basisId}/set-aside-below`, { target: 0.1 })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body.orders).toEqual([4])
    expect(res.body.count).toBe(12)
    expect(res.body.estimates.map((o: { order: number; exactEstimate: string }) => [o.order, o.exactEstimate])).toEqual([
      [2, '1'],
      [4, '1/16'],
    ])
  })

  it("refuses a too-deep or odd chiral order in the user's terms and starts nothing", async () => {
    const deep = await world.owner.client.post(`/api/theories/${theoryId}/runs`, { kind: 'basis', maxOrder: 8 })
    expect(deep.status).toBe(400)
    expect(messageOf(deep)).toMatch(/an explicit basis is built up to p\^6/)
    const odd = await world.owner.client.post(`/api/theories/${theoryId}/runs`, { kind: 'count', maxOrder: 5 })
    expect(odd.status).toBe(400)
    expect(messageOf(odd)).toMatch(/even/)
    const plain = await world.owner.client.post(`/api/theories/${theoryId}/runs`, { kind: 'count', maxDim: 6 })
    expect(plain.status).toBe(201) // a mass dimension is ignored: the theory's own chiral order applies
    expect(plain.body.run.maxOrder).toBe(4)
  })
})
