import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, addBasis, type World, DIRAC_AND_SCALAR } from '../support/fixtures'

// Operators typed as papers print them, on the board: the typed rewrite and the list check.
let world: World
let basisId: number
beforeAll(async () => {
  world = await buildWorld()
  basisId = (await addBasis(world)).basisId
})

describe('printed operators on the board (scalar QED, dimension 6)', () => {
  it('the typed rewrite reads printed notation: (φ†φ)□(φ†φ) is a combination of the kept φ⁴D² operators', async () => {
    const res = await world.byRole.viewer.client.post(`/api/bases/${basisId}/rewrite`, { classKey: 'D^2 phi^2 phi*^2', text: '(\\phi^\\dagger\\phi)\\Box(\\phi^\\dagger\\phi)' })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body.rewrite.vanishes).toBe(false)
    expect(res.body.rewrite.timesI).toBe(false)
    const dual = await world.byRole.viewer.client.post(`/api/bases/${basisId}/rewrite`, { classKey: 'phi phi* A_L^2', text: 'φ† φ Ã_{μν} A^{μν}' })
    expect(dual.body.rewrite.timesI).toBe(true) // F̃ = −i F on the left-handed half (common practice)
  })
  it('a printed operator that cannot be read is refused with its position, and nothing changes', async () => {
    const res = await world.byRole.viewer.client.post(`/api/bases/${basisId}/rewrite`, { classKey: 'D^2 phi^2 phi*^2', text: '(\\phi^\\dagger X)' })
    expect(res.status).toBe(422)
    expect(JSON.stringify(res.body)).toMatch(/position 15 .*\\"X\\" is not a field of this theory/)
  })
  it('the list check: complete, the redundant one with its relation, the missing directions, exports', async () => {
    const list = [
      '(\\phi^\\dagger\\phi)\\Box(\\phi^\\dagger\\phi)',
      '(\\phi^\\dagger D^\\mu\\phi)^*(\\phi^\\dagger D_\\mu\\phi)',
      '\\phi^\\dagger\\phi A_{\\mu\\nu}A^{\\mu\\nu}',
      '\\phi^\\dagger\\phi \\tilde A_{\\mu\\nu}A^{\\mu\\nu}',
    ]
    const res = await world.byRole.viewer.client.post(`/api/bases/${basisId}/check-list`, { order: 2, operators: list.join('\n') })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    const r = res.body.report
    expect([r.complete, r.independent, r.rank, r.required]).toEqual([false, false, 3, 4])
    expect(r.missing.map((m: { class: string }) => m.class)).toEqual(['phi^3 phi*^3'])
    expect(r.redundant[0].operator).toBe(list[1])
    expect(res.body.csv.split('\n')[0]).toMatch(/^operator,times i,/)
    expect(res.body.latex).toContain('\\begin{longtable}')
    const order9 = await world.byRole.viewer.client.post(`/api/bases/${basisId}/check-list`, { order: 3, operators: list[0] })
    expect(order9.status).toBe(422)
    expect(JSON.stringify(order9.body)).toMatch(/no order 3/)
  })
})

describe('the typed rewrite on a two-field class of order 0', () => {
  it('answers 200 with the reason (reproduced first: it answered 409 "stored without fingerprints; run it again", which no rerun cures)', async () => {
    const made = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition: { ...DIRAC_AND_SCALAR, name: `Two fields ${Date.now()}` } })
    const start = await world.byRole.editor.client.post(`/api/theories/${made.body.theory.id}/runs`, { kind: 'basis', maxDim: 5 })
    let id = 0
    for (const end = Date.now() + 90_000; Date.now() < end && !id;) {
      const { body } = await world.byRole.viewer.client.get(`/api/runs/${start.body.run.id}`)
      if (body.run.status === 'failed') throw new Error(body.run.error)
      if (body.run.status === 'done') id = body.run.summary.basisId
      else await new Promise((r) => setTimeout(r, 200))
    }
    const res = await world.byRole.viewer.client.post(`/api/bases/${id}/rewrite`, { classKey: 'S^2', text: 'S^2' })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body.rewrite).toBeNull()
    expect(res.body.message).toMatch(/two fields/)
  })
})
