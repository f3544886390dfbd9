import { describe, expect, it } from 'vitest'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { integrateOut } from '../../../server/engine/scales/integrateOut'
import { thresholdShifts } from '../../../server/engine/scales/thresholdShifts'

/** Standard-Model gauge groups with a heavy vector-like top partner T and a real singlet S. */
const theory = parseTheory({
  name: 'SM plus T and S',
  frame: 'relativistic',
  groups: [
    { name: 'colour', type: 'SU', n: 3, gauge: true },
    { name: 'weak', type: 'SU', n: 2, gauge: true },
    { name: 'Y', type: 'U1', gauge: true },
    { name: 'Bno', type: 'U1', gauge: false },
  ],
  fields: [
    { name: 'Q', lorentz: 'left-weyl', reps: { colour: [1, 0], weak: [1] }, charges: { Y: '1/6', Bno: '1/3' }, flavors: 3 },
    { name: 'H', lorentz: 'scalar', reps: { weak: [1] }, charges: { Y: '1/2' } },
    { name: 'TL', lorentz: 'left-weyl', reps: { colour: [1, 0] }, charges: { Y: '2/3', Bno: '1/3' } },
    { name: 'TR', lorentz: 'right-weyl', reps: { colour: [1, 0] }, charges: { Y: '2/3', Bno: '1/3' } },
    { name: 'S', lorentz: 'scalar', real: true },
    { name: 'G', lorentz: 'field-strength', gaugeOf: 'colour' },
    { name: 'W', lorentz: 'field-strength', gaugeOf: 'weak' },
    { name: 'B', lorentz: 'field-strength', gaugeOf: 'Y' },
  ],
  countingRules: [{ name: 'custom', kind: 'custom', weights: { TL: '1', 'TL*': '1', H: '1' } }],
})

describe('thresholdShifts', () => {
  it('a colour-triplet hypercharged fermion shifts the SU(3) and U(1)_Y kinetic terms, not SU(2) or a global U(1) (Weinberg, Phys. Lett. B 91 (1980) 51; Hall, Nucl. Phys. B 178 (1981) 75)', () => {
    const removed = theory.fields.filter((f) => f.name === 'TL' || f.name === 'TR')
    expect(thresholdShifts(removed, theory.groups)).toEqual([
      { group: 'colour', type: 'SU', fields: ['TL', 'TR'], betaShift: '2/3' },
      { group: 'Y', type: 'U1', fields: ['TL', 'TR'], betaShift: '16/9' },
    ])
  })

  it('a gauge-singlet scalar shifts no gauge coupling (common practice)', () => {
    expect(
      thresholdShifts(
        theory.fields.filter((f) => f.name === 'S'),
        theory.groups,
      ),
    ).toEqual([])
  })

  it('the Higgs doublet shifts SU(2) and Y (common practice)', () => {
    expect(
      thresholdShifts(
        theory.fields.filter((f) => f.name === 'H'),
        theory.groups,
      ).map((s) => s.group),
    ).toEqual(['weak', 'Y'])
  })

  it('a Dirac quark changes the SU(3) coefficient by 2/3, as in β0 = 11 − (2/3) n_f (Gross & Wilczek, PRL 30 (1973) 1343; Politzer, PRL 30 (1973) 1346)', () => {
    const s = thresholdShifts(
      theory.fields.filter((f) => f.name === 'TL' || f.name === 'TR'),
      theory.groups,
    )
    expect(s[0]!.betaShift).toBe('2/3')
  })

  it('all SM matter gives b_Y = 41/6, b_2 = 22/3 − 19/6 = 25/6, b_3 = 11 − 7 = 4 (Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83: b = (41/6, −19/6, −7))', () => {
    const sm = parseTheory({
      name: 'SM',
      frame: 'relativistic',
      groups: [
        { name: 'colour', type: 'SU', n: 3, gauge: true },
        { name: 'weak', type: 'SU', n: 2, gauge: true },
        { name: 'Y', type: 'U1', gauge: true },
      ],
      fields: [
        { name: 'Q', lorentz: 'left-weyl', reps: { colour: [1, 0], weak: [1] }, charges: { Y: '1/6' }, flavors: 3 },
        { name: 'u', lorentz: 'right-weyl', reps: { colour: [1, 0] }, charges: { Y: '2/3' }, flavors: 3 },
        { name: 'd', lorentz: 'right-weyl', reps: { colour: [1, 0] }, charges: { Y: '-1/3' }, flavors: 3 },
        { name: 'L', lorentz: 'left-weyl', reps: { weak: [1] }, charges: { Y: '-1/2' }, flavors: 3 },
        { name: 'e', lorentz: 'right-weyl', charges: { Y: '-1' }, flavors: 3 },
        { name: 'H', lorentz: 'scalar', reps: { weak: [1] }, charges: { Y: '1/2' } },
      ],
    })
    const s = thresholdShifts(sm.fields, sm.groups)
    expect(s.map((x) => [x.group, x.betaShift])).toEqual([
      ['colour', '4'],
      ['weak', '25/6'],
      ['Y', '41/6'],
    ])
  })

  it('rejects a field strength', () => {
    expect(() =>
      thresholdShifts(
        theory.fields.filter((f) => f.name === 'G'),
        theory.groups,
      ),
    ).toThrow('Field "G" is a gauge field strength; only matter fields can be integrated out')
  })
})

