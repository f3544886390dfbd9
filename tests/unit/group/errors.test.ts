import { describe, expect, it } from 'vitest'
import {
  characterPower,
  characterProduct,
  decomposeCharacter,
  multiplyIrreps,
  schurFunctorCharacter,
  lorentzIrrep,
  lorentzWeights,
  plethysm,
  productSingletCount,
  singletCount,
  suDimension,
  suIndex,
  suReality,
  suWeights,
  symmetricPower,
  tensorProduct,
} from '../../../server/engine/group/index'
import { EngineInputError } from '../../../server/engine/errors'
import { engineErrorOf } from '../../support/engineErrors'

describe('bad input throws EngineInputError repeating the value (the function is kept in `where`)', () => {
  it('group rank and labels', () => {
    expect(() => suWeights(9, [1, 0, 0, 0, 0, 0, 0, 0])).toThrow(EngineInputError)
    expect(() => suWeights(9, [1, 0, 0, 0, 0, 0, 0, 0])).toThrow('SU(n) needs a whole number n from 2 to 8, but n = 9')
    expect(() => suDimension(1, [])).toThrow('SU(n) needs a whole number n from 2 to 8, but n = 1')
    expect(() => suDimension(2.5, [1])).toThrow('but n = 2.5')
    expect(() => suReality(3, [1])).toThrow('SU(3) takes 2 Dynkin labels, but [1] has 1')
    expect(() => suIndex(3, [1, -1])).toThrow('Dynkin labels must be whole numbers, 0 or more, but they are [1,-1]')
    expect(() => tensorProduct(3, [1, 0], [0.5, 0])).toThrow('Dynkin labels must be whole numbers, 0 or more, but they are [0.5,0]')
  })

  it('too large irreps and partitions', () => {
    expect(() => suWeights(8, [2, 2, 2, 2, 2, 2, 2])).toThrow('The SU(8) representation [2,2,2,2,2,2,2] has dimension 22876792454961, above the limit of 5000000 weights') // 3^28
    expect(() => suDimension(8, [9, 9, 9, 9, 9, 9, 9])).toThrow('The SU(8) representation [9,9,9,9,9,9,9] has dimension 10000000000000000000000000000, beyond 2^53')
    expect(() => plethysm(3, [1, 0], [2, 3])).toThrow('A partition must be a non-increasing list of positive whole numbers, but it is [2,3]')
    expect(() => plethysm(3, [1, 0], [13])).toThrow('The partition [13] has size 13, above the limit 12')
    expect(() => symmetricPower(3, [1, 0], -1)).toThrow('The power must be a whole number, 0 or more, not -1')
  })

  it('characters with wrong keys', () => {
    // The message is for the user; `where` (the function at fault) is kept for the log.
    const labels = (n: number) => `does not have the ${n - 1} labels of an SU(${n}) weight`
    expect(engineErrorOf(() => singletCount(3, new Map([['1', 1]])))).toMatchObject({ where: 'singletCount', message: `The weight "1" ${labels(3)}` })
    expect(engineErrorOf(() => decomposeCharacter(3, new Map([['1,x', 1]])))).toMatchObject({ where: 'decomposeCharacter', message: '"1,x" is not a weight (whole numbers separated by commas)' })
    expect(engineErrorOf(() => characterPower(3, suWeights(3, [1, 0]), 0))).toMatchObject({ where: 'characterPower', message: 'The Adams power must be a positive whole number, not 0' })
    expect(engineErrorOf(() => characterPower(2, suWeights(3, [1, 0]), 2))).toMatchObject({ where: 'characterPower', message: `The weight "1,0" ${labels(2)}` })
    expect(engineErrorOf(() => characterProduct(suWeights(2, [1]), lorentzWeights([1, 0])))).toMatchObject({
      where: 'characterProduct',
      message: expect.stringMatching(/^Characters of different groups cannot be multiplied/),
    })
    expect(engineErrorOf(() => productSingletCount([2, 2], new Map([['1', 1]])))).toMatchObject({
      where: 'productSingletCount',
      message: 'The weight "1" does not have one part per factor of the 2-factor product group',
    })
    expect(engineErrorOf(() => decomposeCharacter(3, new Map([['1;0', 1]])))).toMatchObject({ where: 'decomposeCharacter', message: `The weight "1;0" ${labels(3)}` })
    expect(engineErrorOf(() => schurFunctorCharacter(3, new Map([['1', 1]]), [2]))).toMatchObject({ where: 'schurFunctorCharacter', message: `The weight "1" ${labels(3)}` })
    expect(engineErrorOf(() => multiplyIrreps(3, new Map([['1,0', 1]]), new Map([['1', 1]])))).toMatchObject({ where: 'multiplyIrreps', message: `The weight "1" ${labels(3)}` })
    expect(engineErrorOf(() => singletCount(2, new Map([['0', 0.5]])))).toMatchObject({
      where: 'singletCount',
      message: expect.stringMatching(/^The number of singlets \(0\.5\) is beyond exact arithmetic/),
    })
  })

  it('Lorentz spins', () => {
    expect(engineErrorOf(() => lorentzIrrep('1/3', 0))).toMatchObject({ where: 'lorentzIrrep', message: 'A spin must be a multiple of 1/2 from 0 to 20, but it is 1/3' })
    expect(() => lorentzIrrep(-1, 0)).toThrow('but it is -1')
    expect(engineErrorOf(() => lorentzWeights([1, -1]))).toMatchObject({
      where: 'lorentzWeights',
      message: 'A Lorentz representation is written [2j_L, 2j_R] with whole numbers from 0 to 40, but it is [1,-1]',
    })
  })
})
