import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, SMALL_THEORY, type World } from '../support/fixtures'
import { messageOf } from '../support/client'

let world: World
let theoryId: number
beforeAll(async () => {
  world = await buildWorld()
  const t = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition: { ...SMALL_THEORY, name: 'Priorities test' } })
  theoryId = t.body.theory.id
})

async function basisOfRun(body: Record<string, unknown>) {
  const start = await world.editorClient().post(`/api/theories/${theoryId}/runs`, body)
  expect(start.status, JSON.stringify(start.body)).toBe(201)
  for (let i = 0; i < 400; i++) {
    const { body: r } = await world.owner.client.get(`/api/runs/${start.body.run.id}`)
    if (r.run.status === 'done') return (await world.owner.client.get(`/api/bases/${r.run.summary.basisId}`)).body
    if (r.run.status === 'failed') throw new Error(r.run.error)
    await new Promise((res) => setTimeout(res, 150))
  }
  throw new Error('run did not finish')
}
const keptText = (board: any, key: string) => board.operators.filter((o: any) => o.classKey === key && o.column === 'kept').map((o: any) => o.text)

describe('priorities steer the choice, never the count (common practice: a basis is defined up to a change of basis)', () => {
  it('derivatives placed on chosen fields change the kept operator of D^2 phi^2 phi*^2 but not the class rank', async () => {
    const plain = await basisOfRun({ kind: 'basis', maxDim: 6 })
    const onConjugate = await basisOfRun({ kind: 'basis', maxDim: 6, priorities: { derivativesOn: ['phi*'] } })
    const key = 'D^2 phi^2 phi*^2'
    expect(keptText(plain, key)).toHaveLength(1)
    expect(keptText(onConjugate, key)).toHaveLength(1)
    expect(keptText(onConjugate, key)).not.toEqual(keptText(plain, key))
    expect(keptText(onConjugate, key)[0]).toContain('<34>[34]')
    // A typed operator still lands on the stored sample points of that basis.
    const rw = await world.byRole.viewer.client.post(`/api/bases/${onConjugate.basis.id}/rewrite`, { classKey: key, text: '<12>[12]' })
    expect(rw.status, JSON.stringify(rw.body)).toBe(200)
    expect(rw.body.rewrite.terms).toHaveLength(1)
  })

  it('keeping what another basis keeps is checked against the theory', async () => {
    const res = await world.editorClient().post(`/api/theories/${theoryId}/runs`, { kind: 'basis', maxDim: 6, priorities: { keepFromBasis: 999999 } })
    expect(res.status).toBe(404)
    expect(messageOf(res)).toBe('This theory has no basis 999999 to keep operators from; choose one of its own bases')
    const plain = await basisOfRun({ kind: 'basis', maxDim: 6 })
    const again = await basisOfRun({ kind: 'basis', maxDim: 6, priorities: { keepFromBasis: plain.basis.id } })
    expect(keptText(again, 'phi phi* A_L^2')).toEqual(keptText(plain, 'phi phi* A_L^2'))
  })
})
