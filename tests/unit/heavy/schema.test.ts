import { describe, expect, it } from 'vitest'
import { HeavyFrameSchema } from '../../../shared/schemas/heavyFrame'

describe('HeavyFrameSchema (common practice: schema validation)', () => {
  it('accepts a particle, optional antiparticle, gauge group and maxOrder', () => {
    const ok = HeavyFrameSchema.safeParse({ particle: { name: 'psi', charges: { X: '1' } }, antiparticle: { name: 'chi' }, gaugeGroup: 'X', maxOrder: 3 })
    expect(ok.success).toBe(true)
  })
  it('rejects maxOrder above 4 and an antiparticle with the particle name', () => {
    expect(HeavyFrameSchema.safeParse({ particle: { name: 'psi' }, gaugeGroup: 'X', maxOrder: 5 }).success).toBe(false)
    const same = HeavyFrameSchema.safeParse({ particle: { name: 'psi' }, antiparticle: { name: 'psi' }, gaugeGroup: 'X', maxOrder: 2 })
    expect(same.success).toBe(false)
    expect(same.error!.issues[0]!.message).toBe('heavy frame: the antiparticle field needs its own name, but both are "psi"')
  })
  it('rejects bad names', () => {
    const bad = HeavyFrameSchema.safeParse({ particle: { name: '1psi' }, gaugeGroup: 'X', maxOrder: 2 })
    expect(bad.success).toBe(false)
    expect(bad.error!.issues[0]!.message).toContain('a name is a letter')
  })
})
