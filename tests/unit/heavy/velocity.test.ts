import { describe, expect, it } from 'vitest'
import preset from '../../../shared/presets/heavy-vexonium.json'
import { HeavyFrameSchema } from '../../../shared/schemas/heavyFrame'
import { CountingRuleSchema, type CountingRule } from '../../../shared/schemas/countingRules'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { enumerateHeavy, type HeavyOperator } from '../../../server/engine/heavy'
import { groupByOrder, orderOfOperator, reshuffle, resolveRule, HEAVY_VELOCITY_WEIGHTS, type RuleContext } from '../../../server/engine/rules'
import { toString } from '../../../server/engine/exact/rational'

const heavy = HeavyFrameSchema.parse(preset.heavy)
const rules = preset.countingRules.map((r) => CountingRuleSchema.parse(r))
const massRule = rules.find((r) => r.kind === 'massRatio')!
const velocityRule = rules.find((r) => r.kind === 'velocity')!
const ctx: RuleContext = { frame: 'heavy', particle: 'psi', antiparticle: 'chi' }
const res = enumerateHeavy({ heavy, groups: preset.groups })
const conventional: HeavyOperator[] = [res.leading, ...res.orders.flatMap((o) => o.conventional)]
const ids = (xs: readonly { id: string }[]) => xs.map((x) => x.id)

describe('vexonium preset (invented dark-sector bound state) is a valid heavy-frame theory', () => {
  it('parses with the theory schema and carries a mass-ratio and a velocity rule', () => {
    const t = parseTheory(preset)
    expect(t.frame).toBe('heavy')
    expect(rules.map((r) => r.kind).sort()).toEqual(['massRatio', 'velocity'])
  })
  it('its explicit velocity weights equal the literature defaults (Lepage et al., Phys. Rev. D 46 (1992) 4052)', () => {
    const def = resolveRule({ name: 'v', kind: 'velocity' }, ctx)
    const own = resolveRule(velocityRule, ctx)
    for (const k of Object.keys(HEAVY_VELOCITY_WEIGHTS)) {
      const key = k === 'psi' ? 'psi' : k
      expect(toString(own.weights.get(key)!)).toBe(toString(def.weights.get(key)!))
    }
    expect(toString(own.offset)).toBe('5')
  })
})

describe('mass-ratio rule: order = power of 1/m (Manohar, Phys. Rev. D 56 (1997) 230)', () => {
  it('leading 0, kinetic and σ·B 1, Darwin and spin–orbit 2, the 1/m³ list 3', () => {
    const o = Object.fromEntries(conventional.map((op) => [op.id, toString(orderOfOperator(op, massRule, ctx))]))
    expect(o).toEqual({ leading: '0', kinetic: '1', fermi: '1', darwin: '2', spinOrbit: '2', D4: '3', W1: '3', W2: '3', pp: '3', M: '3', A1: '3', A2: '3' })
  })
})

describe('velocity rule (Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125, Table I)', () => {
  const groups = groupByOrder(conventional, velocityRule, ctx)
  it('the kinetic operator moves to leading order with D_t', () => {
    expect(groups[0]!.order).toBe('0')
    expect(groups[0]!.ids).toEqual(['leading', 'kinetic'])
  })
  it('the relative-v² corrections are σ·B/m, Darwin, spin–orbit and D⁴/m³', () => {
    expect(groups[1]!.order).toBe('2')
    expect(groups[1]!.ids).toEqual(['fermi', 'darwin', 'spinOrbit', 'D4'])
    expect(groups.slice(2).every((g) => Number(g.value.num) / Number(g.value.den) >= 4)).toBe(true)
  })
  it('switching 1/M → v moves kinetic (1→0), σ·B (1→2) and D⁴ (3→2); Darwin and spin–orbit stay at 2', () => {
    const lowV = conventional.filter((op) => Number(orderOfOperator(op, velocityRule, ctx).num) <= 2)
    const moved = reshuffle(lowV, massRule, velocityRule, ctx)
    expect(moved.map((m) => `${m.id}:${toString(m.from)}->${toString(m.to)}`)).toEqual(['kinetic:1->0', 'fermi:1->2', 'D4:3->2'])
    expect(ids(lowV)).toEqual(['leading', 'kinetic', 'fermi', 'darwin', 'spinOrbit', 'D4'])
  })
  it('the enumerated basis (not the published one) groups the same way: one operator (kinetic) at v⁰ besides D_t, four at v²', () => {
    const basis: HeavyOperator[] = res.orders.flatMap((o) => o.basis)
    const g = groupByOrder(basis, velocityRule, ctx)
    expect(g.map((x) => [x.order, x.ids.length])[0]).toEqual(['0', 1])
    expect(g.map((x) => [x.order, x.ids.length])[1]).toEqual(['2', 4])
  })
  it('a velocity rule given without weights uses the literature defaults', () => {
    const bare: CountingRule = { name: 'v', kind: 'velocity' }
    expect(
      toString(
        orderOfOperator(
          conventional.find((o) => o.id === 'fermi')!,
          bare,
          ctx,
        ),
      ),
    ).toBe('2')
  })
})
