import { describe, expect, it } from 'vitest'
import { HeavyFrameSchema } from '../../../shared/schemas/heavyFrame'
import { TheorySchema } from '../../../shared/schemas/theory'
import { describeIssue } from '../../../shared/schemas/describeZodError'

describe('HeavyFrameSchema (common practice: schema validation)', () => {
  it('accepts a particle, optional antiparticle, gauge group and maxOrder', () => {
    const ok = HeavyFrameSchema.safeParse({ particle: { name: 'psi', charges: { X: '1' } }, antiparticle: { name: 'chi' }, gaugeGroup: 'X', maxOrder: 3 })
    expect(ok.success).toBe(true)
  })
  it('rejects maxOrder above 4 and an antiparticle with the particle name', () => {
    expect(HeavyFrameSchema.safeParse({ particle: { name: 'psi' }, gaugeGroup: 'X', maxOrder: 5 }).success).toBe(false)
    const same = HeavyFrameSchema.safeParse({ particle: { name: 'psi' }, antiparticle: { name: 'psi' }, gaugeGroup: 'X', maxOrder: 2 })
    expect(same.success).toBe(false)
    expect(describeIssue(same.error!.issues[0]!)).toBe('Antiparticle field, name must differ from the particle field\'s name "psi"')
  })
  it('rejects bad names', () => {
    const bad = HeavyFrameSchema.safeParse({ particle: { name: '1psi' }, gaugeGroup: 'X', maxOrder: 2 })
    expect(bad.success).toBe(false)
    expect(bad.error!.issues[0]!.message).toContain('a name is a letter')
  })
})

describe("a theory's heavy block against its groups and roster (common practice: schema validation)", () => {
  const theory = (heavy: Record<string, unknown>) => ({
    name: 'heavy test',
    frame: 'heavy',
    groups: [
      { name: 'X', type: 'U1', gauge: true },
      { name: 'C', type: 'SU', n: 3, gauge: true },
      { name: 'Bno', type: 'U1', gauge: false },
      { name: 'P', type: 'Z', n: 2, gauge: true },
    ],
    fields: [{ name: 'A', lorentz: 'field-strength', gaugeOf: 'X' }],
    heavy: { particle: { name: 'psi', charges: { X: '1' } }, gaugeGroup: 'X', maxOrder: 2, ...heavy },
  })
  const issues = (heavy: Record<string, unknown>) => {
    const input = theory(heavy)
    const r = TheorySchema.safeParse(input)
    return r.success ? [] : r.error.issues.map((i) => ({ path: i.path.join('.'), message: describeIssue(i, input, 'the theory file') }))
  }

  it('accepts a heavy particle coupled to a U1 or an SU(n) gauge group', () => {
    expect(issues({})).toEqual([])
    expect(issues({ particle: { name: 'psi', reps: { C: [1, 0] } }, gaugeGroup: 'C' })).toEqual([])
  })
  it('names the gauge group when it is missing, global or discrete', () => {
    expect(issues({ gaugeGroup: 'Y' })).toEqual([{ path: 'heavy.gaugeGroup', message: 'Heavy particle, gauge group: the theory has no symmetry named "Y"; choose one of its gauge groups' }])
    expect(issues({ gaugeGroup: 'Bno' })).toEqual([{ path: 'heavy.gaugeGroup', message: 'Heavy particle, gauge group: Bno is a global symmetry (not gauged); choose a gauge group' }])
    expect(issues({ gaugeGroup: 'P' })[0]!.message).toBe('Heavy particle, gauge group: P is the discrete group Z_2; choose a U(1) or SU(n) gauge group')
  })
  it("checks the particle's labels and charges like a roster field's", () => {
    expect(issues({ particle: { name: 'psi', charges: { Y: '1' } } })).toEqual([
      { path: 'heavy.particle.charges.Y', message: 'Heavy particle, particle field, charge under Y: the theory has no symmetry named "Y"; declare it, or remove this entry' },
    ])
    expect(issues({ particle: { name: 'psi', reps: { C: [1] } } })[0]).toEqual({
      path: 'heavy.particle.reps.C',
      message: 'Heavy particle, particle field, representation under C: SU(3) takes 2 Dynkin labels, but [1] has 1',
    })
    expect(issues({ particle: { name: 'psi', charges: { C: '1' } } })[0]!.path).toBe('heavy.particle.charges.C')
  })
  it('refuses a Pauli field named like a roster field or like D', () => {
    expect(issues({ particle: { name: 'A' } })).toEqual([
      { path: 'heavy.particle.name', message: 'Heavy particle, particle field, name is already the name of a field of the roster; choose another name than "A"' },
    ])
    expect(issues({ antiparticle: { name: 'D' } })).toEqual([
      { path: 'heavy.antiparticle.name', message: 'Heavy particle, antiparticle field, name cannot be "D", the covariant derivative; choose another name' },
    ])
  })
})
