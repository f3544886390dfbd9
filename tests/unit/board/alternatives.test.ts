import { describe, it, expect } from 'vitest'
import { buildBasis } from '../../../server/engine/basis/buildBasis'
import { coverageRank, expressIn } from '../../../server/engine/board/fingerprints'
import { findPreset } from '../../../shared/presets/index'
import { toString as ratString } from '../../../server/engine/exact/rational'

// The board's coverage and rewrites rest on fingerprints stored with each operator. Checked on
// SMEFT at dimension 6 with one flavor (84 real parameters: Henning, Lu, Melia, Murayama,
// JHEP 08 (2017) 016): in every class the kept fingerprints have the class rank, and every
// redundant alternative is an exact rational combination of the kept operators.
describe('fingerprints of a real basis', () => {
  const report = buildBasis(findPreset('smeft')!.theory, { maxDim: 6, minDim: 6, nf: 1 })
  const classes = report.byDimension[0]!.classes

  it('reproduces the published total', () => {
    expect(report.byDimension[0]!.operators).toBe(84)
  })

  it('kept fingerprints span exactly the class rank', () => {
    for (const c of classes) {
      expect(coverageRank(c.operators.map((o) => o.fingerprint!)), c.key).toBe(c.rank)
    }
  })

  it('every alternative rewrites onto the kept operators, and dropping a kept operator breaks coverage', () => {
    let rewritten = 0
    for (const c of classes) {
      const kept = c.operators.map((o) => o.fingerprint!)
      for (const alt of c.alternatives ?? []) {
        const combo = expressIn(kept, alt.fingerprint!)
        expect(combo, `${c.key}: ${alt.text}`).not.toBeNull()
        expect(combo!.coefficients.map(ratString).every((q) => /^-?\d+(\/\d+)?$/.test(q))).toBe(true)
        rewritten++
      }
      if (c.rank > 1) expect(expressIn(kept.slice(1), kept[0]!), c.key).toBeNull()
    }
    expect(rewritten).toBeGreaterThan(20)
  })
})

describe('the photon chain on fingerprints', () => {
  it('has three kept operators at dimension 8 and no vanishing alternative (Euler and Heisenberg, Z. Phys. 98 (1936) 714)', () => {
    const r = buildBasis(findPreset('photons')!.theory, { maxDim: 8, minDim: 8 })
    expect(r.byDimension[0]!.operators).toBe(3)
    for (const c of r.byDimension[0]!.classes) {
      for (const alt of c.alternatives ?? []) expect(alt.fingerprint!.values[0]!.some((v) => v !== 0)).toBe(true)
    }
  })
})
