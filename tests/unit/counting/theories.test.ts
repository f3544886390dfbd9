import { describe, expect, it } from 'vitest'
import { PRESETS, findPreset } from '../../../shared/presets/index'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { countOperators } from '../../../server/engine/counting/countOperators'
import { EngineCancelledError, EngineInputError } from '../../../server/engine/errors'

const preset = (id: string) => parseTheory(findPreset(id)!.theory)

describe('small theories', () => {
  it('one real scalar, dimension 6: only φ^6, and D^2 φ^4 is removed by EOM + IBP (common practice)', () => {
    const d6 = countOperators(preset('real-scalar'), { maxDim: 6, minDim: 6 }).byDimension[0]!
    expect(d6.classes).toEqual({ 'phi^6': 1 })
    expect(d6.classes['D^2 phi^4']).toBeUndefined()
    expect(d6.operators).toBe(1)
  })

  it('one real scalar, dimension 8: φ^8 and one D^4 φ^4 ((∂φ·∂φ)^2) (Henning, Lu, Melia, Murayama, JHEP 10 (2017) 199, real scalar example; from memory)', () => {
    const d8 = countOperators(preset('real-scalar'), { maxDim: 8, minDim: 8 }).byDimension[0]!
    expect(d8.classes).toEqual({ 'D^4 phi^4': 1, 'phi^8': 1 })
  })

  it('photons only, dimension 8: 3 operators, (F F)^2, (F F̃)^2 and (F F)(F F̃) (Heisenberg & Euler, Z. Phys. 98 (1936) 714)', () => {
    const r = countOperators(preset('photons'), { maxDim: 8 })
    expect(r.byDimension.map((d) => d.operators)).toEqual([0, 0, 0, 3])
    expect(r.byDimension[3]!.classes).toEqual({ 'A_L^2 A_R^2': 1, 'A_L^4': 1, 'A_R^4': 1 })
  })

  it('QED with one Dirac fermion, dimension 5: the magnetic and electric dipole operators (common practice)', () => {
    const d5 = countOperators(preset('qed'), { maxDim: 5 }).byDimension[0]!
    expect(d5.classes).toEqual({ 'eL eR* A_L': 1, 'eL* eR A_R': 1 })
  })

  it('scalar QED, dimension 6: |φ|^6, the two |φ|^2 D^2 |φ|^2 reduced to one, |φ|^2 F^2 and |φ|^2 F F̃ (common practice)', () => {
    const d6 = countOperators(preset('scalar-qed'), { maxDim: 6, minDim: 6 }).byDimension[0]!
    expect(d6.classes).toEqual({ 'D^2 phi^2 phi*^2': 1, 'phi phi* A_L^2': 1, 'phi phi* A_R^2': 1, 'phi^3 phi*^3': 1 })
  })

  it('every preset up to dimension 8: counts are non-negative integers and flavor polynomials are exact rationals (no ΔH needed above dimension 4; Henning et al., JHEP 08 (2017) 016)', () => {
    for (const p of PRESETS.filter((q) => q.theory.frame === 'relativistic')) {
      const r = countOperators(parseTheory(p.theory), { maxDim: 8, flavorPolynomials: true })
      for (const d of r.byDimension) {
        for (const n of Object.values(d.classes)) expect(Number.isInteger(n) && n > 0).toBe(true)
        for (const coeffs of Object.values(d.flavorPolynomials!)) for (const c of coeffs) expect(c).toMatch(/^-?\d+(\/\d+)?$/)
      }
    }
  })
})

/** Evaluate a polynomial given as rational-string coefficients of Nf^0, Nf^1, ... */
function evaluate(coeffs: string[], nf: number): number {
  let num = 0n
  let den = 1n
  coeffs.forEach((c, i) => {
    const [p, q = '1'] = c.split('/')
    const t = BigInt(p!) * BigInt(nf) ** BigInt(i)
    num = num * BigInt(q) + t * den
    den *= BigInt(q)
  })
  expect(num % den).toBe(0n)
  return Number(num / den)
}

