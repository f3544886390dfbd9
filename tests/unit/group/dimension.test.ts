import { describe, expect, it } from 'vitest'
import { suDimension, suWeights, characterDimension } from '../../../server/engine/group/index'

/**
 * Weyl dimension formula written independently, over positive roots in the Dynkin basis:
 * dim = Π_{1<=i<j<=n} (Σ_{k=i}^{j-1} (a_k + 1)) / (j - i)
 * (Weyl 1926; Fulton & Harris, Representation Theory, Cor. 24.6).
 */
function weylProduct(n: number, a: number[]): number {
  let num = 1n
  let den = 1n
  for (let i = 1; i <= n; i++) {
    for (let j = i + 1; j <= n; j++) {
      let s = 0
      for (let k = i; k < j; k++) s += a[k - 1]! + 1
      num *= BigInt(s)
      den *= BigInt(j - i)
    }
  }
  expect(num % den).toBe(0n)
  return Number(num / den)
}

function* allLabels(n: number, max: number): Generator<number[]> {
  const cur = new Array<number>(n - 1).fill(0)
  for (;;) {
    yield cur.slice()
    let i = 0
    while (i < n - 1 && cur[i] === max) cur[i++] = 0
    if (i === n - 1) return
    cur[i]!++
  }
}

describe('suDimension and suWeights', () => {
  it('agrees with the Weyl product over positive roots (Fulton & Harris, Cor. 24.6)', () => {
    const bounds: Record<number, number> = { 2: 12, 3: 5, 4: 3, 5: 2, 6: 1, 7: 1, 8: 1 }
    for (const [n, max] of Object.entries(bounds)) {
      for (const a of allLabels(Number(n), max)) expect(suDimension(Number(n), a), `${n}:${a}`).toBe(weylProduct(Number(n), a))
    }
  })

  it('number of weights with multiplicity equals the dimension (Weyl product, Fulton & Harris)', () => {
    const bounds: Record<number, number> = { 2: 8, 3: 3, 4: 2, 5: 1, 6: 1 }
    for (const [n, max] of Object.entries(bounds)) {
      for (const a of allLabels(Number(n), max)) {
        expect(characterDimension(suWeights(Number(n), a)), `${n}:${a}`).toBe(weylProduct(Number(n), a))
      }
    }
    expect(characterDimension(suWeights(8, [1, 0, 1, 0, 0, 1, 0]))).toBe(weylProduct(8, [1, 0, 1, 0, 0, 1, 0]))
  })

  it('known small dimensions (common practice)', () => {
    expect(suDimension(3, [1, 1])).toBe(8)
    expect(suDimension(3, [3, 0])).toBe(10)
    expect(suDimension(3, [2, 2])).toBe(27)
    expect(suDimension(5, [0, 1, 0, 0])).toBe(10)
    expect(suDimension(5, [2, 0, 0, 0])).toBe(15)
    expect(suDimension(5, [1, 0, 0, 1])).toBe(24)
    expect(suDimension(4, [0, 1, 0])).toBe(6)
    expect(suDimension(4, [1, 0, 1])).toBe(15)
    expect(suDimension(6, [0, 0, 1, 0, 0])).toBe(20)
    expect(suDimension(2, [4])).toBe(5)
    expect(suDimension(8, [0, 0, 0, 0, 0, 0, 0])).toBe(1)
  })

  it('weights: SU(3) adjoint has six roots and the zero weight twice (common practice)', () => {
    const w = suWeights(3, [1, 1])
    expect(Object.fromEntries(w)).toEqual({
      '1,1': 1,
      '2,-1': 1,
      '-1,2': 1,
      '1,-2': 1,
      '-2,1': 1,
      '-1,-1': 1,
      '0,0': 2,
    })
    expect(Object.fromEntries(suWeights(2, [3]))).toEqual({ '3': 1, '1': 1, '-1': 1, '-3': 1 })
  })

  it('SU(3) [2,2] (the 27): zero weight has multiplicity 3 (Fulton & Harris, §13.2 hexagon rule)', () => {
    expect(suWeights(3, [2, 2]).get('0,0')).toBe(3)
    expect(suWeights(3, [2, 2]).get('1,1')).toBe(2)
  })
})
