/**
 * CP-even / CP-odd real parameters from the CP-twisted Hilbert series (counting/cpCount.ts).
 */
import { describe, expect, it } from 'vitest'
import { PRESETS, findPreset } from '../../../shared/presets/index'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { countOperators, type DimensionCount } from '../../../server/engine/counting/countOperators'

const preset = (id: string) => parseTheory(findPreset(id)!.theory)
const quarks = new Set(['Q', 'u', 'd'])

/** Baryon number × 3 of a class key of the SMEFT preset (quark fields minus conjugate quark fields). */
function baryon3(key: string): number {
  let b = 0
  for (const token of key.split(' ')) {
    const m = /^([A-Za-z]+)(\*?)(?:\^(\d+))?$/.exec(token)
    if (!m || !quarks.has(m[1]!)) continue
    b += (m[2] ? -1 : 1) * Number(m[3] ?? 1)
  }
  return b
}

/** CP split of the baryon-number-conserving classes of one dimension. */
function bConserving(d: DimensionCount): [number, number] {
  let even = 0
  let odd = 0
  for (const [key, e] of Object.entries(d.cp!)) {
    if (baryon3(key) !== 0) continue
    even += e.even
    odd += e.odd
  }
  return [even, odd]
}

describe('SMEFT at dimension 6 (Alonso, Jenkins, Manohar, Trott, JHEP 04 (2014) 159: 76 = 53 CP-even + 23 CP-odd for one generation, 2499 = 1350 + 1149 for three, baryon number conserving)', () => {
  it('one flavour: 53 + 23 baryon-number conserving; with the 4 + 4 of the four baryon-number violating operators, 84 = 57 + 27', () => {
    const d6 = countOperators(preset('smeft'), { maxDim: 6, minDim: 6, nf: 1 }).byDimension[0]!
    expect(bConserving(d6)).toEqual([53, 23])
    expect([d6.operators, d6.cpEven, d6.cpOdd]).toEqual([84, 57, 27])
  })

  it('three flavours: 1350 + 1149 baryon-number conserving; 3045 = 1623 + 1422 in all (the 546 baryon-number violating parameters are 273 complex coefficients)', () => {
    const d6 = countOperators(preset('smeft'), { maxDim: 6, minDim: 6, nf: 3 }).byDimension[0]!
    expect(bConserving(d6)).toEqual([1350, 1149])
    expect([d6.operators, d6.cpEven, d6.cpOdd]).toEqual([3045, 1623, 1422])
  })

  it('dimension 5, three flavours: the Weinberg operator, 6 complex coefficients = 6 + 6 (Weinberg, Phys. Rev. Lett. 43 (1979) 1566)', () => {
    const d5 = countOperators(preset('smeft'), { maxDim: 5, nf: 3 }).byDimension[0]!
    expect([d5.operators, d5.cpEven, d5.cpOdd]).toEqual([12, 6, 6])
  })
})

describe('other published splits', () => {
  it('U(3)^5 flavour-symmetric SMEFT, dimension 6: 47 = 41 CP-even + 6 CP-odd (Faroughy, Isidori, Wilsch, Yamamoto, JHEP 08 (2020) 166, Table 1)', () => {
    const d6 = countOperators(preset('smeft-u3-5'), { maxDim: 6, minDim: 6 }).byDimension[0]!
    expect([d6.operators, d6.cpEven, d6.cpOdd]).toEqual([47, 41, 6])
  })

  it('photons, dimension 8: (FF)² and (FF̃)² CP-even, (FF)(FF̃) CP-odd (Heisenberg & Euler, Z. Phys. 98 (1936) 714)', () => {
    const d8 = countOperators(preset('photons'), { maxDim: 8, minDim: 8 }).byDimension[0]!
    expect([d8.cpEven, d8.cpOdd]).toEqual([2, 1])
    expect(d8.cp).toEqual({ 'A_L^2 A_R^2': { even: 1, odd: 0 }, 'A_R^4': { even: 1, odd: 1, conjugate: 'A_L^4' } })
  })

  it('scalar QED, dimension 6: |φ|^6, |φ|^2 □ |φ|^2 and |φ|^2 F^2 CP-even, |φ|^2 F F̃ CP-odd (common practice)', () => {
    const d6 = countOperators(preset('scalar-qed'), { maxDim: 6, minDim: 6 }).byDimension[0]!
    expect([d6.cpEven, d6.cpOdd]).toEqual([3, 1])
  })
})

