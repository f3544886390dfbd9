import { describe, expect, it } from 'vitest'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { checkMassPartners, partnerMap } from '../../../server/engine/scales/massPartners'
import { integrateOut } from '../../../server/engine/scales/integrateOut'

// A mass term for Weyl fermions pairs a representation with its conjugate (Dirac), or a field in
// a real representation with itself (Majorana); a pseudo-real one only in pairs (antisymmetric
// invariant). Common practice; see e.g. Dreiner, Haber, Martin, Phys. Rept. 494 (2010) 1, §3.
const theory = parseTheory({
  name: 'Vector-like and chiral',
  frame: 'relativistic',
  groups: [
    { name: 'SU3c', type: 'SU', n: 3, gauge: true },
    { name: 'SU2L', type: 'SU', n: 2, gauge: true },
    { name: 'Y', type: 'U1', gauge: true },
    { name: 'Lno', type: 'U1', gauge: false },
  ],
  fields: [
    { name: 'Q', lorentz: 'left-weyl', reps: { SU3c: [1, 0], SU2L: [1] }, charges: { Y: '1/6' }, flavors: 3 },
    { name: 'u', lorentz: 'right-weyl', reps: { SU3c: [1, 0] }, charges: { Y: '2/3' }, flavors: 3 },
    { name: 'TL', lorentz: 'left-weyl', reps: { SU3c: [1, 0] }, charges: { Y: '2/3' } },
    { name: 'TR', lorentz: 'right-weyl', reps: { SU3c: [1, 0] }, charges: { Y: '2/3' } },
    { name: 'Tc', lorentz: 'left-weyl', reps: { SU3c: [0, 1] }, charges: { Y: '-2/3' } },
    { name: 'N', lorentz: 'right-weyl' },
    { name: 'NL', lorentz: 'right-weyl', charges: { Lno: '1' } },
    { name: 'Wino', lorentz: 'left-weyl', reps: { SU2L: [2] } },
    { name: 'D1', lorentz: 'left-weyl', reps: { SU2L: [1] } },
    { name: 'D2', lorentz: 'left-weyl', reps: { SU2L: [1] } },
    { name: 'H', lorentz: 'scalar', reps: { SU2L: [1] }, charges: { Y: '1/2' } },
    { name: 'G', lorentz: 'field-strength', gaugeOf: 'SU3c' },
  ],
})

describe('checkMassPartners', () => {
  it('a Dirac pair, L and R with equal charges, is accepted; either half alone is refused, offering the other', () => {
    expect(checkMassPartners(theory, ['TL', 'TR'])).toEqual({ problems: [], partners: [] })
    const half = checkMassPartners(theory, ['TL'])
    expect(half.problems).toHaveLength(1)
    expect(half.problems[0]).toContain('TL cannot be integrated out without a partner')
    expect(half.problems[0]).toContain('under SU3c, SU2L, Y, Lno')
    // u, TR (right-handed, same charges) and Tc (left-handed, conjugate) can each give TL its mass:
    // a choice, not one partner to add.
    expect(half.problems[0]).toContain('choose from u, TR, Tc so that 1 Weyl copy more join the set')
    expect(half.partners).toEqual([])
    const pair = parseTheory({ ...theory, fields: theory.fields.filter((f) => f.name !== 'u' && f.name !== 'Tc') })
    expect(checkMassPartners(pair, ['TR'])).toMatchObject({ partners: ['TL'] })
    expect(checkMassPartners(pair, ['TR']).problems[0]).toContain('the theory has TL for that')
  })

  it('two left-handed fields in conjugate representations form a Dirac fermion', () => {
    expect(checkMassPartners(theory, ['TL', 'Tc']).problems).toEqual([])
  })

  it('a chiral fermion of the Standard Model has no partner: refused, nothing offered', () => {
    const r = checkMassPartners(theory, ['Q'])
    expect(r.partners).toEqual([])
    expect(r.problems[0]).toContain('the theory has no such partner')
  })

  it('flavour counts must balance: 3 copies of u against 1 of TL are refused (no further partner of u left)', () => {
    const r = checkMassPartners(theory, ['u', 'TL'])
    expect(r.problems[0]).toContain('u (3 Weyl copies) cannot be heavy with TL (1 Weyl copy)')
    expect(r.problems[0]).toContain('no further fermion in the conjugate representation, so the copies cannot balance')
    expect(r.partners).toEqual([])
    expect(checkMassPartners(theory, ['TL', 'TR', 'Tc']).problems[0]).toContain('TR, Tc (2 Weyl copies) cannot be heavy with TL (1 Weyl copy)')
  })

  it('a gauge-singlet neutral fermion has a Majorana mass alone; one charged under a global U(1) does not', () => {
    expect(checkMassPartners(theory, ['N']).problems).toEqual([])
    expect(checkMassPartners(theory, ['NL']).problems[0]).toContain('NL cannot be integrated out without a partner')
  })

  it('an SU(2) triplet (real) is massive alone; a doublet (pseudo-real) only in pairs', () => {
    expect(checkMassPartners(theory, ['Wino']).problems).toEqual([])
    const one = checkMassPartners(theory, ['D1'])
    expect(one.problems[0]).toContain('pseudo-real')
    expect(one.partners).toEqual(['D2'])
    expect(checkMassPartners(theory, ['D1', 'D2']).problems).toEqual([])
  })

  it('scalars always can be heavy', () => {
    expect(checkMassPartners(theory, ['H'])).toEqual({ problems: [], partners: [] })
  })
})

describe('partnerMap', () => {
  it('lists for each fermion the fields that can give it a mass', () => {
    const m = partnerMap(theory)
    expect(m.TL).toEqual(['u', 'TR', 'Tc'])
    expect(m.TR).toEqual(['TL'])
    expect(m.D1).toEqual(['D2'])
    expect(m.N).toBeUndefined()
    expect(m.Q).toBeUndefined()
  })
})

describe('integrateOut refuses an inconsistent child', () => {
  const at = { value: 1, unit: 'TeV' }
  it('half of a Dirac pair: the reason and the partner to add', () => {
    const pair = parseTheory({ ...theory, fields: theory.fields.filter((f) => f.name !== 'u' && f.name !== 'Tc') })
    expect(() => integrateOut(pair, ['TL'], at)).toThrow(
      /^These fields cannot be integrated out as chosen\. TL cannot be integrated out without a partner: .*; the theory has TR for that\. Integrate out TL, TR together\./,
    )
  })
  it('the whole pair is accepted', () => {
    expect(integrateOut(theory, ['TL', 'TR'], at).child.fields.map((f) => f.name)).not.toContain('TL')
  })
  it('a chiral field without a partner: refused with the reason', () => {
    expect(() => integrateOut(theory, ['Q'], at)).toThrow(
      'Q cannot be integrated out without a partner: a Weyl fermion gets a mass invariant under SU3c, SU2L, Y, Lno only together with a fermion in the conjugate representation',
    )
    expect(() => integrateOut(theory, ['u'], at)).toThrow('choose from TL so that 3 Weyl copies more join the set')
  })
})
