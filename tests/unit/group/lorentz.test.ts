import { describe, expect, it } from 'vitest'
import {
  LORENTZ_IRREPS,
  characterProduct,
  decomposeProduct,
  lorentzConjugate,
  lorentzDecompose,
  lorentzDimension,
  lorentzIrrep,
  lorentzSingletCount,
  lorentzTensorProduct,
  lorentzWeights,
  productCharacter,
  productSingletCount,
  suWeights,
} from '../../../server/engine/group/index'

describe('Lorentz group SU(2)_l × SU(2)_r (Weinberg, QFT I, §5.6)', () => {
  it('labels, dimensions and conjugation', () => {
    expect(lorentzIrrep('1/2', 0)).toEqual([1, 0])
    expect(lorentzIrrep(1, '1/2')).toEqual([2, 1])
    expect(lorentzDimension(LORENTZ_IRREPS.V)).toBe(4)
    expect(lorentzDimension(LORENTZ_IRREPS.FL)).toBe(3)
    expect(lorentzConjugate(LORENTZ_IRREPS.L)).toEqual(LORENTZ_IRREPS.R)
    expect(Object.fromEntries(lorentzWeights([1, 0]))).toEqual({ '1;0': 1, '-1;0': 1 })
  })

  it('(1/2,0)⊗(0,1/2) = (1/2,1/2); (1/2,1/2)⊗(1/2,1/2) = (1,1)+(1,0)+(0,1)+(0,0) (Weinberg §5.6)', () => {
    expect(Object.fromEntries(lorentzTensorProduct([1, 0], [0, 1]))).toEqual({ '1;1': 1 })
    expect(Object.fromEntries(lorentzTensorProduct([1, 1], [1, 1]))).toEqual({ '2;2': 1, '2;0': 1, '0;2': 1, '0;0': 1 })
    const vv = characterProduct(lorentzWeights([1, 1]), lorentzWeights([1, 1]))
    expect(Object.fromEntries(lorentzDecompose(vv))).toEqual({ '2;2': 1, '2;0': 1, '0;2': 1, '0;0': 1 })
    expect(lorentzSingletCount(vv)).toBe(1)
  })

  it('F_L F_L has one scalar, F_L F_R none; ψψ (two left-handed) one scalar (common practice)', () => {
    const fl = lorentzWeights(LORENTZ_IRREPS.FL)
    const fr = lorentzWeights(LORENTZ_IRREPS.FR)
    const l = lorentzWeights(LORENTZ_IRREPS.L)
    expect(lorentzSingletCount(characterProduct(fl, fl))).toBe(1)
    expect(lorentzSingletCount(characterProduct(fl, fr))).toBe(0)
    expect(lorentzSingletCount(characterProduct(l, l))).toBe(1)
  })

  it('product groups: SU(3)×SU(2) decomposition and singlets of (3,2)⊗(3̄,2) (common practice)', () => {
    const a = productCharacter([suWeights(3, [1, 0]), suWeights(2, [1])])
    const b = productCharacter([suWeights(3, [0, 1]), suWeights(2, [1])])
    const ab = characterProduct(a, b)
    expect(Object.fromEntries(decomposeProduct([3, 2], ab))).toEqual({ '1,1;2': 1, '1,1;0': 1, '0,0;2': 1, '0,0;0': 1 })
    expect(productSingletCount([3, 2], ab)).toBe(1)
    expect(productSingletCount([3, 2], characterProduct(a, a))).toBe(0)
  })
})
