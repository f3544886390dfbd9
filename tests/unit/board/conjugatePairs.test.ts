import { describe, expect, it } from 'vitest'
import { pairConjugateClasses } from '../../../shared/utils/conjugatePairs'
import { countOperators } from '../../../server/engine/counting/countOperators'
import { buildBasis } from '../../../server/engine/basis/buildBasis'
import { findPreset } from '../../../shared/presets/index'

// The counts page groups a class with its conjugate as the board does (issue 17, item 5).
describe('conjugate classes in one entry', () => {
  it('pairs G_L^3 with G_R^3 and H^2 with H*^2, keeps a self-conjugate class alone, and sums the counts', () => {
    expect(pairConjugateClasses({ 'G_L^3': 1, 'G_R^3': 1, 'D^2 H^2 H*^2': 2, 'H^3 H*^3': 1, 'e H H* L*': 1, 'e* H H* L': 1 })).toEqual([
      { key: 'G_L^3', conjugate: 'G_R^3', count: 2 },
      { key: 'D^2 H^2 H*^2', conjugate: null, count: 2 },
      { key: 'H^3 H*^3', conjugate: null, count: 1 },
      { key: 'e H H* L*', conjugate: 'e* H H* L', count: 2 },
    ])
  })

  it('a real scalar is its own conjugate (real scalar: φ^6 alone)', () => {
    expect(pairConjugateClasses({ 'phi^6': 1, 'D^2 phi^4': 1 })).toEqual([
      { key: 'phi^6', conjugate: null, count: 1 },
      { key: 'D^2 phi^4', conjugate: null, count: 1 },
    ])
  })

  it('SMEFT dimension 6, N_f = 1: the counts page shows as many classes as the board, and the same real parameters (84, Henning, Lu, Melia & Murayama, JHEP 08 (2017) 016)', () => {
    const theory = findPreset('smeft')!.theory
    const board = buildBasis(theory, { maxDim: 6, nf: 1 }).byDimension.find((d) => d.dimension === 6)!.classes
    const counted = countOperators(theory, { maxDim: 6, nf: 1 }).byDimension.find((d) => d.dimension === 6)!
    const pairs = pairConjugateClasses(counted.classes)
    expect(pairs.length).toBe(board.length)
    expect(pairs.reduce((s, p) => s + p.count, 0)).toBe(84)
    expect(new Set(pairs.map((p) => p.key))).toEqual(new Set(board.map((c) => c.key)))
  })
})
