import { describe, expect, it } from 'vitest'
import { findPreset } from '../../../shared/presets/index'
import type { Theory } from '../../../shared/schemas/theory'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { anomalyConditions, checkAnomalies } from '../../../server/engine/theory/anomalies'

const smeft = parseTheory(findPreset('smeft')!.theory)
const without = (t: Theory, name: string): Theory => ({ ...t, fields: t.fields.filter((f) => f.name !== name) })

describe('gauge anomalies', () => {
  it('Standard Model hypercharges cancel every condition (Bouchiat, Iliopoulos, Meyer, Phys. Lett. B 38 (1972) 519)', () => {
    expect(checkAnomalies(smeft)).toEqual([])
    const names = anomalyConditions(smeft).map((c) => c.name)
    expect(names).toEqual(['colour^3', 'colour^2 hypercharge', 'weak^2 hypercharge', 'weak Witten', 'hypercharge^3', 'gravity^2 hypercharge'])
    // 12 doublets (3 × (3 colours + 1 lepton)): even (Witten, Phys. Lett. B 117 (1982) 324)
    expect(anomalyConditions(smeft).find((c) => c.name === 'weak Witten')!.sum).toBe('12')
  })

  it('removing e (three flavors of a right-handed charge −1 singlet) breaks U(1)^3 and the gravitational condition by exactly −3 (same reference; arithmetic)', () => {
    expect(checkAnomalies(without(smeft, 'e'))).toEqual([
      { name: 'hypercharge^3', sum: '-3', ok: false },
      { name: 'gravity^2 hypercharge', sum: '-3', ok: false },
    ])
  })

  it('removing u breaks SU(3)^3 as well, and one quark-doublet colour triplet alone gives an odd number of doublets', () => {
    const noU = checkAnomalies(without(smeft, 'u')).map((c) => c.name)
    expect(noU).toContain('colour^3')
    expect(noU).toContain('colour^2 hypercharge')
    const oneFlavor: Theory = { ...smeft, fields: smeft.fields.filter((f) => f.name !== 'L').map((f) => ({ ...f, flavors: f.flavors && 1 })) }
    const failures = checkAnomalies(oneFlavor)
    // 3 doublets (the colours of Q): odd (Witten, Phys. Lett. B 117 (1982) 324)
    expect(failures.find((c) => c.name === 'weak Witten')).toEqual({ name: 'weak Witten', sum: '3', ok: false })
    // Σ T(R) Y over Q alone: 3 × 1/2 × 1/6 = 1/4 (arithmetic)
    expect(failures.find((c) => c.name === 'weak^2 hypercharge')!.sum).toBe('1/4')
  })

  it('SU(5) with 5̄ + 10 is anomaly free, 10 alone is not (Georgi & Glashow, Phys. Rev. Lett. 32 (1974) 438)', () => {
    const gut = parseTheory({
      name: 'SU5',
      frame: 'relativistic',
      groups: [{ name: 'SU5', type: 'SU', n: 5, gauge: true }],
      fields: [
        { name: 'F', lorentz: 'left-weyl', reps: { SU5: [0, 0, 0, 1] } },
        { name: 'T', lorentz: 'left-weyl', reps: { SU5: [0, 1, 0, 0] } },
      ],
    })
    expect(checkAnomalies(gut)).toEqual([])
    expect(checkAnomalies(without(gut, 'F'))).toEqual([{ name: 'SU5^3', sum: '1', ok: false }])
  })

  it('mixed U(1)_a U(1)_b^2 among gauge U(1)s; global U(1)s are not checked (common practice)', () => {
    const t = parseTheory({
      name: 'two U1',
      frame: 'relativistic',
      groups: [
        { name: 'A', type: 'U1', gauge: true },
        { name: 'B', type: 'U1', gauge: true },
        { name: 'C', type: 'U1', gauge: false },
      ],
      fields: [
        { name: 'x', lorentz: 'left-weyl', charges: { A: '1', B: '1', C: '5' } },
        { name: 'y', lorentz: 'right-weyl', charges: { A: '1', B: '-1', C: '7' } },
      ],
    })
    // left-handed charges: x (1, 1), y^c (−1, 1): A^3 = 0, B^3 = 2, A B^2 = 0, B A^2 = 2, grav A = 0, grav B = 2
    expect(checkAnomalies(t)).toEqual([
      { name: 'B^3', sum: '2', ok: false },
      { name: 'B A^2', sum: '2', ok: false },
      { name: 'gravity^2 B', sum: '2', ok: false },
    ])
  })
})
