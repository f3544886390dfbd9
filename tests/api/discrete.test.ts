import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, type World } from '../support/fixtures'
import { findPreset } from '../../shared/presets/index'

let world: World
beforeAll(async () => {
  world = await buildWorld()
})

async function basisOf(definition: unknown, body: Record<string, unknown>) {
  const t = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition })
  const start = await world.owner.client.post(`/api/theories/${t.body.theory.id}/runs`, body)
  for (let i = 0; i < 600; i++) {
    const { body: r } = await world.owner.client.get(`/api/runs/${start.body.run.id}`)
    if (r.run.status === 'done') return (await world.owner.client.get(`/api/bases/${r.run.summary.basisId}`)).body
    if (r.run.status === 'failed') throw new Error(r.run.error)
    await new Promise((res) => setTimeout(res, 150))
  }
  throw new Error('run did not finish')
}
const sum = (classes: any[], key: string) => classes.reduce((s, c) => s + (c[key] ?? 0), 0)

describe('discrete symmetries stored with a basis, so the board can impose them', () => {
  it('photons at dimension 8: imposing P or CP leaves two of three real parameters (Euler and Heisenberg, Z. Phys. 98 (1936) 714)', async () => {
    const board = await basisOf({ ...findPreset('photons')!.theory, name: 'Photons P test' }, { kind: 'basis', maxDim: 8 })
    const dim8 = board.basis.classes.filter((c: any) => c.dimension === 8)
    expect(sum(dim8, 'realParameters')).toBe(3)
    expect([sum(dim8, 'pEven'), sum(dim8, 'pOdd')]).toEqual([2, 1])
    expect([sum(dim8, 'cpEven'), sum(dim8, 'cpOdd')]).toEqual([2, 1])
    const parities = board.operators.filter((o: any) => o.column === 'kept' && o.order === 4).map((o: any) => o.details.parity)
    expect(parities.filter((p: string) => p === 'odd').length + parities.filter((p: string) => p === null).length).toBeGreaterThan(0)
  })

  it('SMEFT classes with chiral fermions say why parity is undefined (Grzadkowski et al., JHEP 10 (2010) 085: chiral fields have no parity partners)', async () => {
    const board = await basisOf({ ...findPreset('smeft')!.theory, name: 'SMEFT P test' }, { kind: 'basis', maxDim: 6, nf: 1 })
    const weinberg = board.basis.classes.find((c: any) => c.key === 'L^2 H^2')
    expect(weinberg.pEven).toBeNull()
    expect(weinberg.parityReason).toMatch(/no parity partner/)
  })
})
