import { describe, expect, it } from 'vitest'
import { buildBasis, classBasis } from '../../../server/engine/basis/index'
import { flavorDecomposition, YOUNG_CONVENTION } from '../../../server/engine/basis/flavor'
import { PrimeField, workingPrimes } from '../../../server/engine/finite/primeField'
import { rank } from '../../../server/engine/finite/matrix'
import { glDimension, standardTableaux, youngSymmetrizer } from '../../../server/engine/basis/young'
import smeft3Json from './fixtures/smeft3.json'
import type { Theory } from '../../../shared/schemas/theory'

const smeft3 = smeft3Json as Theory

describe('Young symmetrizers and GL(N) dimensions', () => {
  it('hook-content and hook-length formulas (Stanley, EC2 Cor. 7.21.4; Frame–Robinson–Thrall 1954)', () => {
    expect(glDimension([2, 1], 3)).toBe(8)
    expect(glDimension([2], 3)).toBe(6)
    expect(glDimension([1, 1], 3)).toBe(3)
    expect(glDimension([1, 1, 1], 2)).toBe(0)
    expect(glDimension([2, 2], 3)).toBe(6)
    expect(standardTableaux([2, 1])).toBe(2)
    expect(standardTableaux([3, 2, 1])).toBe(16)
  })
  it('Y_[2] = e + (12), Y_[1,1] = e − (12); Fermi twist flips the sign (Fulton & Harris §4.1)', () => {
    expect(
      youngSymmetrizer([2], [0, 1], 2, false)
        .map((t) => t.sign)
        .sort(),
    ).toEqual([1, 1])
    expect(
      youngSymmetrizer([1, 1], [0, 1], 2, false)
        .map((t) => t.sign)
        .sort(),
    ).toEqual([-1, 1])
    expect(
      youngSymmetrizer([2], [0, 1], 2, true)
        .map((t) => t.sign)
        .sort(),
    ).toEqual([-1, 1])
    expect(youngSymmetrizer([2, 1], [0, 1, 2], 3, false)).toHaveLength(4)
  })
})

/** Rank of Y_T on (F^N)^{⊗m}: the image of every basis tensor, as rows. */
function youngImageRank(lambda: number[], N: number): number {
  const F = new PrimeField(workingPrimes(1)[0]!)
  const m = lambda.reduce((a, b) => a + b, 0)
  const legs = Array.from({ length: m }, (_, i) => i)
  const y = youngSymmetrizer(lambda, legs, m, false)
  const size = N ** m
  const digits = (x: number) => legs.map((k) => Math.floor(x / N ** k) % N)
  const rows = Array.from({ length: size }, (_, e) => {
    const out = new Array<number>(size).fill(0)
    const idx = digits(e)
    for (const t of y) {
      const moved = legs.reduce((acc, k) => acc + idx[t.map[k]!]! * N ** k, 0)
      out[moved] = F.add(out[moved]!, F.from(t.sign))
    }
    return out
  })
  return rank(F, rows)
}

describe('the flavour components of one Young symmetrizer (the stated convention)', () => {
  // Fulton & Harris, Representation Theory, §6.1: Y_T V^{⊗m} is the GL(N) irrep of shape λ,
  // so one listed operator has dim_GL(N)(λ) components, not f^λ times as many.
  const cases: [number[], number][] = [
    [[2, 1], 3],
    [[2, 1], 2],
    [[2, 2], 3],
    [[3, 1], 2],
    [[1, 1, 1], 3],
    [[2], 3],
  ]
  it.each(cases)('Y_T for λ = %j on (C^%i)^⊗m has rank dim_GL(N)(λ)', (lambda, N) => {
    expect(youngImageRank(lambda, N)).toBe(glDimension(lambda, N))
  })
  it('every flavoured class states the convention', () => {
    const b = classBasis(smeft3, 'L^2 H^2')
    expect(flavorDecomposition(smeft3, b, 3, 6).convention).toBe(YOUNG_CONVENTION)
    expect(YOUNG_CONVENTION).toMatch(/antisymmetrize the columns, then symmetrize the rows/)
  })
})

describe('flavor counts of the SMEFT', () => {
  it('Weinberg operator: flavor-symmetric, 6 complex components for N_f = 3 (Weinberg, PRL 43 (1979) 1566; common practice)', () => {
    const b = classBasis(smeft3, 'L^2 H^2')
    const f = flavorDecomposition(smeft3, b, 3, 6)
    expect(f.decomposition).toEqual([{ young: [[2], [2]], multiplicity: 1, componentsEach: 6 }])
    expect(f.count).toBe(6)
    expect(f.tallyOk).toBe(true)
    expect(f.operators[0]!.flavorComponents).toBe(6)
    const bad = flavorDecomposition(smeft3, b, 3, 5)
    expect(bad.tallyOk).toBe(false)
    expect(bad.message).toBe('class L^2 H^2: flavor count 6 differs from Hilbert-series count 5')
  })
  it('dimension 6 with N_f = 3: 3045 real parameters, 2499 B-conserving + 546 B-violating (Alonso, Jenkins, Manohar & Trott, JHEP 04 (2014) 159); all classes tally-checked', () => {
    const r = buildBasis(smeft3, { maxDim: 6, nf: 3 })
    const d6 = r.byDimension.find((d) => d.dimension === 6)!
    expect(d6.operators).toBe(3045)
    const baryon = (key: string) =>
      key.split(' ').reduce((s, tok) => {
        const m = /^([A-Za-z_]+)(\*?)(?:\^(\d+))?$/.exec(tok)!
        return s + (['Q', 'u', 'd'].includes(m[1]!) ? (m[2] ? -1 : 1) * Number(m[3] ?? 1) : 0)
      }, 0)
    const bViolating = d6.classes.filter((c) => baryon(c.key) !== 0).reduce((s, c) => s + c.flavor!.realParameters, 0)
    expect(bViolating).toBe(546)
    expect(d6.operators - bViolating).toBe(2499)
    expect(d6.tallyOk).toBe(true)
    expect(r.byDimension.find((d) => d.dimension === 5)!.operators).toBe(12)
  })
  it('N_f = 1 and 2 agree with the Hilbert series class by class (Henning, Lu, Melia & Murayama, JHEP 08 (2017) 016: 84 for N_f = 1)', () => {
    const r1 = buildBasis(smeft3, { maxDim: 6, nf: 1 })
    expect(r1.byDimension.find((d) => d.dimension === 6)!.operators).toBe(84)
    const r2 = buildBasis(smeft3, { maxDim: 6, nf: 2 })
    const d6 = r2.byDimension.find((d) => d.dimension === 6)!
    expect(d6.classes.filter((c) => !c.tallyOk).map((c) => c.message)).toEqual([])
  })
})

describe('classes that vanish for one flavor but not for three', () => {
  it('dimension 7, N_f = 3: 1542 real parameters (Henning, Lu, Melia & Murayama, JHEP 08 (2017) 016), including classes empty for N_f = 1', () => {
    const r = buildBasis(smeft3, { minDim: 7, maxDim: 7, nf: 3 })
    const d7 = r.byDimension[0]!
    expect(d7.operators).toBe(1542)
    expect(d7.tallyOk).toBe(true)
    expect(d7.classes.some((c) => c.rank === 0 && c.flavor!.count > 0)).toBe(true)
  })
})
