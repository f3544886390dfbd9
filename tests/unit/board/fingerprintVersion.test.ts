import { describe, expect, it } from 'vitest'
import { FINGERPRINT_VERSION, UNRECORDED_FINGERPRINT_VERSION, reproducesStoredPoints, storedFingerprintVersion, typedRewritePlan } from '../../../server/engine/board/fingerprintVersion'
import { typedFingerprint, typedFingerprints } from '../../../server/engine/board/typedOperator'
import { buildBasis } from '../../../server/engine/basis/buildBasis'
import { findPreset } from '../../../shared/presets/index'

describe("which code a stored basis's fingerprints came from", () => {
  it('reads an unrecorded (null) version as version 1, which the current code reproduces', () => {
    expect(FINGERPRINT_VERSION).toBe(1)
    expect(UNRECORDED_FINGERPRINT_VERSION).toBe(1)
    expect(storedFingerprintVersion(null)).toBe(1)
    expect(storedFingerprintVersion(undefined)).toBe(1)
    expect(reproducesStoredPoints(null)).toBe(true)
    expect(reproducesStoredPoints(FINGERPRINT_VERSION)).toBe(true)
    expect(reproducesStoredPoints(0)).toBe(false)
    expect(reproducesStoredPoints(FINGERPRINT_VERSION + 1)).toBe(false)
  })

  it('plans a typed rewrite: stored kept fingerprints when reproduced, else the kept texts fingerprinted again', () => {
    expect(typedRewritePlan(null, ['<12>[12]'], '7001/3 <12>[12]')).toEqual({ texts: ['7001/3 <12>[12]'], useStored: true })
    expect(typedRewritePlan(FINGERPRINT_VERSION, ['<12>[12]'], 'x')).toEqual({ texts: ['x'], useStored: true })
    expect(typedRewritePlan(99, ['<12>[12]', '<13>[13]'], 'x')).toEqual({ texts: ['<12>[12]', '<13>[13]', 'x'], useStored: false })
  })
})

describe('version 1 sample points (change these only together with FINGERPRINT_VERSION)', () => {
  it('the first kept four-photon operator has the same fingerprint as when version 1 was recorded', () => {
    const photons = findPreset('photons')!.theory
    const key = buildBasis(photons, { minDim: 8, maxDim: 8 }).byDimension[0]!.classes[0]!.key
    const f = typedFingerprint(photons, key, '<12>^2<34>^2')
    // Pinned from this commit's code (common practice: a golden value guarding a stored format).
    expect(f.primes).toEqual([67108837, 67108777])
    expect(f.values.map((v) => v.length)).toEqual([20, 20])
    expect(f.values.map((v) => v.slice(0, 4))).toEqual([
      [5768553, 53492818, 47619844, 59648719],
      [12233849, 61331506, 32386887, 24519004],
    ])
  })

  it('every kept and set-aside operator of a real basis is fingerprinted again from its stored text exactly (the recompute path)', () => {
    const smeft = findPreset('smeft')!.theory
    const classes = buildBasis(smeft, { minDim: 6, maxDim: 6, nf: 1 }).byDimension[0]!.classes
    let compared = 0
    for (const c of classes) {
      const ops = [...c.operators, ...(c.alternatives ?? [])]
      const again = typedFingerprints(
        smeft,
        c.key,
        ops.map((o) => o.text),
      )
      ops.forEach((o, i) => expect(again[i], `${c.key}: ${o.text}`).toEqual(o.fingerprint))
      compared += ops.length
    }
    expect(compared).toBeGreaterThan(84)
  })
})
