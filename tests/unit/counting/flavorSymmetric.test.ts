import { describe, expect, it } from 'vitest'
import { findPreset } from '../../../shared/presets/index'
import type { Theory } from '../../../shared/schemas/theory'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { countOperators } from '../../../server/engine/counting/countOperators'
import { COUNT_WORK_BUDGET, estimateCountWork } from '../../../server/engine/counting/budget'
import { enumerateFieldContents } from '../../../server/engine/counting/classes'
import { buildTheoryModel } from '../../../server/engine/theory/model'
import { EngineInputError } from '../../../server/engine/errors'

const u35 = (): Theory => parseTheory(findPreset('smeft-u3-5')!.theory)

describe('flavour-symmetric SMEFT, U(3)^5 written as SU(3)^5 × U(1)^5 (13 groups)', () => {
  it('dimension 6: 47 operators (Faroughy, Isidori, Wilsch, Yamamoto, JHEP 08 (2020) 166, Table 1, exact U(3)^5)', () => {
    const t = u35()
    expect(t.groups).toHaveLength(13)
    const d6 = countOperators(t, { maxDim: 6, minDim: 6 }).byDimension[0]!
    expect(d6.operators).toBe(47)
    // Class by class: the Warsaw basis (Grzadkowski, Iskrzynski, Misiak, Rosiek, JHEP 10 (2010) 085)
    // with its flavour indices contracted by U(3)^5 invariants (δ's): ψ^2 H^3, ψ^2 X H and all
    // chirality-flipping four-fermion operators need spurions and vanish; two δ contractions for
    // identical currents (ll, qq(1), qq(3), uu, dd), one otherwise; ee has one by the Fierz identity.
    expect(d6.classes).toEqual({
      'W_R^3': 1,
      'W_L^3': 1,
      'G_R^3': 1,
      'G_L^3': 1,
      'H H* B_R^2': 1,
      'H H* B_L^2': 1,
      'H H* W_R B_R': 1,
      'H H* W_R^2': 1,
      'H H* W_L B_L': 1,
      'H H* W_L^2': 1,
      'H H* G_R^2': 1,
      'H H* G_L^2': 1,
      'D^2 H^2 H*^2': 2,
      'H^3 H*^3': 1,
      'D L L* H H*': 2,
      'D e e* H H*': 1,
      'D Q Q* H H*': 2,
      'D u u* H H*': 1,
      'D d d* H H*': 1,
      'L^2 L*^2': 2,
      'Q^2 Q*^2': 4,
      'Q Q* L L*': 2,
      'e^2 e*^2': 1,
      'u^2 u*^2': 2,
      'd^2 d*^2': 2,
      'u u* e e*': 1,
      'd d* e e*': 1,
      'u u* d d*': 2,
      'L L* e e*': 1,
      'u u* L L*': 1,
      'd d* L L*': 1,
      'Q Q* e e*': 1,
      'Q Q* u u*': 2,
      'Q Q* d d*': 2,
    })
  })

  it('the 13-group theory runs to dimension 12 well inside the work budget (estimate from the input; budget.ts)', () => {
    const t = u35()
    const model = buildTheoryModel(t)
    const w = estimateCountWork(model, enumerateFieldContents(model, 5, 12))
    expect(w.terms).toBeLessThan(COUNT_WORK_BUDGET / 100)
    const r = countOperators(t, { maxDim: 8 })
    expect(r.byDimension.map((d) => d.operators)).toEqual([0, 47, 0, 456])
  })

  it('more than 16 groups: seven more global Z2 groups under which every field is even change nothing (common practice)', () => {
    const t = u35()
    const more = parseTheory({ ...t, groups: [...t.groups, ...Array.from({ length: 7 }, (_, i) => ({ name: `P${i}`, type: 'Z' as const, n: 2, gauge: false }))] })
    expect(more.groups).toHaveLength(20)
    expect(countOperators(more, { maxDim: 6, minDim: 6 }).byDimension[0]!.operators).toBe(47)
  })

  it('a count beyond its work budget is refused with the estimate and what to change', () => {
    let caught: unknown
    try {
      countOperators(u35(), { maxDim: 8, workBudget: 1000 })
    } catch (e) {
      caught = e
    }
    expect(caught).toBeInstanceOf(EngineInputError)
    expect((caught as Error).message).toMatch(
      /^theory "SMEFT, U\(3\)\^5 flavour symmetry" up to dimension 8 needs an estimated \d\.\d\de\+\d+ cycle-index terms over \d+ field contents, above the budget of 1\.0e\+3; lower the maximum dimension, or declare fewer fields or groups$/,
    )
  })

  it('SMEFT with 6 flavours to dimension 16 stays inside the default budget (the referee cases of issue 18 counted)', () => {
    const smeft = parseTheory(findPreset('smeft')!.theory)
    const model = buildTheoryModel(smeft, { nf: 6 })
    expect(estimateCountWork(model, enumerateFieldContents(model, 5, 16)).terms).toBeLessThan(COUNT_WORK_BUDGET)
  })
})
