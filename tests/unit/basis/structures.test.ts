import { describe, expect, it } from 'vitest'
import { EngineConsistencyError } from '../../../server/engine/errors'
import { PrimeField, SeededRandom, workingPrimes } from '../../../server/engine/finite/index'
import { randomKinematics } from '../../../server/engine/basis/kinematics'
import { bracketGraphs, lorentzStructures } from '../../../server/engine/basis/lorentzStructures'
import { suStructures, evaluateSu } from '../../../server/engine/basis/gaugeStructures'
import { identicalLegPermutations } from '../../../server/engine/basis/symmetry'
import { parseOperatorText, formatLorentz } from '../../../server/engine/basis/inputSyntax'
import { basisSpecies } from '../../../server/engine/basis/species'
import { parseClassKey } from '../../../server/engine/basis/classKey'
import { rat } from '../../../server/engine/exact/rational'

const F = new PrimeField(workingPrimes(1)[0]!)

describe('spinor kinematics (Elvang & Huang, Scattering Amplitudes, CUP 2015, ch. 2)', () => {
  it('momentum conservation Σ λ_i λ̃_i = 0 and s_ij identities', () => {
    const rng = new SeededRandom(3)
    for (const n of [4, 5, 7]) {
      const k = randomKinematics(F, rng, n)
      for (const a of [0, 1])
        for (const b of [0, 1]) {
          let s = 0
          for (let i = 0; i < n; i++) s = F.add(s, F.mul(k.lam[i]![a]!, k.lamt[i]![b]!))
          expect(s).toBe(0)
        }
      // Σ_j ⟨1j⟩[j2] = 0 (momentum conservation sandwiched)
      let t = 0
      for (let j = 0; j < n; j++) t = F.add(t, F.mul(k.angle[0]![j]!, k.square[j]![1]!))
      expect(t).toBe(0)
    }
  })
  it('three-point kinematics: one bracket type vanishes on each branch', () => {
    const rng = new SeededRandom(5)
    const a = randomKinematics(F, rng, 3, 'angle')
    const s = randomKinematics(F, rng, 3, 'square')
    expect(a.square[0]![1]).toBe(0)
    expect(a.angle[0]![1]).not.toBe(0)
    expect(s.angle[1]![2]).toBe(0)
    expect(s.square[1]![2]).not.toBe(0)
    expect(() => randomKinematics(F, rng, 2)).toThrow(new EngineConsistencyError('randomKinematics', 'need at least 3 legs, got 2'))
  })
})

describe('structures (common practice)', () => {
  it('bracket multigraphs and Lorentz structures', () => {
    expect(bracketGraphs([1, 1, 1, 1])).toHaveLength(3)
    expect(bracketGraphs([2, 2, 2, 2])).toHaveLength(6)
    expect(bracketGraphs([3, 1])).toHaveLength(0)
    expect(lorentzStructures([0, 0, 0, 0], [0, 0, 0, 0], 2)).toHaveLength(6) // s_ij, i<j
  })
  it('SU(N) contractions by the first fundamental theorem (Weyl, The Classical Groups, 1939)', () => {
    expect(suStructures('c', 3, ['adj', 'adj', 'adj'])).toHaveLength(2) // tr(X1X2X3), tr(X1X3X2) ~ f, d
    expect(suStructures('c', 3, ['fund', 'fund', 'fund'])).toHaveLength(1) // ε_ijk
    expect(suStructures('w', 2, ['fund', 'fund', 'fund', 'fund'])).toHaveLength(3) // ε ε pairings
    expect(suStructures('c', 3, ['fund', 'anti'])).toHaveLength(1)
    expect(suStructures('c', 3, ['fund', 'fund'])).toHaveLength(0)
    const [d] = suStructures('c', 3, ['fund', 'anti'])
    expect(
      evaluateSu(F, d!, [
        [1, 2, 3],
        [4, 5, 6],
      ]),
    ).toBe(32) // δ^i_j u^i v_j = 4+10+18
    const [e] = suStructures('c', 3, ['fund', 'fund', 'fund'])
    expect(
      evaluateSu(F, e!, [
        [1, 0, 0],
        [0, 1, 0],
        [0, 0, 1],
      ]),
    ).toBe(1) // ε_123 = 1
  })
  it('identical-leg permutations carry Fermi signs', () => {
    const ps = basisSpecies({
      name: 'x',
      frame: 'relativistic',
      groups: [],
      fields: [
        { name: 'psi', lorentz: 'left-weyl' },
        { name: 'phi', lorentz: 'scalar', real: true },
      ],
    })
    const c = parseClassKey(ps, 'psi^2 phi^2')
    const perms = identicalLegPermutations(c.legs)
    expect(perms).toHaveLength(4)
    expect(perms.map((p) => p.sign).sort()).toEqual([-1, -1, 1, 1])
  })
  it('input syntax: signs of reversed brackets, powers, Mandelstams, round trip', () => {
    const ps = basisSpecies({ name: 'x', frame: 'relativistic', groups: [], fields: [{ name: 'phi', lorentz: 'scalar', real: true }] })
    const c = parseClassKey(ps, 'D^4 phi^4')
    const [t] = parseOperatorText(c, '-1/2 <21>^2[12]^2', 1)
    expect(t!.coeff).toEqual(rat(-1, 2)) // ⟨21⟩² = ⟨12⟩²
    expect(formatLorentz(t!.lorentz, null)).toBe('<12>^2[12]^2')
    const [u] = parseOperatorText(c, 's12^2', 1)
    expect(u!.coeff).toEqual(rat(1)) // s² = (−⟨12⟩[12])²
    expect(() => parseOperatorText(c, '', 1)).toThrow('The operator is empty')
    expect(() => parseOperatorText(c, 's12^2 {g:3}', 1)).toThrow('The gauge contraction {g:3} in "s12^2 {g:3}" does not exist; this class has 1, numbered from {g:0}')
  })
})

describe('fast δ-chain evaluation agrees with explicit index sums (common practice)', () => {
  it('random fund/anti/adjoint contractions', async () => {
    const { evaluateSuBrute, randomSuWave } = await import('../../../server/engine/basis/gaugeStructures')
    const rng = new SeededRandom(11)
    const draw = () => rng.below(F.p)
    for (const kinds of [
      ['adj', 'adj', 'adj', 'adj'],
      ['fund', 'adj', 'anti', 'adj', 'fund', 'anti'],
      ['fund', 'fund', 'anti', 'anti'],
    ] as const) {
      const ss = suStructures('c', 3, [...kinds])
      expect(ss.length).toBeGreaterThan(1)
      for (const s of ss) {
        const w = kinds.map((k) => randomSuWave(F, 3, k, draw))
        expect(evaluateSu(F, s, w)).toBe(evaluateSuBrute(F, s, w))
      }
    }
  })
})
