import { describe, it, expect } from 'vitest'
import { applicableMatching } from '../../../server/utils/scales/applicableMatching'
import { frameOfBasisClasses, ordersBelowTarget } from '../../../server/utils/scales/ladderEstimates'
import type { Theory } from '../../../shared/schemas/theory'

const qed = (fields: Theory['fields'], groups: Theory['groups'] = [{ name: 'QED', type: 'U1', gauge: true }]): Theory => ({
  name: 'T',
  frame: 'relativistic',
  groups,
  fields: [...fields, { name: 'A', lorentz: 'field-strength', gaugeOf: 'QED' }],
})

describe('which worked matching results apply to an integrate-out step', () => {
  it('a Dirac fermion of charge −1 written as L and R Weyl fields brings Euler–Heisenberg and the Uehling term (Heisenberg & Euler, Z. Phys. 98 (1936) 714; Uehling, Phys. Rev. 48 (1935) 55)', () => {
    const t = qed([
      { name: 'eL', lorentz: 'left-weyl', charges: { QED: '-1' } },
      { name: 'eR', lorentz: 'right-weyl', charges: { QED: '-1' } },
    ])
    const m = applicableMatching(t, ['eL', 'eR'], 'm = 1 GeV')
    expect(m.map((x) => [x.id, x.fields, x.charge, x.group])).toEqual([
      ['euler-heisenberg', ['eL', 'eR'], '-1', 'QED'],
      ['uehling', ['eL', 'eR'], '-1', 'QED'],
    ])
    // Euler–Heisenberg covariant form: (α²/90m⁴)[(FF)² + (7/4)(FF̃)²] (Heisenberg & Euler 1936).
    expect(m[0]!.forms[1]!.terms.map((x) => x.coefficient)).toEqual(['1/90 α^2 Q^4 / m^4', '7/360 α^2 Q^4 / m^4'])
  })

  it('two left-handed fields of opposite charge also form a Dirac fermion (common practice: ψ and the conjugate of its partner)', () => {
    const t = qed([
      { name: 'e', lorentz: 'left-weyl', charges: { QED: '-1' } },
      { name: 'ec', lorentz: 'left-weyl', charges: { QED: '1' } },
    ])
    expect(applicableMatching(t, ['e', 'ec'], 'M').map((x) => x.id)).toEqual(['euler-heisenberg', 'uehling'])
  })

  it('no result applies to a lone Weyl field, unequal charges, a neutral pair, a coloured pair or a theory without the photon (common practice)', () => {
    const lone = qed([
      { name: 'eL', lorentz: 'left-weyl', charges: { QED: '-1' } },
      { name: 'eR', lorentz: 'right-weyl', charges: { QED: '-1' } },
    ])
    expect(applicableMatching(lone, ['eL'], 'M')).toEqual([])
    const unequal = qed([
      { name: 'a', lorentz: 'left-weyl', charges: { QED: '-1' } },
      { name: 'b', lorentz: 'right-weyl', charges: { QED: '2' } },
    ])
    expect(applicableMatching(unequal, ['a', 'b'], 'M')).toEqual([])
    const neutral = qed([
      { name: 'a', lorentz: 'left-weyl' },
      { name: 'b', lorentz: 'right-weyl' },
    ])
    expect(applicableMatching(neutral, ['a', 'b'], 'M')).toEqual([])
    const groups: Theory['groups'] = [
      { name: 'QED', type: 'U1', gauge: true },
      { name: 'colour', type: 'SU', n: 3, gauge: true },
    ]
    const coloured = qed(
      [
        { name: 'uL', lorentz: 'left-weyl', charges: { QED: '2/3' }, reps: { colour: [1, 0] } },
        { name: 'uR', lorentz: 'right-weyl', charges: { QED: '2/3' }, reps: { colour: [1, 0] } },
      ],
      groups,
    )
    expect(applicableMatching(coloured, ['uL', 'uR'], 'M')).toEqual([])
    const noPhoton: Theory = {
      name: 'T',
      frame: 'relativistic',
      groups: [{ name: 'B', type: 'U1', gauge: false }],
      fields: [
        { name: 'a', lorentz: 'left-weyl', charges: { B: '1' } },
        { name: 'b', lorentz: 'right-weyl', charges: { B: '1' } },
      ],
    }
    expect(applicableMatching(noPhoton, ['a', 'b'], 'M')).toEqual([])
  })
})

describe('orders below a precision target, for a basis', () => {
  const doc = {
    scales: [
      { name: 'E', value: '10', unit: 'GeV' as const },
      { name: 'M', value: '1', unit: 'TeV' as const },
    ],
    parameters: [
      { name: 'eps', numerator: 'E', denominator: 'M' },
      { name: 'g', numerator: '1', denominator: '10' },
    ],
    orders: [0, { order: 2, powers: { eps: 1, g: 1 } }],
  }
  it('an order listed with its own powers uses them; any other order n is ε^n (common practice, naive dimensional analysis)', () => {
    const r = ordersBelowTarget(doc, [1, 2, 3], 1e-3, 'relativistic')
    expect(r.map((o) => [o.order, o.exactEstimate, o.belowTarget])).toEqual([
      [1, '1/100', false],
      [2, '1/1000', false],
      [3, '1/1000000', true],
    ])
  })
  it('a Goldstone-frame basis: chiral order p^k is ε^(k−2), as its board heading says (p/Λ_χ)^(k−2) (Manohar and Georgi, Nucl. Phys. B 234 (1984) 189)', () => {
    const chiral = { ...doc, orders: [2] }
    const r = ordersBelowTarget(chiral, [2, 4, 6], 1e-3, 'goldstone')
    expect(r.map((o) => [o.order, o.exactEstimate, o.belowTarget])).toEqual([
      [2, '1', false],
      [4, '1/10000', true],
      [6, '1/100000000', true],
    ])
    expect(ordersBelowTarget(chiral, [4], 1e-3, frameOfBasisClasses([{ key: 'p^4', frame: 'goldstone' }]))[0]!.exactEstimate).toBe('1/10000')
    expect(frameOfBasisClasses([{ key: 'phi^4' }])).toBe('relativistic')
  })
  it('an order under an unknown parameter is refused with the engine message', () => {
    expect(() => ordersBelowTarget({ ...doc, orders: [{ order: 2, powers: { lambda: 1 } }] }, [2], 1e-3, 'relativistic')).toThrow(
      'Order 2 uses the expansion parameter "lambda", which the ladder does not declare; add it or correct the name',
    )
  })
})
