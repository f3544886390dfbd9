import { describe, expect, it } from 'vitest'
import { orderOf, orderOfOperator, resolveRule, groupByOrder, reshuffle, type RuleContext } from '../../../server/engine/rules'
import { toString } from '../../../server/engine/exact/rational'
import { buildTheoryModel } from '../../../server/engine/theory/model'
import { EngineInputError } from '../../../server/engine/errors'
import { CountingRuleSchema } from '../../../shared/schemas/countingRules'
import type { CountingRule } from '../../../shared/schemas/countingRules'

const sm: RuleContext = {
  frame: 'relativistic',
  species: buildTheoryModel({
    name: 'sm',
    frame: 'relativistic',
    groups: [],
    fields: [
      { name: 'Q', lorentz: 'left-weyl' },
      { name: 'u', lorentz: 'right-weyl' },
      { name: 'L', lorentz: 'left-weyl' },
      { name: 'H', lorentz: 'scalar' },
      { name: 'G', lorentz: 'field-strength' },
      { name: 'B', lorentz: 'field-strength' },
    ],
  }).species,
}
const mass: CountingRule = { name: 'E/M', kind: 'massRatio' }

describe('mass-ratio rule on a relativistic theory: order = dimension − 4 (common practice)', () => {
  it('H^6 (dimension 6) is order 2', () => {
    expect(toString(orderOf({ H: 3, 'H*': 3 }, mass, sm))).toBe('2')
  })
  it('Weinberg operator L^2 H^2 (dimension 5) is order 1 (Weinberg, Phys. Rev. Lett. 43 (1979) 1566)', () => {
    expect(toString(orderOf({ L: 2, H: 2 }, mass, sm))).toBe('1')
  })
  it('D^2 H^2 H*^2 and G_L^3 are order 2; Q Q* u u* is order 2 (dimension 6, common practice)', () => {
    expect(toString(orderOf({ D: 2, H: 2, 'H*': 2 }, mass, sm))).toBe('2')
    expect(toString(orderOf({ G_L: 3 }, mass, sm))).toBe('2')
    expect(toString(orderOf({ Q: 1, 'Q*': 1, u: 1, 'u*': 1 }, mass, sm))).toBe('2')
  })
  it('the renormalisable Yukawa Q* u H is order 0 and a single fermion is fractional (-1/2), exactly', () => {
    expect(toString(orderOf({ 'Q*': 1, u: 1, H: 1 }, mass, sm))).toBe('0')
    expect(toString(orderOf({ Q: 1, H: 1 }, mass, sm))).toBe('-3/2')
  })
})

describe('custom and momentum-ratio rules use exact rational weights', () => {
  it('chiral counting: derivatives O(p), light masses O(p^2) (Gasser, Leutwyler, Ann. Phys. 158 (1984) 142)', () => {
    const chpt: CountingRule = { name: 'p', kind: 'momentumRatio', weights: { U: '0', 'U*': '0', m: '2' } }
    expect(toString(orderOf({ D: 2, U: 1, 'U*': 1 }, chpt))).toBe('2')
    expect(toString(orderOf({ m: 1, U: 1, 'U*': 1 }, chpt))).toBe('2')
    expect(toString(orderOf({ D: 4, U: 2, 'U*': 2 }, chpt))).toBe('4')
  })
  it('custom weights "3/2" and "1/3" add exactly (common practice)', () => {
    const r: CountingRule = { name: 'c', kind: 'custom', weights: { a: '3/2', b: '1/3' }, offset: '1/6' }
    expect(toString(orderOf({ a: 1, b: 2 }, r))).toBe('2')
    expect(toString(orderOf({ b: 1 }, r))).toBe('1/6')
  })
  it('a multi-term operator takes the order of its leading term (common practice)', () => {
    const r: CountingRule = { name: 'c', kind: 'custom', weights: { x: '1', y: '3' } }
    expect(toString(orderOfOperator({ id: 'o', terms: [{ y: 1 }, { x: 2 }] }, r))).toBe('2')
  })
})

describe('bad input names the rule, the building block and the value', () => {
  it('unknown block', () => {
    expect(() => orderOf({ Z: 1 }, mass, sm)).toThrow(EngineInputError)
    expect(() => orderOf({ Z: 1 }, mass, sm)).toThrow('Counting rule "E/M" gives no weight to the building block "Z"')
  })
  it('negative or fractional multiplicity', () => {
    expect(() => orderOf({ H: -1 }, mass, sm)).toThrow('The building block "H" appears -1 times')
    expect(() => orderOf({ H: 0.5 }, mass, sm)).toThrow('appears 0.5 times')
  })
  it('a custom rule without weights is rejected by the schema and by resolveRule', () => {
    const bad = CountingRuleSchema.safeParse({ name: 'x', kind: 'custom' })
    expect(bad.success).toBe(false)
    expect(bad.error!.issues[0]!.message).toBe('are required: a rule of kind "custom" needs a weight for each building block')
    expect(() => resolveRule({ name: 'x', kind: 'custom' })).toThrow('Counting rule "x" is of kind "custom" but gives no weights')
  })
  it('weights must be exact rationals "p/q", not decimals', () => {
    const bad = CountingRuleSchema.safeParse({ name: 'x', kind: 'velocity', weights: { D: '0.5' } })
    expect(bad.success).toBe(false)
    expect(bad.error!.issues[0]!.message).toContain('exact rational')
  })
  it('operator without terms', () => {
    expect(() => orderOfOperator({ id: 'empty', terms: [] }, mass, sm)).toThrow('Operator "empty" has no terms')
  })
})

describe('reshuffle and grouping', () => {
  const a: CountingRule = { name: 'A', kind: 'custom', weights: { x: '1', y: '2' } }
  const b: CountingRule = { name: 'B', kind: 'custom', weights: { x: '1', y: '1' } }
  const ops = [
    { id: 'xx', terms: [{ x: 2 }] },
    { id: 'y', terms: [{ y: 1 }] },
    { id: 'xy', terms: [{ x: 1, y: 1 }] },
  ]
  it('lists exactly the operators whose order changes (common practice)', () => {
    const r = reshuffle(ops, a, b)
    expect(r.map((c) => `${c.id}:${toString(c.from)}->${toString(c.to)}`)).toEqual(['y:2->1', 'xy:3->2'])
  })
  it('groups by ascending order', () => {
    expect(groupByOrder(ops, b).map((g) => [g.order, g.ids])).toEqual([
      ['1', ['y']],
      ['2', ['xx', 'xy']],
    ])
  })
})

import { blocksFromClassKey } from '../../../server/engine/rules'

describe('class keys of the counting engine feed the rules', () => {
  it('D^2 H^2 H*^2 → order 2 and G_L^3 → order 2 under the mass ratio (common practice: dimension 6)', () => {
    expect(blocksFromClassKey('D^2 H^2 H*^2')).toEqual({ D: 2, H: 2, 'H*': 2 })
    expect(toString(orderOf(blocksFromClassKey('D^2 H^2 H*^2'), mass, sm))).toBe('2')
    expect(toString(orderOf(blocksFromClassKey('G_L^3'), mass, sm))).toBe('2')
  })
  it('unreadable keys are rejected with the token named', () => {
    expect(() => blocksFromClassKey('D^0 H')).toThrow('Cannot read "D^0" in the class "D^0 H"')
    expect(() => blocksFromClassKey('  ')).toThrow('The class is empty')
  })
})
