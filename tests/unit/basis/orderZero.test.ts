import { describe, expect, it } from 'vitest'
import { execFileSync } from 'node:child_process'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { orderZero, orderZeroHeavy } from '../../../server/engine/basis/orderZero'
import { PRESETS } from '../../../shared/presets/index'

const preset = (id: string) => PRESETS.find((p) => p.id === id)!.theory
const summary = (t: ReturnType<typeof orderZero>) => t.classes.map((c) => [c.key, c.role, c.rank, c.realParameters])

describe('order 0: the renormalizable Lagrangian, hand-derivable cases', () => {
  it('QED: two kinetic terms, the photon kinetic and θ terms, one complex Dirac mass (Peskin & Schroeder 1995, eq. 4.3)', () => {
    expect(summary(orderZero(preset('qed')))).toEqual([
      ['D eL eL*', 'kinetic', 1, 0],
      ['D eR eR*', 'kinetic', 1, 0],
      ['A_L^2', 'gauge kinetic', 2, 2],
      ['eL eR*', 'mass', 1, 2],
    ])
  })

  it('a real scalar with Z2 off: mass, cubic and quartic, one real parameter each (common practice)', () => {
    const r = orderZero(preset('real-scalar'))
    expect(summary(r).filter((c) => c[1] !== 'kinetic')).toEqual([
      ['phi^2', 'mass', 1, 1],
      ['phi^3', 'cubic', 1, 1],
      ['phi^4', 'quartic', 1, 1],
    ])
  })

  it('a Z2 forbids the cubic; a charged scalar has no φ² mass, only |φ|² (common practice)', () => {
    const z2 = parseTheory({
      name: 'Z2 scalar',
      frame: 'relativistic',
      groups: [{ name: 'P', type: 'Z', n: 2, gauge: false }],
      fields: [{ name: 'phi', lorentz: 'scalar', real: true, charges: { P: 1 } }],
    })
    expect(summary(orderZero(z2)).map((c) => c[0])).toEqual(['D^2 phi^2', 'phi^2', 'phi^4'])
    expect(summary(orderZero(preset('scalar-qed'))).filter((c) => c[1] === 'mass')).toEqual([['phi phi*', 'mass', 1, 1]])
  })

  it('mass terms follow the symmetries: a neutral Weyl fermion has a Majorana mass, a charged or chiral one none; a doublet pair only antisymmetrically', () => {
    const t = parseTheory({
      name: 'Weyl masses',
      frame: 'relativistic',
      groups: [
        { name: 'SU2', type: 'SU', n: 2, gauge: true },
        { name: 'X', type: 'U1', gauge: false },
      ],
      fields: [
        { name: 'N', lorentz: 'right-weyl' },
        { name: 'C', lorentz: 'left-weyl', charges: { X: '1' } },
        { name: 'Dw', lorentz: 'left-weyl', reps: { SU2: [1] }, flavors: 2 },
        { name: 'T', lorentz: 'left-weyl', reps: { SU2: [2] } },
      ],
    })
    const masses = orderZero(t).classes.filter((c) => c.role === 'mass')
    // N N (Majorana, complex: 2 real); Dw Dw antisymmetric in 2 flavours (1 complex entry); T T (Majorana triplet).
    expect(masses.map((c) => [c.key, c.realParameters, c.flavorParameters])).toEqual([
      ['N*^2', 2, 2],
      ['Dw^2', 0, 2],
      ['T^2', 2, 2],
    ])
  })

  it('the Standard Model: 14 real parameters for one generation; 62 with three, i.e. 19 physical ones after field redefinitions (PDG review "Standard Model" — recalled from memory)', () => {
    const r = orderZero(preset('smeft'))
    expect(summary(r).map((c) => c[1])).toEqual([
      'kinetic',
      'kinetic',
      'kinetic',
      'kinetic',
      'kinetic',
      'kinetic',
      'gauge kinetic',
      'gauge kinetic',
      'gauge kinetic',
      'mass',
      'quartic',
      'Yukawa',
      'Yukawa',
      'Yukawa',
    ])
    expect(r.classes.find((c) => c.key === 'H H*')!.realParameters).toBe(1) // μ²
    expect(r.classes.find((c) => c.key === 'H^2 H*^2')!.realParameters).toBe(1) // λ
    expect(r.realParameters).toBe(14) // 3 g + 3 θ + μ² + λ + 3 complex Yukawas
    expect(r.flavorParameters).toBe(62) // 3 g + 3 θ + μ² + λ + 3 × 18 Yukawa entries
    // Physical count (massless neutrinos): the flavour group U(3)^5 (45 generators) leaves baryon number and the
    // three lepton numbers unbroken, so 45 − 4 = 41 Yukawa parameters are unphysical (54 − 41 = 13: 9 masses, 3
    // angles, 1 phase); θ of SU(2) is rotated away by the anomalous B + L and θ of U(1)_Y has no effect: 62 − 41 − 2 = 19.
    expect(r.flavorParameters! - (45 - 4) - 2).toBe(19)
  })

  it('two abelian gauge fields mix at dimension 4: X·Y and X·Ỹ listed (Holdom, Phys. Lett. B 166 (1986) 196); one non-abelian and one abelian do not', () => {
    const t = parseTheory({
      name: 'Dark photon',
      frame: 'relativistic',
      groups: [
        { name: 'Y', type: 'U1', gauge: true },
        { name: 'X', type: 'U1', gauge: true },
        { name: 'SU2', type: 'SU', n: 2, gauge: true },
      ],
      fields: [
        { name: 'B', lorentz: 'field-strength', gaugeOf: 'Y' },
        { name: 'Ad', lorentz: 'field-strength', gaugeOf: 'X' },
        { name: 'W', lorentz: 'field-strength', gaugeOf: 'SU2' },
      ],
    })
    const mixing = orderZero(t).classes.filter((c) => c.operators.some((o) => o.text.startsWith('mixing')))
    expect(mixing.map((c) => [c.key, c.operators.map((o) => o.text)])).toEqual([['B_L Ad_L', ['mixing B Ad', 'theta mixing B Ad']]])
  })

  it('no mass term for any Standard-Model fermion: all are chiral (common practice)', () => {
    expect(
      orderZero(preset('smeft'))
        .classes.filter((c) => c.role === 'mass')
        .map((c) => c.key),
    ).toEqual(['H H*'])
  })

  it('Yukawa and quartic operators carry fingerprints (the board rewrites onto them); written terms do not', () => {
    const r = orderZero(preset('smeft'))
    const yukawa = r.classes.find((c) => c.role === 'Yukawa')!
    expect(yukawa.operators[0]).toHaveProperty('fingerprint')
    expect(r.classes[0]!.operators[0]).not.toHaveProperty('fingerprint')
  })

  it("refuses the heavy frame; there, order 0 is ψ†iD_tψ, χ†iD_tχ and the light fields' Lagrangian (Caswell & Lepage, Phys. Lett. B 167 (1986) 437)", () => {
    expect(() => orderZero(preset('heavy-vexonium'))).toThrow('uses the heavy frame')
    const r = orderZeroHeavy(preset('heavy-vexonium'))
    expect(r.classes.map((c) => [c.key, c.operators.map((o) => o.text)])).toEqual([
      ['psi* psi (1/m^0)', ['psi* iD_t psi']],
      ['chi* chi (1/m^0)', ['chi* iD_t chi']],
      ['Ad_L^2', ['kinetic Ad', 'theta Ad']],
    ])
    expect(r.note).toContain('rest mass removed')
  })
})

describe('command line: npm run basis -- FILE --max-order N prints order 0', () => {
  it('QED to order 1: the orderZero block with its classes and real parameters (Peskin & Schroeder 1995, eq. 4.3)', () => {
    const file = '/tmp/scalewright-order-zero-cli.json'
    execFileSync('node', ['-e', `require('fs').writeFileSync(${JSON.stringify(file)}, ${JSON.stringify(JSON.stringify(preset('qed')))})`])
    const j = JSON.parse(execFileSync('node', ['--import', 'tsx', 'scripts/basis.ts', file, '--max-order', '1'], { encoding: 'utf8' }))
    expect(j.orderZero.classes.map((c: { key: string; role: string }) => [c.key, c.role])).toEqual([
      ['D eL eL*', 'kinetic'],
      ['D eR eR*', 'kinetic'],
      ['A_L^2', 'gauge kinetic'],
      ['eL eR*', 'mass'],
    ])
    expect(j.orderZero.realParameters).toBe(4)
    expect(j.byOrder[0].order).toBe(1)
  })
})
