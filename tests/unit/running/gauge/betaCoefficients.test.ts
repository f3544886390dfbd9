import { describe, expect, it } from 'vitest'
import { gaugeBetaCoefficients, gaugeContentOf, type GaugeBetaCoefficients } from '../../../../server/engine/running/gauge/index'
import { qcdBetaExact } from '../../../../server/engine/running/qcdBeta'
import { div, mul, neg, parseRational, rat, toString, type Rational } from '../../../../server/engine/exact/rational'
import { complexScalar, darkU1, qcd, realScalar, SM, strength, su, theory, u1, weyl, weylR } from './theories'

const text = (c: GaugeBetaCoefficients) => ({ b: c.oneLoop.map(toString), B: c.twoLoop.map((r) => r.map(toString)) })
const q = parseRational

/** U(1) coefficients in another normalisation g' = k g: b → b/k², B_11 → B_11/k⁴, B_1j, B_j1 → /k². */
function renormaliseU1(c: GaugeBetaCoefficients, i: number, k2: Rational): { b: string[]; B: string[][] } {
  const b = c.oneLoop.map((v, j) => (j === i ? div(v, k2) : v))
  const B = c.twoLoop.map((row, r) =>
    row.map((v, s) => {
      const powers = (r === i ? 1 : 0) + (s === i ? 1 : 0)
      return powers === 0 ? v : div(v, powers === 2 ? mul(k2, k2) : k2)
    }),
  )
  return { b: b.map(toString), B: B.map((r) => r.map(toString)) }
}

describe('Standard Model gauge β coefficients', () => {
  const sm = gaugeBetaCoefficients(gaugeContentOf(SM))

  it('one loop: b = (−7, −19/6, 41/6) with hypercharge as written (Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83; from memory)', () => {
    expect(sm.slots.map((s) => s.groups.join(','))).toEqual(['colour', 'weak', 'hypercharge,hypercharge'])
    expect(text(sm).b).toEqual(['-7', '-19/6', '41/6'])
    expect(sm.mixes).toBe(false)
  })

  it('GUT normalisation g1² = (5/3) g_Y²: b = (41/10, −19/6, −7) and the two-loop matrix of Machacek & Vaughn 1983 / Luo, Wang, Xiao, Phys. Rev. D 67 (2003) 065019 (values from memory)', () => {
    const gut = renormaliseU1(sm, 2, q('5/3'))
    // Rows and columns in the order (g3, g2, g1) of our theory file.
    expect(gut.b).toEqual(['-7', '-19/6', '41/10'])
    expect(gut.B).toEqual([
      ['-26', '9/2', '11/10'],
      ['12', '35/6', '9/10'],
      ['44/5', '27/10', '199/50'],
    ])
  })

  it('hypercharge normalisation of the same matrix: B_YY = 199/18, B_Y2 = 9/2, B_Y3 = 44/3, B_2Y = 3/2, B_3Y = 11/6 (derived from the GUT values above)', () => {
    expect(text(sm).B).toEqual([
      ['-26', '9/2', '11/6'],
      ['12', '35/6', '3/2'],
      ['44/3', '9/2', '199/18'],
    ])
  })
})

describe('QCD with n_f flavours against the QCD module', () => {
  it('b = −β0 = −(11 − 2n_f/3) and B = −β1 = −(102 − 38n_f/3) for n_f = 0..6 (van Ritbergen, Vermaseren, Larin, Phys. Lett. B 400 (1997) 379)', () => {
    const names = ['u', 'd', 's', 'c', 'b', 't']
    for (let nf = 0; nf <= 6; nf++) {
      const c = gaugeBetaCoefficients(gaugeContentOf(qcd(names.slice(0, nf))))
      const [beta0, beta1] = qcdBetaExact(nf)
      expect(toString(c.oneLoop[0]!), `n_f = ${nf}`).toBe(toString(neg(beta0!.rational)))
      expect(toString(c.twoLoop[0]![0]!), `n_f = ${nf}`).toBe(toString(neg(beta1!.rational)))
      expect(toString(c.oneLoop[0]!)).toBe(toString(rat(2 * nf - 33, 3))) // 11 − 2n_f/3 (Gross & Wilczek 1973; Politzer 1973)
    }
  })

  it('flavours of one field count like separate fields (common practice)', () => {
    const three = theory('three flavours', [su('colour', 3)], [weyl('q', { reps: { colour: [1, 0] }, flavors: 3 }), weylR('qR', { reps: { colour: [1, 0] }, flavors: 3 })])
    expect(text(gaugeBetaCoefficients(gaugeContentOf(three)))).toEqual(text(gaugeBetaCoefficients(gaugeContentOf(qcd(['u', 'd', 's'])))))
  })
})

