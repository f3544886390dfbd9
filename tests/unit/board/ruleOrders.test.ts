import { describe, it, expect } from 'vitest'
import { ruleOrders, rulesOf, DEFAULT_RULE } from '../../../server/engine/board/ruleOrders'
import { findPreset } from '../../../shared/presets/index'

describe('orders of board operators under a counting rule', () => {
  it('the mass-ratio rule gives dimension − 4 for relativistic classes (common practice)', () => {
    const smeft = findPreset('smeft')!.theory as never
    const orders = ruleOrders(smeft, DEFAULT_RULE.name, [
      { id: 1, classKey: 'H^3 H*^3' },
      { id: 2, classKey: 'D^2 H^2 H*^2' },
      { id: 3, classKey: 'G_L^3' },
      { id: 4, classKey: 'L^2 H^2' },
      { id: 5, classKey: 'G_L^2 G_R^2' },
    ])
    expect(orders).toEqual({ 1: '2', 2: '2', 3: '2', 4: '1', 5: '4' })
  })

  it('under velocity counting the kinetic term moves to leading order and σ·B to v² (Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125, Table I)', () => {
    const vex = findPreset('heavy-vexonium')!.theory as never
    const ops = [
      { id: 1, classKey: 'x', terms: [{ psi: 1, 'psi*': 1, D: 2 }] },
      { id: 2, classKey: 'x', terms: [{ psi: 1, 'psi*': 1, B: 1, sigma: 1 }] },
      { id: 3, classKey: 'x', terms: [{ psi: 1, 'psi*': 1, D: 4 }] },
    ]
    expect(ruleOrders(vex, '1/M', ops)).toEqual({ 1: '1', 2: '1', 3: '3' })
    expect(ruleOrders(vex, 'velocity', ops)).toEqual({ 1: '0', 2: '2', 3: '2' })
  })

  it('offers the mass-ratio rule when the theory declares none, and names a missing rule', () => {
    expect(rulesOf({ fields: [] }).map((r) => r.name)).toEqual([DEFAULT_RULE.name])
    expect(() => ruleOrders({ fields: [] }, 'nope', [])).toThrow('The theory has no counting rule named "nope"')
  })
})
