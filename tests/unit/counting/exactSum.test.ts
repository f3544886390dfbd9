import { describe, expect, it } from 'vitest'
import { ExactSum } from '../../../server/engine/counting/exactSum'
import { CycleMultiset } from '../../../server/engine/counting/cycleMultiset'
import { EngineConsistencyError } from '../../../server/engine/errors'

describe('exact accumulation (common practice: bigint arithmetic as the oracle)', () => {
  it('spills into bigint beyond 2^53 and stays exact', () => {
    const s = new ExactSum()
    s.addProduct(2 ** 30, 2 ** 30, 3, -1)
    s.addProduct(2 ** 52, 1)
    s.addProduct(2 ** 52, 1)
    s.addProduct(7, 0, 2 ** 50, 2 ** 50)
    expect(s.value()).toBe(-(2n ** 60n) * 3n + 2n ** 53n)
    expect(() => s.addProduct(0.5, 2)).toThrow(EngineConsistencyError)
    expect(() => s.addProduct(2 ** 53, 1)).toThrow(new EngineConsistencyError('ExactSum.addProduct', 'operands must be safe integers, got 9007199254740992, 1, 1, 1'))
  })

  it('cycle multisets give the same key for the same multiset in any insertion order', () => {
    const a = new CycleMultiset(3)
    const b = new CycleMultiset(3)
    a.add(2, 1, 1)
    a.add(0, 3, 1)
    a.add(2, 1, 1)
    b.add(0, 3, 1)
    b.add(2, 1, 2)
    b.add(1, 4, 1)
    b.add(1, 4, -1)
    expect(a.key()).toBe(b.key())
    expect(a.list()).toEqual([
      [0, 3],
      [2, 1],
      [2, 1],
    ])
    b.add(0, 3, -1)
    b.add(2, 1, -2)
    expect(b.isEmpty()).toBe(true)
  })
})