describe('theories worked by hand', () => {
  it('dark U(1): one complex scalar of charge 2 and one Dirac fermion of charge 1/3', () => {
    // Machacek & Vaughn 1983 for a U(1) (S = d Q², C = Q²), worked here by hand:
    // b = (1/3)·2² + (2/3)·2·(1/3)² = 4/3 + 4/27 = 40/27;
    // B = 4·2⁴ (complex scalar, w2 = 4) + 2·2·(1/3)⁴ (two Weyl, w2 = 2) = 64 + 4/81 = 5188/81.
    const c = gaugeBetaCoefficients(gaugeContentOf(darkU1('2', '1/3')))
    expect(text(c)).toEqual({ b: ['40/27'], B: [['5188/81']] })
  })

  it('SU(2) with a real scalar triplet: b = −22/3 + 1/3 = −7, B = −136/3 + 2(2·2 + 2/3) = −36 (by hand from Machacek & Vaughn 1983)', () => {
    const c = gaugeBetaCoefficients(gaugeContentOf(theory('triplet', [su('W', 2)], [realScalar('T', { reps: { W: [2] } }), strength('Wmu', 'W')])))
    expect(text(c)).toEqual({ b: ['-7'], B: [['-36']] })
  })

  it('SU(3) × U(1): off-diagonal two-loop terms B_ab = Σ w2 S_a C_b (by hand: one complex scalar in (3, charge 1))', () => {
    // S_3 = 1/2, C_3 = 4/3; S_X = d Q² = 3, C_X = 1. B_3X = 4·(1/2)·1 = 2, B_X3 = 4·3·(4/3) = 16.
    const c = gaugeBetaCoefficients(gaugeContentOf(theory('coloured scalar', [su('C', 3), u1('X')], [complexScalar('phi', { reps: { C: [1, 0] }, charges: { X: '1' } })])))
    expect(text(c).B[0]![1]).toBe('2')
    expect(text(c).B[1]![0]).toBe('16')
    // b_C = −11 + (1/3)(1/2) = −65/6; b_X = (1/3)·3 = 1.
    expect(text(c).b).toEqual(['-65/6', '1'])
  })
})

describe('several U(1)s: kinetic mixing', () => {
  it('B−L beside hypercharge with three right-handed neutrinos and a scalar of charge 2: b_BL = 12, b_Y,BL = 16/3 (by hand; the usual B−L values, from memory)', () => {
    const bl = (f: string) => (({ Q: '1/3', u: '1/3', d: '1/3', L: '-1', e: '-1', nu: '-1' }) as Record<string, string>)[f]
    const fields = SM.fields.map((f) => (bl(f.name) ? { ...f, charges: { ...f.charges, BL: bl(f.name)! } } : f))
    const t = theory('SM with B−L', [...SM.groups, u1('BL')], [...fields, weylR('nu', { charges: { BL: '-1' }, flavors: 3 }), complexScalar('Phi', { charges: { BL: '2' } }), strength('Z', 'BL')])
    const c = gaugeBetaCoefficients(gaugeContentOf(t))
    const slot = (name: string) => c.slots.findIndex((s) => s.groups.join(',') === name)
    expect(toString(c.oneLoop[slot('BL,BL')]!)).toBe('12')
    expect(toString(c.oneLoop[slot('hypercharge,BL')]!)).toBe('16/3')
    expect(toString(c.oneLoop[slot('hypercharge,hypercharge')]!)).toBe('41/6')
    expect(c.mixes).toBe(true)
  })

  it('charges (1, 1) and (1, −1) on two Weyl fields: no term mixes X and Y, so none is generated (by hand: Σ Q_X Q_Y Q_m Q_n = 0)', () => {
    const t = theory('parity twins', [u1('X'), u1('Y')], [weyl('a', { charges: { X: '1', Y: '1' } }), weyl('b', { charges: { X: '1', Y: '-1' } })])
    const c = gaugeBetaCoefficients(gaugeContentOf(t))
    expect(c.mixes).toBe(false)
    const xy = c.slots.findIndex((s) => s.groups.join(',') === 'X,Y')
    expect(toString(c.oneLoop[xy]!)).toBe('0')
    // The X–Y coupling column feeds the diagonal: B_{XX, XY} = 2·Σ w2 d Q_X² Q_X Q_Y = 2·2(1 − 1) = 0, B_{XY, XY} = 2·2·(1 + 1) = 8.
    expect(toString(c.twoLoop[xy]![xy]!)).toBe('8')
  })

  it('one Weyl field of charges (1, 2): b_XY = (2/3)·2 = 4/3 and B_{XY,XX} = 2·1·2·1 = 4 (by hand)', () => {
    const c = gaugeBetaCoefficients(gaugeContentOf(theory('mixer', [u1('X'), u1('Y')], [weyl('m', { charges: { X: '1', Y: '2' } })])))
    const at = (name: string) => c.slots.findIndex((s) => s.groups.join(',') === name)
    expect(toString(c.oneLoop[at('X,Y')]!)).toBe('4/3')
    expect(toString(c.twoLoop[at('X,Y')]![at('X,X')]!)).toBe('4')
    expect(toString(c.twoLoop[at('X,X')]![at('X,Y')]!)).toBe('8') // 2·w2·Q_X² Q_X Q_Y = 2·2·2
    expect(c.mixes).toBe(true)
  })
})

describe('what does not run', () => {
  it('field strengths, global groups and Z_n groups add nothing; a pure SU(N) gauge theory has b = −11N/3, B = −34N²/3 (Gross & Wilczek 1973; Caswell 1974)', () => {
    const t = theory(
      'pure SU(4)',
      [su('G4', 4), { name: 'F', type: 'SU', n: 2, gauge: false }, { name: 'Z3', type: 'Z', n: 3, gauge: true }],
      [strength('Gmu', 'G4'), weyl('spectator', { reps: { F: [1] }, charges: { Z3: 1 } })],
    )
    const c = gaugeBetaCoefficients(gaugeContentOf(t))
    expect(c.slots.map((s) => s.groups[0])).toEqual(['G4'])
    expect(text(c)).toEqual({ b: ['-44/3'], B: [['-544/3']] })
  })
})
