import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, type World } from '../support/fixtures'
import { messageOf } from '../support/client'
import { findPreset } from '../../shared/presets/index'

let world: World
beforeAll(async () => {
  world = await buildWorld()
})

async function finishedRun(definition: unknown, body: Record<string, unknown>): Promise<any> {
  const t = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition })
  expect(t.status, JSON.stringify(t.body)).toBe(201)
  const start = await world.owner.client.post(`/api/theories/${t.body.theory.id}/runs`, body)
  expect(start.status, JSON.stringify(start.body)).toBe(201)
  const end = Date.now() + 150_000
  while (Date.now() < end) {
    const { body: r } = await world.owner.client.get(`/api/runs/${start.body.run.id}`)
    if (r.run.status === 'done') return r.run
    if (r.run.status === 'failed') throw new Error(r.run.error)
    await new Promise((res) => setTimeout(res, 200))
  }
  throw new Error('run did not finish')
}
const runToBasis = async (definition: unknown, body: Record<string, unknown>): Promise<number> => (await finishedRun(definition, body)).summary.basisId

describe('heavy-particle frame through the run pipeline', () => {
  it('stores the 1/m expansion with the published operators set aside, and the velocity rule moves the kinetic term to leading order', async () => {
    const basisId = await runToBasis({ ...findPreset('heavy-vexonium')!.theory, name: 'Vexonium test' }, { kind: 'basis', maxDim: 5 })
    const { body } = await world.byRole.viewer.client.get(`/api/bases/${basisId}`)
    const classes = body.basis.classes as { key: string; rank: number; message: string }[]
    // Counts 2, 2, 7 at 1/m, 1/m², 1/m³ with the published lists spanning them (Caswell and Lepage,
    // Phys. Lett. B 167 (1986) 437; Manohar, Phys. Rev. D 56 (1997) 230; Hill, Lee, Paz, Solon, Phys. Rev. D 87 (2013) 053017).
    expect(['psi* psi (1/m^1)', 'psi* psi (1/m^2)', 'psi* psi (1/m^3)'].map((k) => classes.find((c) => c.key === k)!.rank)).toEqual([2, 2, 7])
    expect(classes.find((c) => c.key === 'psi* psi (1/m^3)')!.message).toMatch(/span exactly/)
    const kinetic = body.operators.find((o: any) => o.column === 'set_aside' && o.text === 'kinetic')
    expect(kinetic.details.relations[0].relation).toBe('c_k = 1')
    expect(kinetic.details.publishedRewrite.length).toBe(1)

    const rules = await world.byRole.viewer.client.get(`/api/bases/${basisId}/orders`)
    expect(rules.body.rules.map((r: any) => r.name)).toEqual(['1/M', 'velocity'])
    const v = await world.byRole.viewer.client.get(`/api/bases/${basisId}/orders?rule=velocity`)
    // Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125, Table I: D²/2m is leading (v⁰), σ·B/2m is v².
    expect(v.body.orders[kinetic.id]).toBe('0')
    const fermi = body.operators.find((o: any) => o.text === 'fermi')
    expect(v.body.orders[fermi.id]).toBe('2')
    expect((await world.byRole.viewer.client.get(`/api/bases/${basisId}/orders?rule=nope`)).status).toBe(422)
  })

  it('the mass-ratio view of a relativistic basis equals its stored orders above order 0 (common practice)', async () => {
    const basisId = await runToBasis({ ...findPreset('scalar-qed')!.theory, name: 'Scalar QED test' }, { kind: 'basis', maxDim: 6 })
    const { body } = await world.byRole.viewer.client.get(`/api/bases/${basisId}`)
    const view = await world.byRole.viewer.client.get(`/api/bases/${basisId}/orders?rule=${encodeURIComponent('mass ratio (E/M)')}`)
    const above = body.operators.filter((op: any) => op.order > 0)
    expect(above.length).toBeGreaterThan(0)
    for (const op of above) expect(view.body.orders[op.id]).toBe(String(op.order))
    // Order 0 (the renormalizable Lagrangian) defines the leading order and is not re-counted.
    for (const op of body.operators.filter((o: any) => o.order === 0)) expect(view.body.orders[op.id]).toBeUndefined()
  })

  it("a heavy run to 1/m² (maxOrder): one antiparticle convention on the basis, χ classes with no free parameter, published cards in the theory's names with exact rewrites", async () => {
    const theory = { ...findPreset('heavy-vexonium')!.theory, name: 'Vexonium 1/m² test' }
    const run = await finishedRun(theory, { kind: 'basis', maxOrder: 2 })
    expect([run.maxOrder, run.maxDim]).toEqual([2, null])
    expect(run.summary.byOrder.map((o: any) => o.order)).toEqual([0, 1, 2])
    const { body } = await world.byRole.viewer.client.get(`/api/bases/${run.summary.basisId}`)
    // Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125 convention, derived in tests/unit/heavy/antiparticle.test.ts.
    expect(body.basis.note).toContain('Bodwin, Braaten, Lepage convention')
    const chi = body.basis.classes.find((c: any) => c.key === 'chi* chi (1/m^1)')
    expect([chi.rank, chi.realParameters]).toEqual([2, 0])
    const chiOps = body.operators.filter((o: any) => o.classKey === 'chi* chi (1/m^1)')
    expect(chiOps.map((o: any) => o.realParameters)).toEqual([0, 0])
    expect(chiOps.every((o: any) => o.latex.startsWith('\\chi^\\dagger'))).toBe(true)
    // Caswell, Lepage, Phys. Lett. B 167 (1986) 437: c_k D²/2m is ½ of the displayed D^iD^i.
    const kinetic = body.operators.find((o: any) => o.text === 'kinetic')
    expect(kinetic.latex).toContain('\\psi^\\dagger \\frac{\\bm{D}^2}{2m}')
    expect(kinetic.details.publishedRewrite).toEqual([{ id: 'm1.2', coefficient: '1/2' }])
  })

  it('a heavy count run enumerates and reports by order; orders beyond 1/m⁴ are refused with the reason', async () => {
    const theory = { ...findPreset('heavy-vexonium')!.theory, name: 'Vexonium count test' }
    const run = await finishedRun(theory, { kind: 'count', maxOrder: 1 })
    // Caswell, Lepage 1986: D² and σ·B at 1/m, their χ copies fixed by C.
    expect(run.summary.heavy).toBe(true)
    expect(run.summary.byOrder.find((o: any) => o.order === 1)).toMatchObject({ operators: 4, realParameters: 2 })
    const t = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition: { ...theory, name: 'Vexonium too deep' } })
    const deep = await world.owner.client.post(`/api/theories/${t.body.theory.id}/runs`, { kind: 'basis', maxOrder: 5 })
    expect(deep.status).toBe(400)
    expect(messageOf(deep)).toBe('Maximum order must be at most 4 for a heavy-particle run (up to 1/m^4), not 5')
    const neither = await world.owner.client.post(`/api/theories/${t.body.theory.id}/runs`, { kind: 'basis' })
    expect(neither.status).toBe(400)
    expect(messageOf(neither)).toBe('Maximum dimension is required: give the maximum dimension, or the maximum order (the power of 1/m in the heavy frame, dimension − 4 otherwise)')
  })
})