describe('flavor polynomials', () => {
  const smeft = preset('smeft')
  it('at Nf = 1 and Nf = 3 they equal the direct counts, every SMEFT class of dimensions 5–7 (common practice: Nf enters as Nf^(number of cycles))', () => {
    const poly = countOperators(smeft, { maxDim: 7, flavorPolynomials: true })
    for (const nf of [1, 3]) {
      const direct = countOperators(smeft, { maxDim: 7, nf })
      direct.byDimension.forEach((d, i) => {
        const polys = poly.byDimension[i]!.flavorPolynomials!
        for (const [key, n] of Object.entries(d.classes)) expect([key, evaluate(polys[key]!, nf)]).toEqual([key, n])
      })
    }
  })

  it('Weinberg operator L^2 H^2 counts Nf(Nf+1)/2 (Weinberg, Phys. Rev. Lett. 43 (1979) 1566: symmetric in flavor)', () => {
    const d5 = countOperators(smeft, { maxDim: 5, flavorPolynomials: true }).byDimension[0]!
    expect(d5.flavorPolynomials!['L^2 H^2']).toEqual(['0', '1/2', '1/2'])
    expect(d5.classes['L^2 H^2']).toBe(6)
  })

  it('Q_le = (l̄γl)(ēγe) has Nf^4 flavor components (Alonso, Jenkins, Manohar, Trott, JHEP 04 (2014) 159)', () => {
    const d6 = countOperators(smeft, { maxDim: 6, minDim: 6, flavorPolynomials: true }).byDimension[0]!
    expect(d6.flavorPolynomials!['L L* e e*']).toEqual(['0', '0', '0', '0', '1'])
  })
})

describe('input errors and run control', () => {
  const scalar = preset('real-scalar')
  it('rejects bad dimensions and flavor numbers with the bad value in the message', () => {
    expect(() => countOperators(scalar, { maxDim: 4 })).toThrow(new EngineInputError('countOperators', 'The maximum dimension of a count must be a whole number from 5 to 16, not 4'))
    expect(() => countOperators(scalar, { maxDim: 17 })).toThrow(/not 17/)
    expect(() => countOperators(scalar, { maxDim: 8, minDim: 3 })).toThrow('The lowest dimension must be a whole number from 5 to the maximum dimension 8, not 3')
    expect(() => countOperators(scalar, { maxDim: 8, nf: 7 })).toThrow('The number of flavors must be a whole number from 1 to 6, not 7')
  })

  it('refuses the heavy-particle frame (handled by another engine)', () => {
    const heavy = { ...scalar, frame: 'heavy' as const }
    expect(() => countOperators(heavy, { maxDim: 6 })).toThrow(EngineInputError)
    expect(() => countOperators(heavy, { maxDim: 6 })).toThrow('uses the heavy frame, which the Hilbert-series count does not cover')
  })

  it('reports progress up to 1 and stops when cancelled', () => {
    const seen: number[] = []
    countOperators(preset('smeft'), { maxDim: 6, onProgress: (f) => seen.push(f) })
    expect(seen.at(-1)).toBe(1)
    expect(seen.every((f, i) => f >= 0 && f <= 1 && (i === 0 || f >= seen[i - 1]!))).toBe(true)
    expect(() => countOperators(preset('smeft'), { maxDim: 6, signal: { aborted: true } })).toThrow(EngineCancelledError)
  })
})

