/**
 * CP labels of explicit operators (fermionic ones included) against the CP-twisted Hilbert
 * series; buildBasis fails the tally of a class whose labels disagree with the count.
 */
import { describe, expect, it } from 'vitest'
import { findPreset } from '../../../shared/presets/index'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { buildBasis, classBasis } from '../../../server/engine/basis/index'
import { describeOperators } from '../../../server/engine/basis/describe'
import { countOperators } from '../../../server/engine/counting/countOperators'

const preset = (id: string) => parseTheory(findPreset(id)!.theory)

describe('CP of explicit operators', () => {
  it('SMEFT, D L L* H^2 H*^2 at dimension 8 (one flavour): three CP-even and one CP-odd Hermitian operator, as the twisted count (Murphy, JHEP 10 (2020) 174, class ψ^2 H^4 D; split computed)', () => {
    const smeft = preset('smeft')
    const b = classBasis(smeft, 'D L L* H^2 H*^2')
    const labels = describeOperators(b)
      .map((o) => o.cp)
      .sort()
    expect(labels).toEqual(['even', 'even', 'even', 'odd'])
    const count = countOperators(smeft, { maxDim: 8, minDim: 8, nf: 1 }).byDimension[0]!
    expect(count.cp!['D L L* H^2 H*^2']).toEqual({ even: 3, odd: 1 })
  })

  it('QED to dimension 8 and QCD-like to dimension 7: every operator labelled, every class agrees with the twisted count', () => {
    for (const [id, maxDim] of [
      ['qed', 8],
      ['qcd-like', 7],
    ] as const) {
      const r = buildBasis(preset(id), { maxDim })
      for (const d of r.byDimension) {
        expect(d.tallyOk, `${id} ${d.dimension}: ${d.message}`).toBe(true)
        for (const c of d.classes) {
          expect(c.tallyOk, c.message).toBe(true)
          expect(c.cpEven! + c.cpOdd!).toBe(c.flavor?.realParameters ?? c.realParameters)
          for (const o of c.operators) expect(['even', 'odd', 'both']).toContain(o.cp)
        }
      }
    }
  }, 120_000)

  it('three flavours: each class takes the flavoured split of the twisted count; SMEFT dimension 6 gives 1623 + 1422 (Alonso et al., JHEP 04 (2014) 159, plus 273 + 273 baryon-number violating)', () => {
    const r = buildBasis(preset('smeft'), { minDim: 6, maxDim: 6, nf: 3 })
    const d6 = r.byDimension[0]!
    expect(d6.tallyOk).toBe(true)
    expect([d6.classes.reduce((s, c) => s + c.cpEven!, 0), d6.classes.reduce((s, c) => s + c.cpOdd!, 0)]).toEqual([1623, 1422])
  }, 120_000)
})