describe('bookkeeping', () => {
  it('every preset to dimension 8: cpEven + cpOdd = operators; a self-conjugate class splits its own count; a pair is listed once with n + n (identities of the convention)', () => {
    for (const p of PRESETS.filter((q) => q.theory.frame === 'relativistic')) {
      const r = countOperators(parseTheory(p.theory), { maxDim: 8 })
      expect(r.cpConvention).toMatch(/^CP maps each field to its conjugate/)
      for (const d of r.byDimension) {
        expect(d.cpEven! + d.cpOdd!, `${p.id} dimension ${d.dimension}`).toBe(d.operators)
        for (const [key, e] of Object.entries(d.cp!)) {
          if (e.conjugate) expect([e.even, e.odd]).toEqual([d.classes[key], d.classes[e.conjugate]])
          else expect(e.even + e.odd).toBe(d.classes[key])
        }
      }
    }
  })

  it('theories without a defined CP of this kind say why, and still count', () => {
    const a4 = parseTheory({ name: 'a4', frame: 'relativistic', groups: [{ name: 'F', type: 'A4', gauge: false }], fields: [{ name: 'phi', lorentz: 'scalar', real: true, reps: { F: '3' } }] })
    const r = countOperators(a4, { maxDim: 6 })
    expect(r.cpUnavailable).toMatch(/finite flavour group \(A4\)/)
    expect(r.byDimension[1]!.cpEven).toBeUndefined()
    expect(r.byDimension[1]!.operators).toBe(5)
    const so10 = parseTheory({
      name: 'so10',
      frame: 'relativistic',
      groups: [{ name: 'G', type: 'SO', n: 10, gauge: true }],
      fields: [{ name: 'psi', lorentz: 'left-weyl', reps: { G: [0, 0, 0, 0, 1] } }],
    })
    expect(countOperators(so10, { maxDim: 6 }).cpUnavailable).toBe('CP counts are not given for G = SO(10): complex conjugation is an outer automorphism of it')
    const six = parseTheory({
      name: 'six',
      frame: 'relativistic',
      groups: [{ name: 'G', type: 'SU', n: 4, gauge: false }],
      fields: [{ name: 's', lorentz: 'scalar', real: true, reps: { G: [0, 1, 0] } }],
    })
    expect(countOperators(six, { maxDim: 6 }).cpUnavailable).toMatch(/real field s in SU\(4\) \[0,1,0\]/)
  })

  it('a real triplet and a real octet keep the index-swap CP: H†ΣH-type and tr(S^3)-type invariants are CP-even (the twining character τ = χ_fund − 1)', () => {
    const t = parseTheory({
      name: 'real multiplets',
      frame: 'relativistic',
      groups: [
        { name: 'C', type: 'SU', n: 3, gauge: false },
        { name: 'W', type: 'SU', n: 2, gauge: false },
        { name: 'Y', type: 'U1', gauge: false },
      ],
      fields: [
        { name: 'S', lorentz: 'scalar', real: true, reps: { C: [1, 1] } },
        { name: 'T', lorentz: 'scalar', real: true, reps: { W: [2] } },
        { name: 'H', lorentz: 'scalar', reps: { W: [1] }, charges: { Y: '1/2' } },
      ],
    })
    const d5 = countOperators(t, { maxDim: 5 }).byDimension[0]!
    // Hermitian monomials without ε^{μνρσ}, all CP-even: (H†TH)(H†H), (T·T)(H†TH), tr(S²)(H†TH),
    // d_abc S^aS^bS^c H†H, d_abc S^aS^bS^c T·T and tr(S²) d_abc S^aS^bS^c.
    const one = { even: 1, odd: 0 }
    expect(d5.cp).toEqual({ 'T H^2 H*^2': one, 'T^3 H H*': one, 'S^2 T H H*': one, 'S^3 H H*': one, 'S^3 T^2': one, 'S^5': one })
  })
})