describe('discrete and global symmetries', () => {
  it('a Z2 (φ → −φ) removes the odd powers of a real scalar: dims 5, 7 empty, φ^6 and φ^8, D^4 φ^4 kept (common practice)', () => {
    const t = parseTheory({
      name: 'Z2 scalar',
      frame: 'relativistic',
      groups: [{ name: 'P', type: 'Z', n: 2, gauge: false }],
      fields: [{ name: 'phi', lorentz: 'scalar', real: true, charges: { P: 1 } }],
    })
    expect(countOperators(t, { maxDim: 8 }).byDimension.map((d) => d.operators)).toEqual([0, 1, 0, 2])
  })

  it('a doublet of a global SU(2) × U(1) counts like the Higgs: H^3 H*^3 → 1 (Q_H), D^2 H^2 H*^2 → 2 (Q_H□, Q_HD) (Grzadkowski, Iskrzynski, Misiak, Rosiek, JHEP 10 (2010) 085)', () => {
    const t = parseTheory({
      name: 'O4',
      frame: 'relativistic',
      groups: [
        { name: 'SU2', type: 'SU', n: 2, gauge: false },
        { name: 'U', type: 'U1', gauge: false },
      ],
      fields: [{ name: 'H', lorentz: 'scalar', reps: { SU2: [1] }, charges: { U: '1' } }],
    })
    expect(countOperators(t, { maxDim: 6, minDim: 6 }).byDimension[0]!.classes).toEqual({ 'D^2 H^2 H*^2': 2, 'H^3 H*^3': 1 })
  })

  it('a real (2,2) bidoublet of SU(2)_L × SU(2)_R counts with custodial symmetry: Φ^6 → 1 and D^2 Φ^4 → 1 (the custodial-violating Q_HD is gone; Sikivie, Susskind, Voloshin, Zakharov, Nucl. Phys. B 173 (1980) 189; Grzadkowski et al., JHEP 10 (2010) 085)', () => {
    const t = parseTheory({
      name: 'custodial',
      frame: 'relativistic',
      groups: [
        { name: 'SU2L', type: 'SU', n: 2, gauge: false },
        { name: 'SU2R', type: 'SU', n: 2, gauge: false },
      ],
      fields: [{ name: 'Phi', lorentz: 'scalar', real: true, reps: { SU2L: [1], SU2R: [1] } }],
    })
    const r = countOperators(t, { maxDim: 8 })
    expect(r.byDimension[1]!.classes).toEqual({ 'D^2 Phi^4': 1, 'Phi^6': 1 })
    // The same four real components as one real 4-vector of O(4) (SU(2)×SU(2)/Z2 = SO(4)):
    // odd powers vanish (the (2,2) is odd under the centre), like a Z2-odd field.
    expect(r.byDimension[0]!.operators).toBe(0)
    expect(r.byDimension[2]!.operators).toBe(0)
  })

  it('SMEFT one flavor, dimensions 9 and 10: 560 and 15456 (Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016, title)', () => {
    const r = countOperators(preset('smeft'), { maxDim: 10, minDim: 9, nf: 1 })
    expect(r.byDimension.map((d) => d.operators)).toEqual([560, 15456])
  })
})

describe('flavors as copies', () => {
  it('a field with flavors = 2 counts like two copies of it (oracle: the same theory with the copies written out; common practice)', () => {
    const flavored = parseTheory({
      name: 'flavored',
      frame: 'relativistic',
      groups: [
        { name: 'SU2', type: 'SU', n: 2, gauge: true },
        { name: 'Y', type: 'U1', gauge: true },
      ],
      fields: [
        { name: 'l', lorentz: 'left-weyl', reps: { SU2: [1] }, charges: { Y: '-1/2' }, flavors: 2 },
        { name: 'e', lorentz: 'right-weyl', charges: { Y: '-1' }, flavors: 3 },
        { name: 'h', lorentz: 'scalar', reps: { SU2: [1] }, charges: { Y: '1/2' } },
      ],
    })
    const copies = parseTheory({
      ...flavored,
      name: 'copies',
      fields: [
        { name: 'l1', lorentz: 'left-weyl', reps: { SU2: [1] }, charges: { Y: '-1/2' } },
        { name: 'l2', lorentz: 'left-weyl', reps: { SU2: [1] }, charges: { Y: '-1/2' } },
        { name: 'e1', lorentz: 'right-weyl', charges: { Y: '-1' } },
        { name: 'e2', lorentz: 'right-weyl', charges: { Y: '-1' } },
        { name: 'e3', lorentz: 'right-weyl', charges: { Y: '-1' } },
        { name: 'h', lorentz: 'scalar', reps: { SU2: [1] }, charges: { Y: '1/2' } },
      ],
    })
    const a = countOperators(flavored, { maxDim: 8 }).byDimension.map((d) => d.operators)
    const b = countOperators(copies, { maxDim: 8 }).byDimension.map((d) => d.operators)
    expect(a).toEqual(b)
    expect(a[0]).toBe(6) // l l h h and its conjugate: 2 × Nf(Nf+1)/2 = 6 for Nf = 2 (Weinberg, Phys. Rev. Lett. 43 (1979) 1566)
  })
})