describe('integrateOut', () => {
  const r = integrateOut(theory, ['TL', 'TR', 'S'], { name: 'M_T', value: 1.5, unit: 'TeV' })

  it('returns a valid child theory without the removed fields', () => {
    expect(r.child.fields.map((f) => f.name)).toEqual(['Q', 'H', 'G', 'W', 'B'])
    expect(() => parseTheory(r.child)).not.toThrow()
    expect(r.child.name).toBe('SM plus T and S below M_T = 1.5 TeV')
    expect(r.child.countingRules?.[0]?.weights).toEqual({ H: '1' })
    expect(r.thresholdScale.valueMeV).toBe(1.5e6)
  })

  it('tags each (group, field) whose kinetic coefficient shifts', () => {
    expect(r.thresholdTags).toEqual([
      { group: 'colour', field: 'TL', text: 'coefficient shifts when TL is integrated out', betaShift: '1/3' },
      { group: 'colour', field: 'TR', text: 'coefficient shifts when TR is integrated out', betaShift: '1/3' },
      { group: 'Y', field: 'TL', text: 'coefficient shifts when TL is integrated out', betaShift: '8/9' },
      { group: 'Y', field: 'TR', text: 'coefficient shifts when TR is integrated out', betaShift: '8/9' },
    ])
  })

  it('hints tree-level and one-loop classes (de Blas et al., JHEP 03 (2018) 109; Henning, Lu, Murayama, JHEP 01 (2016) 023)', () => {
    const s = r.generatedClasses.filter((h) => h.field === 'S')
    expect(s.map((h) => h.loop)).toEqual(['tree', 'one-loop'])
    const t = r.generatedClasses.filter((h) => h.field === 'TL')
    expect(t.filter((h) => /kinetic term/.test(h.description)).length).toBe(2)
    expect(t.some((h) => /X\^3 at dimension 6/.test(h.description))).toBe(true)
  })

  it('rejects unknown fields, field strengths, repeats and empty lists', () => {
    expect(() => integrateOut(theory, ['X'], { value: 1, unit: 'TeV' })).toThrow('Theory "SM plus T and S" has no field "X"')
    expect(() => integrateOut(theory, ['W'], { value: 1, unit: 'TeV' })).toThrow('Field "W" is a gauge field strength')
    expect(() => integrateOut(theory, ['S', 'S'], { value: 1, unit: 'TeV' })).toThrow('A field is named more than once (S, S)')
    expect(() => integrateOut(theory, [], { value: 1, unit: 'TeV' })).toThrow('Choose at least one heavy field to integrate out')
    expect(() => integrateOut(theory, ['S'], { value: 1, unit: 'parsec' })).toThrow('"parsec" is not a unit Scalewright knows')
  })
})
