import { describe, expect, it } from 'vitest'
import { findPreset } from '../../../shared/presets/index'
import type { Theory } from '../../../shared/schemas/theory'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { countOperators } from '../../../server/engine/counting/countOperators'

const smeft = parseTheory(findPreset('smeft')!.theory)

/** SMEFT with a global U(1) baryon number (Q, u, d carry 1/3). */
function smeftWithBaryonNumber(): Theory {
  const t = structuredClone(smeft)
  t.groups.push({ name: 'Bno', type: 'U1', gauge: false })
  for (const f of t.fields) if (['Q', 'u', 'd'].includes(f.name)) f.charges = { ...f.charges, Bno: '1/3' }
  return parseTheory(t)
}

describe('SMEFT totals', () => {
  it('one flavor, dimensions 5–8: 2, 84, 30, 993 (Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016)', () => {
    const r = countOperators(smeft, { maxDim: 8, nf: 1 })
    expect(r.theory).toBe('SMEFT')
    expect(r.byDimension.map((d) => [d.dimension, d.operators])).toEqual([
      [5, 2],
      [6, 84],
      [7, 30],
      [8, 993],
    ])
  })

  it('three flavors: dim 5 → 12, dim 6 → 3045, dim 8 → 44807 (Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016)', () => {
    const r = countOperators(smeft, { maxDim: 8 })
    const byDim = Object.fromEntries(r.byDimension.map((d) => [d.dimension, d.operators]))
    expect(byDim[5]).toBe(12)
    expect(byDim[6]).toBe(3045)
    expect(byDim[8]).toBe(44807)
    // dim 7 with three flavors: 1542 (same paper, table of Nf = 3 counts; value from memory)
    expect(byDim[7]).toBe(1542)
  })

  it('class counts add up to the total of each dimension (common practice: the total is the sum over classes)', () => {
    for (const d of countOperators(smeft, { maxDim: 7 }).byDimension) {
      expect(Object.values(d.classes).reduce((a, b) => a + b, 0)).toBe(d.operators)
    }
  })

  it('dimension 6, three flavors: 2499 baryon-number conserving (Alonso, Jenkins, Manohar, Trott, JHEP 04 (2014) 159) and 546 violating', () => {
    const withB = countOperators(smeftWithBaryonNumber(), { maxDim: 6, minDim: 6 })
    expect(withB.byDimension[0]!.operators).toBe(2499)
    // the same split read off the classes of plain SMEFT: a class violates B when #Q + #u + #d ≠ #Q* + #u* + #d*
    const classes = countOperators(smeft, { maxDim: 6, minDim: 6 }).byDimension[0]!.classes
    let violating = 0
    for (const [key, n] of Object.entries(classes)) {
      let b = 0
      for (const tok of key.split(' ')) {
        const m = /^(Q|u|d)(\*?)(?:\^(\d+))?$/.exec(tok)
        if (m) b += (m[2] ? -1 : 1) * Number(m[3] ?? 1)
      }
      if (b !== 0) violating += n
    }
    expect(violating).toBe(546)
  })
})

describe('SMEFT dimension-6 classes, one flavor (Grzadkowski, Iskrzynski, Misiak, Rosiek, JHEP 10 (2010) 085)', () => {
  const classes = countOperators(smeft, { maxDim: 6, minDim: 6, nf: 1 }).byDimension[0]!.classes
  it.each([
    ['H^3 H*^3', 1], // Q_H
    ['D^2 H^2 H*^2', 2], // Q_H□, Q_HD
    ['G_L^3', 1], // Q_G + i Q_G̃ (with G_R^3: the two real coefficients of Q_G, Q_G̃)
    ['G_R^3', 1],
    ['W_L^3', 1], // Q_W, Q_W̃
    ['W_R^3', 1],
    ['H H* W_L B_L', 1], // Q_HWB, Q_HW̃B
    ['H H* G_L^2', 1], // Q_HG, Q_HG̃
    ['L* e H^2 H*', 1], // Q_eH
    ['L* e H W_R', 1], // Q_eW
    ['D L L* H H*', 2], // Q_Hl^(1), Q_Hl^(3)
    ['D u* d H^2', 1], // Q_Hud
    ['L^2 L*^2', 1], // Q_ll
    ['Q^2 Q*^2', 2], // Q_qq^(1), Q_qq^(3)
    ['Q Q* u u*', 2], // Q_qu^(1), Q_qu^(8)
    ['Q u* L e*', 2], // Q_lequ^(1), Q_lequ^(3) (conjugate class)
    ['Q^3 L', 1], // Q_qqq (baryon number violating)
    ['u^2 d e', 1], // Q_duu
  ])('%s → %i', (key, n) => {
    expect(classes[key]).toBe(n)
  })
  it('no class for operators removed by the equations of motion, e.g. D^4 H H* (common practice)', () => {
    expect(classes['D^4 H H*']).toBeUndefined()
    expect(classes['D^2 H^2 H*^2']).toBe(2)
  })
})

describe('SMEFT dimension-6 classes, three flavors (Alonso, Jenkins, Manohar, Trott, JHEP 04 (2014) 159, Table of parameter counts)', () => {
  const classes = countOperators(smeft, { maxDim: 6, minDim: 6 }).byDimension[0]!.classes
  it.each([
    ['L L* e e*', 81], // Q_le: Nf^4
    ['Q Q* u u*', 162], // Q_qu^(1), Q_qu^(8): 2 Nf^4
    ['L e* H H*^2', 9], // Q_eH^†: Nf^2 (conjugate class of Q_eH)
    ['L* e H^2 H*', 9],
    ['H^3 H*^3', 1],
  ])('%s → %i', (key, n) => {
    expect(classes[key]).toBe(n)
  })
})
