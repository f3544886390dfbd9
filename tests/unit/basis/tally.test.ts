import { describe, expect, it, vi } from 'vitest'

// Simulate a Hilbert-series count that disagrees with the amplitude rank for one class,
// to check that the mismatch is reported on the class and the dimension, never hidden.
vi.mock('../../../server/engine/counting/countOperators', async (orig) => {
  const real = await orig<typeof import('../../../server/engine/counting/countOperators')>()
  return {
    ...real,
    countOperators: (t: Parameters<typeof real.countOperators>[0], o: Parameters<typeof real.countOperators>[1]) => {
      const r = real.countOperators(t, o)
      for (const d of r.byDimension)
        if (d.classes['phi^6'] !== undefined) {
          d.classes['phi^6'] = 2
          d.operators += 1
        }
      return r
    },
  }
})

const { buildBasis } = await import('../../../server/engine/basis/index')
const phi = { name: 'phi', frame: 'relativistic' as const, groups: [], fields: [{ name: 'phi', lorentz: 'scalar' as const, real: true }] }

describe('tally check (rank must equal the Hilbert-series count: Henning, Lu, Melia & Murayama, JHEP 08 (2017) 016)', () => {
  it('reports a mismatch on the class and the dimension', () => {
    const d6 = buildBasis(phi, { maxDim: 6 }).byDimension.find((d) => d.dimension === 6)!
    const c = d6.classes.find((x) => x.key === 'phi^6')!
    expect(c.rank).toBe(1)
    expect(c.tallyOk).toBe(false)
    expect(c.message).toBe('class phi^6: amplitude rank 1 differs from Hilbert-series count 2 (conjugate class phi^6: 2)')
    expect(d6.tallyOk).toBe(false)
    expect(d6.message).toBe('dimension 6: 1 real parameters from the explicit basis, 2 from the Hilbert series')
  })
})
