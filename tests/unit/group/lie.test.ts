/**
 * Term-by-term cross-check against LiE (Debian package lie). The fixtures were produced once by
 * tests/fixtures/lie/generate.ts (fixed seed, 280 random cases over SU(2)..SU(5) = A1..A4,
 * 36 over SU(6)..SU(8), 3 fixed edge cases, and 42 dominant-weight systems (dom_char) over
 * SU(2)..SU(8)); this test does not need `lie` at run time.
 */
import { readFileSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { alternatingPower, plethysm, suDimension, suWeights, symmetricPower, tensorProduct } from '../../../server/engine/group/index'

// The fixture's shape, from its generator (a type-only import: the script does not run).
import type { LieCase } from '../../fixtures/lie/generate'

const here = dirname(fileURLToPath(import.meta.url))
const doc = JSON.parse(readFileSync(join(here, '../../fixtures/lie/lie-cases.json'), 'utf8')) as {
  source: string
  cases: LieCase[]
}

function ours(c: LieCase): Record<string, number> {
  switch (c.op) {
    case 'tensor':
      return Object.fromEntries(tensorProduct(c.n, c.a, c.b!))
    case 'sym_tensor':
      return Object.fromEntries(symmetricPower(c.n, c.a, c.k!))
    case 'alt_tensor':
      return Object.fromEntries(alternatingPower(c.n, c.a, c.k!))
    case 'plethysm':
      return Object.fromEntries(plethysm(c.n, c.a, c.partition!))
    case 'dim':
      return { dim: suDimension(c.n, c.a) }
    case 'dom_char':
      return Object.fromEntries([...suWeights(c.n, c.a)].filter(([k]) => k.split(',').every((x) => Number(x) >= 0)))
  }
}

function label(c: LieCase): string {
  const extra = c.b ? ` x [${c.b}]` : c.k !== undefined ? ` k=${c.k}` : c.partition ? ` λ=[${c.partition}]` : ''
  return `${c.op} SU(${c.n}) [${c.a}]${extra}`
}

describe('LiE (Debian package lie) cross-check', () => {
  it('has at least 200 SU(2)..SU(5) cases, covering every operation for each group', () => {
    expect(doc.source).toMatch(/LiE \(Debian package lie\)/)
    expect(doc.cases.filter((c) => c.n <= 5).length).toBeGreaterThanOrEqual(200)
    for (const op of ['tensor', 'sym_tensor', 'alt_tensor', 'plethysm', 'dim']) {
      for (const n of [2, 3, 4, 5]) expect(doc.cases.some((c) => c.op === op && c.n === n)).toBe(true)
    }
  })

  for (const op of ['tensor', 'sym_tensor', 'alt_tensor', 'plethysm', 'dim', 'dom_char'] as const) {
    it(`${op}: every case equals LiE term by term`, () => {
      const cases = doc.cases.filter((c) => c.op === op)
      expect(cases.length).toBeGreaterThan(0)
      for (const c of cases) expect(ours(c), label(c)).toEqual(c.result)
    })
  }
})
