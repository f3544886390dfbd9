import { describe, expect, it } from 'vitest'
import {
  characterPower, characterProduct, decomposeCharacter, multiplyIrreps, schurFunctorCharacter, lorentzIrrep, lorentzWeights, plethysm, productSingletCount,
  singletCount, suDimension, suIndex, suReality, suWeights, symmetricPower, tensorProduct,
} from '../../../server/engine/group/index'
import { EngineInputError } from '../../../server/engine/errors'

describe('bad input throws EngineInputError naming the function and the value', () => {
  it('group rank and labels', () => {
    expect(() => suWeights(9, [1, 0, 0, 0, 0, 0, 0, 0])).toThrow(EngineInputError)
    expect(() => suWeights(9, [1, 0, 0, 0, 0, 0, 0, 0])).toThrow('suWeights: SU(n) needs an integer n from 2 to 8, got n = 9')
    expect(() => suDimension(1, [])).toThrow('suDimension: SU(n) needs an integer n from 2 to 8, got n = 1')
    expect(() => suDimension(2.5, [1])).toThrow('got n = 2.5')
    expect(() => suReality(3, [1])).toThrow('suReality: SU(3) Dynkin labels need 2 entries, got [1]')
    expect(() => suIndex(3, [1, -1])).toThrow('suIndex: Dynkin labels must be non-negative integers, got [1,-1]')
    expect(() => tensorProduct(3, [1, 0], [0.5, 0])).toThrow('tensorProduct: Dynkin labels must be non-negative integers, got [0.5,0]')
  })

  it('too large irreps and partitions', () => {
    expect(() => suWeights(8, [2, 2, 2, 2, 2, 2, 2])).toThrow('suWeights: SU(8) irrep [2,2,2,2,2,2,2] has dimension 22876792454961, above the limit 5000000') // 3^28
    expect(() => suDimension(8, [9, 9, 9, 9, 9, 9, 9])).toThrow('suDimension: dimension of SU(8) [9,9,9,9,9,9,9] exceeds 2^53: 10000000000000000000000000000')
    expect(() => plethysm(3, [1, 0], [2, 3])).toThrow('plethysm: partition must be a non-increasing list of positive integers, got [2,3]')
    expect(() => plethysm(3, [1, 0], [13])).toThrow('plethysm: partition [13] has size 13, above the limit 12')
    expect(() => symmetricPower(3, [1, 0], -1)).toThrow('symmetricPower: power k must be a non-negative integer, got -1')
  })

  it('characters with wrong keys', () => {
    expect(() => singletCount(3, new Map([['1', 1]]))).toThrow('singletCount: weight "1" does not have 2 labels for SU(3)')
    expect(() => decomposeCharacter(3, new Map([['1,x', 1]]))).toThrow('decomposeCharacter: malformed weight key "1,x"')
    expect(() => characterPower(3, suWeights(3, [1, 0]), 0)).toThrow('characterPower: Adams power r must be a positive integer, got 0')
    expect(() => characterPower(2, suWeights(3, [1, 0]), 2)).toThrow('characterPower: weight "1,0" does not have 1 labels for SU(2)')
    expect(() => characterProduct(suWeights(2, [1]), lorentzWeights([1, 0]))).toThrow(/characterProduct: weights of different shape/)
    expect(() => productSingletCount([2, 2], new Map([['1', 1]]))).toThrow('productSingletCount: weight key "1" does not have 2 factors separated by \';\'')
    expect(() => decomposeCharacter(3, new Map([['1;0', 1]]))).toThrow('decomposeCharacter: weight "1;0" does not have 2 labels for SU(3)')
    expect(() => schurFunctorCharacter(3, new Map([['1', 1]]), [2])).toThrow('schurFunctorCharacter: weight "1" does not have 2 labels for SU(3)')
    expect(() => multiplyIrreps(3, new Map([['1,0', 1]]), new Map([['1', 1]]))).toThrow('multiplyIrreps: weight "1" does not have 2 labels for SU(3)')
    expect(() => singletCount(2, new Map([['0', 0.5]]))).toThrow('singletCount: multiplicities must be safe integers, got a total of 0.5')
  })

  it('Lorentz spins', () => {
    expect(() => lorentzIrrep('1/3', 0)).toThrow('lorentzIrrep: spin must be a non-negative multiple of 1/2 up to 20, got 1/3')
    expect(() => lorentzIrrep(-1, 0)).toThrow('got -1')
    expect(() => lorentzWeights([1, -1])).toThrow('lorentzWeights: Lorentz irrep must be [2j_l, 2j_r] with integers 0..40, got [1,-1]')
  })
})
