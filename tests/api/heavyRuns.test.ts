import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, type World } from '../support/fixtures'
import { findPreset } from '../../shared/presets/index'

let world: World
beforeAll(async () => { world = await buildWorld() })

async function runToBasis(definition: unknown, body: Record<string, unknown>): Promise<number> {
  const t = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition })
  expect(t.status, JSON.stringify(t.body)).toBe(201)
  const start = await world.owner.client.post(`/api/theories/${t.body.theory.id}/runs`, body)
  const end = Date.now() + 90_000
  while (Date.now() < end) {
    const { body: r } = await world.owner.client.get(`/api/runs/${start.body.run.id}`)
    if (r.run.status === 'done') return r.run.summary.basisId
    if (r.run.status === 'failed') throw new Error(r.run.error)
    await new Promise((res) => setTimeout(res, 200))
  }
  throw new Error('run did not finish')
}

describe('heavy-particle frame through the run pipeline', () => {
  it('stores the 1/m expansion with the published operators set aside, and the velocity rule moves the kinetic term to leading order', async () => {
    const basisId = await runToBasis({ ...findPreset('heavy-vexonium')!.theory, name: 'Vexonium test' }, { kind: 'basis', maxDim: 5 })
    const { body } = await world.byRole.viewer.client.get(`/api/bases/${basisId}`)
    const classes = body.basis.classes as { key: string, rank: number, message: string }[]
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

  it('the mass-ratio view of a relativistic basis equals its stored orders (common practice)', async () => {
    const basisId = await runToBasis({ ...findPreset('scalar-qed')!.theory, name: 'Scalar QED test' }, { kind: 'basis', maxDim: 6 })
    const { body } = await world.byRole.viewer.client.get(`/api/bases/${basisId}`)
    const view = await world.byRole.viewer.client.get(`/api/bases/${basisId}/orders?rule=${encodeURIComponent('mass ratio (E/M)')}`)
    for (const op of body.operators) expect(view.body.orders[op.id]).toBe(String(op.order))
  })
})
