import { describe, expect, it } from 'vitest'
import { irrepShape } from '../../../server/engine/basis/tensorShape'
import { randomTensorWave } from '../../../server/engine/basis/tensorWaves'
import { PrimeField, workingPrimes } from '../../../server/engine/finite/primeField'
import { SeededRandom } from '../../../server/engine/finite/rng'
import { rank } from '../../../server/engine/finite/matrix'
import { buildBasis, classBasis } from '../../../server/engine/basis/index'
import { describeOperators } from '../../../server/engine/basis/describe'

const F = new PrimeField(workingPrimes(1)[0]!)
const SU = (name: string, n: number) => ({ name, type: 'SU' as const, n, gauge: true })

describe('SU(N) irreps written as traceless tensors [α; β] (Fulton & Harris, Representation Theory, §6.1, §15.5)', () => {
  it('shapes with the fewest indices', () => {
    expect(irrepShape(5, [0, 1, 0, 0])).toEqual({ upper: [1, 1], lower: [] }) // 10 of SU(5): T^{ij} = −T^{ji}
    expect(irrepShape(3, [2, 0])).toEqual({ upper: [2], lower: [] }) // sextet S^{ij} = S^{ji}
    expect(irrepShape(2, [3])).toEqual({ upper: [2], lower: [1] }) // quartet Q^{ij}_k
    expect(irrepShape(2, [4])).toEqual({ upper: [2], lower: [2] }) // quintet, α = β: may be real
    expect(irrepShape(3, [0, 2])).toEqual({ upper: [], lower: [2] }) // anti-sextet
    expect(irrepShape(3, [1, 1])).toEqual({ upper: [1], lower: [1] }) // octet
  })
  // Dimensions by the Weyl dimension formula, e.g. Slansky, Phys. Rep. 79 (1981) 1, tables.
  const cases: [number, number[], number][] = [
    [5, [0, 1, 0, 0], 10],
    [3, [2, 0], 6],
    [2, [3], 4],
    [2, [4], 5],
    [3, [2, 1], 15],
    [3, [3, 0], 10],
    [4, [0, 2, 0], 20],
    [4, [1, 0, 1], 15],
  ]
  it.each(cases)('random tensors of SU(%i) %j span exactly the irrep (dimension %i)', (n, dynkin, dim) => {
    const rng = new SeededRandom(7)
    const rows = Array.from({ length: dim + 6 }, () => randomTensorWave(F, n, irrepShape(n, dynkin), () => rng.below(F.p)).data)
    expect(rank(F, rows)).toBe(dim)
  })
})

describe('explicit bases with higher SU(N) representations agree with the Hilbert series (tally)', () => {
  // Invariant counts by tensor-product decomposition, checked against the counting engine,
  // whose products and plethysms are checked against LiE (tests/unit/group).
  const su5 = {
    name: 'su5',
    frame: 'relativistic' as const,
    groups: [SU('G', 5)],
    fields: [
      { name: 'T', lorentz: 'left-weyl' as const, reps: { G: [0, 1, 0, 0] } },
      { name: 'F', lorentz: 'left-weyl' as const, reps: { G: [0, 0, 0, 1] } },
      { name: 'H', lorentz: 'scalar' as const, reps: { G: [1, 0, 0, 0] } },
    ],
  }
  it('SU(5) Yukawas: ε_{ijklm} T^{ij} T^{kl} H^m and T^{ij} F_i H*_j, one each (10⊗10⊗5 ∋ 1 once, 10⊗5̄⊗5̄ ∋ 1 once)', () => {
    const tth = classBasis(su5, 'T^2 H')
    expect(tth.rank).toBe(1)
    expect(describeOperators(tth)[0]!.latex).toContain('\\epsilon_{')
    expect(classBasis(su5, 'F T H*').rank).toBe(1)
  })
  it('SU(5) with T, F, H to dimension 5: every class tallies', () => {
    for (const d of buildBasis(su5, { maxDim: 5 }).byDimension) expect([d.dimension, d.tallyOk, d.message ?? '']).toEqual([d.dimension, true, ''])
  })
  const sextet = { name: 'diquark', frame: 'relativistic' as const, groups: [SU('C', 3)], fields: [{ name: 'S', lorentz: 'scalar' as const, reps: { C: [2, 0] } }] }
  it('colour sextet: S³ once (ε ε S S S), S² S*² twice (Sym²(6)⊗Sym²(6̄) share 2 irreps)', () => {
    expect(classBasis(sextet, 'S^3').rank).toBe(1)
    expect(classBasis(sextet, 'S^2 S*^2').rank).toBe(2)
  })
  const quartet = { name: 'quartet', frame: 'relativistic' as const, groups: [SU('W', 2)], fields: [{ name: 'Q', lorentz: 'scalar' as const, reps: { W: [3] } }] }
  it('SU(2) quartet: Q² Q*² twice (Sym²(4) = 7 + 3)', () => {
    expect(classBasis(quartet, 'Q^2 Q*^2').rank).toBe(2)
  })
  it('classes beyond the evaluation budget are refused with the numbers (their count stays with the Hilbert series)', () => {
    expect(() => classBasis(quartet, 'Q^4')).toThrow(
      'class Q^4: writing it out needs about 3.3e+7 index-loop terms (147 candidate operators, 24 permutations of identical fields, 64 terms per contraction)',
    )
    expect(() => classBasis(sextet, 'S^4 S*')).toThrow('beyond the budget of 1e+7 for fields in higher representations')
  })
  it('a real field needs equal upper and lower shapes: a real bidoublet is counted, not written out', () => {
    const bi = { name: 'bi', frame: 'relativistic' as const, groups: [SU('A', 2), SU('B', 2)], fields: [{ name: 'P', lorentz: 'scalar' as const, real: true, reps: { A: [1], B: [1] } }] }
    expect(() => classBasis(bi, 'P^4')).toThrow('field P: a real field in A = SU(2) [1] is not written as a tensor with equal upper and lower index shapes')
  })
})
