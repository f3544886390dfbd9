import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, type World, DIRAC_AND_SCALAR } from '../support/fixtures'

// Order 0 (the renormalizable Lagrangian) on the board of a basis computed by the worker, with
// the threshold tags of an integrate-out step placed on the child's gauge kinetic term.
let world: World
beforeAll(async () => {
  world = await buildWorld()
})

async function basisOfRun(theoryId: number): Promise<number> {
  const start = await world.byRole.editor.client.post(`/api/theories/${theoryId}/runs`, { kind: 'basis', maxDim: 5 })
  expect(start.status, JSON.stringify(start.body)).toBe(201)
  const end = Date.now() + 90_000
  while (Date.now() < end) {
    const { body } = await world.byRole.viewer.client.get(`/api/runs/${start.body.run.id}`)
    if (body.run.status === 'done') return body.run.summary.basisId
    if (body.run.status === 'failed') throw new Error(body.run.error)
    await new Promise((r) => setTimeout(r, 200))
  }
  throw new Error('the basis run did not finish in time')
}

describe('order 0 on the board', () => {
  it('a basis starts with order 0: kinetic, gauge kinetic and θ, mass, cubic and quartic terms, exported with the rest', async () => {
    const made = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition: { ...DIRAC_AND_SCALAR, name: `Order zero ${Date.now()}` } })
    const basisId = await basisOfRun(made.body.theory.id)
    const board = await world.byRole.viewer.client.get(`/api/bases/${basisId}`)
    expect(board.status).toBe(200)
    const zero = board.body.operators.filter((o: any) => o.order === 0)
    // Hand count (Peskin & Schroeder 1995, eq. 4.3 for QED; a real singlet scalar adds S², S³, S⁴ and the Yukawas S eL eR*):
    expect(zero.map((o: any) => o.text).slice(0, 7)).toEqual(['kinetic eL', 'kinetic eR', 'kinetic S', 'kinetic A', 'theta A', 'mass eL eR*', 'mass S S'])
    const classes = board.body.basis.classes.filter((c: any) => c.order === 0).map((c: any) => [c.key, c.role])
    expect(classes).toEqual([
      ['D eL eL*', 'kinetic'],
      ['D eR eR*', 'kinetic'],
      ['D^2 S^2', 'kinetic'],
      ['A_L^2', 'gauge kinetic'],
      ['eL eR*', 'mass'],
      ['S^2', 'mass'],
      ['S^3', 'cubic'],
      ['S^4', 'quartic'],
      ['eL* eR S', 'Yukawa'],
    ])
    expect(board.body.basis.note).toContain('the kinetic terms define them')
    const csv = await world.byRole.viewer.client.get(`/api/bases/${basisId}/export?format=csv`)
    expect(String(csv.body)).toContain('0,,A_L^2,kept,theta A')
  })

  it("integrating out the heavy electron puts its threshold tags on the child's photon kinetic term, with the scale", async () => {
    const made = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition: { ...DIRAC_AND_SCALAR, name: `Tower ${Date.now()}` } })
    const step = await world.byRole.editor.client.post(`/api/theories/${made.body.theory.id}/integrate-out`, { fields: ['eL', 'eR'], scale: { name: 'me', value: 0.51099895, unit: 'MeV' } })
    expect(step.status).toBe(201)
    const basisId = await basisOfRun(step.body.theory.id)
    const board = await world.byRole.viewer.client.get(`/api/bases/${basisId}`)
    const kinetic = board.body.operators.find((o: any) => o.order === 0 && o.text === 'kinetic A')
    const labels = board.body.tags
      .filter((t: any) => t.operatorId === kinetic.id)
      .map((t: any) => [t.kind, t.label])
      .sort()
    expect(labels).toEqual([
      ['threshold', 'coefficient shifts when eL is integrated out at 0.51099895 MeV'],
      ['threshold', 'coefficient shifts when eR is integrated out at 0.51099895 MeV'],
    ])
  })
})
