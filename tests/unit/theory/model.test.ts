import { describe, expect, it } from 'vitest'
import { buildTheoryModel } from '../../../server/engine/theory/model'
import { basisSpecies } from '../../../server/engine/basis/species'
import { rat, toString } from '../../../server/engine/exact/rational'
import type { Theory } from '../../../shared/schemas/theory'

// The one resolved theory model. Conventions (all-outgoing helicities, two-component spinors):
// Elvang & Huang, Scattering Amplitudes (CUP 2015), §2; Dreiner, Haber & Martin, Phys. Rep. 494
// (2010) 1. Conjugation reverses Dynkin labels and negates charges (Slansky, Phys. Rep. 79 (1981) 1, §4).
const theory: Theory = {
  name: 'resolved',
  frame: 'relativistic',
  groups: [
    { name: 'weak', type: 'SU', n: 2, gauge: true },
    { name: 'colour', type: 'SU', n: 3, gauge: true },
    { name: 'Y', type: 'U1', gauge: true },
    { name: 'P3', type: 'Z', n: 3, gauge: false },
  ],
  fields: [
    { name: 'q', lorentz: 'left-weyl', reps: { weak: [1], colour: [1, 0] }, charges: { Y: '1/6', P3: 1 }, flavors: 2 },
    { name: 'c', lorentz: 'right-weyl', reps: { colour: [0, 1] }, charges: { Y: '-2/3' } },
    { name: 'phi', lorentz: 'scalar', real: true },
    { name: 'G', lorentz: 'field-strength', gaugeOf: 'colour' },
  ],
}

describe('the theory model', () => {
  const m = buildTheoryModel(theory)
  const by = (label: string) => m.species.find((s) => s.label === label)!

  it('lists each field then its conjugate, a real scalar once, a field strength as two halves', () => {
    expect(m.species.map((s) => s.label)).toEqual(['q', 'q*', 'c', 'c*', 'phi', 'G_L', 'G_R'])
    expect(m.species.map((s) => s.conjugate)).toEqual(['q*', 'q', 'c*', 'c', 'phi', 'G_R', 'G_L'])
    expect(m.species.map((s) => m.species[s.partner]!.label)).toEqual(m.species.map((s) => s.conjugate))
  })

  it('resolves Lorentz irreps, spinors, helicities and mass dimensions', () => {
    expect(m.species.map((s) => s.lorentz)).toEqual(['L', 'R', 'R', 'L', 'S', 'FL', 'FR'])
    expect(m.species.map((s) => [s.angles, s.squares, s.helicity2, s.dim2])).toEqual([
      [1, 0, -1, 3],
      [0, 1, 1, 3],
      [0, 1, 1, 3],
      [1, 0, -1, 3],
      [0, 0, 0, 2],
      [2, 0, -2, 4],
      [0, 2, 2, 4],
    ])
    expect(m.species.map((s) => s.fermion)).toEqual([true, true, true, true, false, false, false])
  })

  it('conjugates representations and charges; the SU(2) doublet\'s conjugate is the "anti" kind', () => {
    expect(by('q*').reps).toEqual({ weak: [1], colour: [0, 1] })
    expect(by('q').suKind).toEqual({ weak: 'fund', colour: 'fund' })
    expect(by('q*').suKind).toEqual({ weak: 'anti', colour: 'anti' })
    expect(toString(by('q*').u1.Y!)).toBe('-1/6')
    expect(by('q*').zn).toEqual({ P3: 2 })
    expect(by('G_L').reps).toEqual({ weak: [0], colour: [1, 1] })
    expect(by('G_R').suKind).toEqual({ weak: 'singlet', colour: 'adj' })
    expect(by('G_L').u1.Y).toEqual(rat(0))
  })

  it('applies an nf override to declared flavors only', () => {
    expect(m.species.map((s) => s.flavors)).toEqual([2, 2, 1, 1, 1, 1, 1])
    expect(buildTheoryModel(theory, { nf: 3 }).species.map((s) => s.flavors)).toEqual([3, 3, 1, 1, 1, 1, 1])
    expect(() => buildTheoryModel(theory, { nf: 0 })).toThrow('The number of flavors must be a whole number from 1 to 6, not 0')
  })

  it('the on-shell basis writes any SU(N) irrep as a tensor (kind other) and refuses, naming it, a real field it cannot write', () => {
    const sextet: Theory = { ...theory, fields: [{ name: 'S6', lorentz: 'scalar', reps: { colour: [2, 0] } }] }
    expect(buildTheoryModel(sextet).species[0]!.suKind.colour).toBe('other')
    expect(basisSpecies(sextet).map((s) => s.label)).toEqual(['S6', 'S6*'])
    const bi: Theory = {
      ...theory,
      groups: [
        { name: 'A', type: 'SU', n: 2, gauge: false },
        { name: 'B', type: 'SU', n: 2, gauge: false },
      ],
      fields: [{ name: 'P', lorentz: 'scalar', real: true, reps: { A: [1], B: [1] } }],
    }
    expect(() => basisSpecies(bi)).toThrow('field P: a real field in A = SU(2) [1] is not written as a tensor with equal upper and lower index shapes')
  })
})
