import { describe, expect, it } from 'vitest'
import { characterAdams, characterDimension, characterPower, characterProduct, characterSum, lorentzWeights, suWeights } from '../../../server/engine/group/index'

/** Naive convolution written in the test: χ_{V⊗W} = χ_V χ_W (Fulton & Harris, §2.1). */
function naiveProduct(a: Map<string, number>, b: Map<string, number>): Record<string, number> {
  const out: Record<string, number> = {}
  for (const [ka, ma] of a) {
    for (const [kb, mb] of b) {
      const fa = ka.split(/([,;])/)
      const fb = kb.split(/([,;])/)
      const key = fa.map((x, i) => (i % 2 ? x : String(Number(x) + Number(fb[i])))).join('')
      out[key] = (out[key] ?? 0) + ma * mb
    }
  }
  for (const k of Object.keys(out)) if (out[k] === 0) delete out[k]
  return out
}

describe('characters', () => {
  it('characterProduct equals the naive convolution, packed and string paths (Fulton & Harris §2.1)', () => {
    const pairs: Array<[Map<string, number>, Map<string, number>]> = [
      [suWeights(3, [2, 1]), suWeights(3, [1, 1])],
      [suWeights(8, [1, 0, 0, 0, 0, 0, 1]), suWeights(8, [0, 1, 0, 0, 0, 0, 0])],
      [lorentzWeights([2, 1]), lorentzWeights([1, 1])],
      // weights too large for the fixed packing of SU(8) (digits beyond ±63): string path
      [
        new Map([
          ['60,0,0,0,0,0,-60', 2],
          ['-1,0,0,0,0,0,1', 1],
        ]),
        new Map([
          ['10,0,0,0,0,0,-10', 1],
          ['0,0,0,0,0,0,0', -1],
        ]),
      ],
      [new Map([['3,1', 1]]), new Map()],
    ]
    for (const [a, b] of pairs) expect(Object.fromEntries(characterProduct(a, b))).toEqual(naiveProduct(a, b))
    expect(characterDimension(characterProduct(suWeights(5, [0, 1, 0, 0]), suWeights(5, [1, 0, 0, 1])))).toBe(240)
  })

  it('virtual characters cancel to zero entries, which are dropped (common practice)', () => {
    const d = suWeights(2, [1])
    const diff = characterSum([
      [1, characterProduct(d, d)],
      [-1, suWeights(2, [2])],
      [-1, suWeights(2, [0])],
    ])
    expect(diff.size).toBe(0)
  })

  it('Adams operation ψ^r scales weights: ψ^2(2) = {2, -2} (Macdonald I.2, power sums)', () => {
    expect(Object.fromEntries(characterPower(2, suWeights(2, [1]), 2))).toEqual({ '2': 1, '-2': 1 })
    expect(Object.fromEntries(characterPower(3, suWeights(3, [1, 1]), 3))['0,0']).toBe(2)
    expect(Object.fromEntries(characterAdams(lorentzWeights([1, 0]), 3))).toEqual({ '3;0': 1, '-3;0': 1 })
  })
})
