/**
 * SO(N), Sp(2N), G2, F4, E6, E7, E8 against LiE (Debian package lie): the fixtures were made
 * once by tests/fixtures/lie/generate-simple.ts; this test does not need `lie` at run time.
 */
import { readFileSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import type { LieSimpleCase } from '../../fixtures/lie/generate-simple'
import { RootSystem } from '../../../shared/physics/lie/rootSystem'
import type { LieType } from '../../../shared/physics/lie/cartan'
import { dominantWeights, lieDimension, lieWeights } from '../../../server/engine/group/lie/lieWeights'
import { lieAlternatingPower, lieConjugate, liePlethysm, lieReality, lieSingletCount, lieSymmetricPower, lieTensorProduct } from '../../../server/engine/group/lie/lieIrrep'
import { adjointLabels, rootSystemOf } from '../../../server/engine/group/lie/simpleGroups'
import { characterProduct } from '../../../server/engine/group/character'
import { suWeights } from '../../../server/engine/group/weights'
import { EngineInputError } from '../../../server/engine/errors'

const here = dirname(fileURLToPath(import.meta.url))
const doc = JSON.parse(readFileSync(join(here, '../../fixtures/lie/lie-simple-cases.json'), 'utf8')) as { source: string; cases: LieSimpleCase[] }

const rsOf = (g: string): RootSystem => RootSystem.of(g[0] as LieType, Number(g.slice(1)))

function ours(c: LieSimpleCase): Record<string, number> {
  const rs = rsOf(c.g)
  switch (c.op) {
    case 'tensor':
      return Object.fromEntries(lieTensorProduct(rs, c.a, c.b!))
    case 'sym_tensor':
      return Object.fromEntries(lieSymmetricPower(rs, c.a, c.k!))
    case 'alt_tensor':
      return Object.fromEntries(lieAlternatingPower(rs, c.a, c.k!))
    case 'plethysm':
      return Object.fromEntries(liePlethysm(rs, c.a, c.partition!))
    case 'dim':
      return { dim: lieDimension(rs, c.a) }
    case 'dom_char':
      return Object.fromEntries(dominantWeights(rs, c.a))
  }
}

describe('LiE cross-check of B_n, C_n, D_n, G2, F4, E6, E7, E8', () => {
  it('covers every algebra and operation', () => {
    expect(doc.source).toMatch(/LiE \(Debian package lie\)/)
    for (const g of ['B2', 'B3', 'B4', 'C2', 'C3', 'C4', 'D4', 'D5', 'G2', 'F4', 'E6', 'E7', 'E8']) {
      for (const op of ['tensor', 'sym_tensor', 'dim', 'dom_char'])
        expect(
          doc.cases.some((c) => c.g === g && c.op === op),
          `${g} ${op}`,
        ).toBe(true)
    }
  })

  for (const op of ['tensor', 'sym_tensor', 'alt_tensor', 'plethysm', 'dim', 'dom_char'] as const) {
    it(`${op}: every case equals LiE term by term`, () => {
      const cases = doc.cases.filter((c) => c.op === op)
      expect(cases.length).toBeGreaterThan(10)
      for (const c of cases) expect(ours(c), `${op} ${c.g} [${c.a}] ${c.b ?? c.k ?? c.partition ?? ''}`).toEqual(c.result)
    }, 60_000)
  }
})

describe('group data of the simple groups', () => {
  it('dimensions of the defining, spinor and adjoint irreps (Slansky, Phys. Rep. 79 (1981) 1, Tables 2 and 6)', () => {
    const dim = (kind: Parameters<typeof rootSystemOf>[0], n: number | undefined, labels: number[]) => lieDimension(rootSystemOf(kind, n), labels)
    expect(dim('SO', 10, [1, 0, 0, 0, 0])).toBe(10)
    expect(dim('SO', 10, [0, 0, 0, 0, 1])).toBe(16)
    expect(dim('SO', 10, adjointLabels(rootSystemOf('SO', 10)))).toBe(45)
    expect(dim('SO', 9, [0, 0, 0, 1])).toBe(16)
    expect(dim('Sp', 6, [1, 0, 0])).toBe(6)
    expect(dim('Sp', 6, adjointLabels(rootSystemOf('Sp', 6)))).toBe(21)
    expect(dim('G2', undefined, [1, 0])).toBe(7)
    expect(dim('F4', undefined, [0, 0, 0, 1])).toBe(26)
    expect(dim('E6', undefined, [1, 0, 0, 0, 0, 0])).toBe(27)
    expect(dim('E7', undefined, [0, 0, 0, 0, 0, 0, 1])).toBe(56)
    expect(dim('E8', undefined, adjointLabels(rootSystemOf('E8')))).toBe(248)
  })

  it('reality: Spin(N) spinors follow N mod 8 (real 0, 1, 7; pseudoreal 3, 4, 5; complex 2, 6); exceptional 27 complex, 56 pseudoreal (Slansky §4; Yamatsu, arXiv:1511.08771)', () => {
    const r = (kind: Parameters<typeof rootSystemOf>[0], n: number | undefined, labels: number[]) => lieReality(rootSystemOf(kind, n), labels)
    expect(r('SO', 5, [0, 1])).toBe('pseudoreal') // N = 5
    expect(r('SO', 6, [0, 0, 1])).toBe('complex') // N = 6: the 4 of SU(4)
    expect(r('SO', 7, [0, 0, 1])).toBe('real') // N = 7
    expect(r('SO', 8, [0, 0, 0, 1])).toBe('real') // N = 8
    expect(r('SO', 9, [0, 0, 0, 1])).toBe('real') // N = 9
    expect(r('SO', 10, [0, 0, 0, 0, 1])).toBe('complex') // N = 10
    expect(r('SO', 11, [0, 0, 0, 0, 1])).toBe('pseudoreal') // N = 11
    expect(r('SO', 12, [0, 0, 0, 0, 0, 1])).toBe('pseudoreal') // N = 12
    expect(r('SO', 13, [0, 0, 0, 0, 0, 1])).toBe('pseudoreal') // N = 13
    expect(r('SO', 10, [1, 0, 0, 0, 0])).toBe('real')
    expect(r('Sp', 4, [1, 0])).toBe('pseudoreal')
    expect(r('Sp', 4, [0, 1])).toBe('real')
    expect(r('Sp', 6, [0, 0, 1])).toBe('pseudoreal') // the 14' of Sp(6)
    expect(r('G2', undefined, [1, 0])).toBe('real')
    expect(r('F4', undefined, [0, 0, 0, 1])).toBe('real')
    expect(r('E6', undefined, [1, 0, 0, 0, 0, 0])).toBe('complex')
    expect(lieConjugate(rootSystemOf('E6'), [1, 0, 0, 0, 0, 0])).toEqual([0, 0, 0, 0, 0, 1])
    expect(r('E7', undefined, [0, 0, 0, 0, 0, 0, 1])).toBe('pseudoreal')
    expect(r('E8', undefined, [0, 0, 0, 0, 0, 0, 0, 1])).toBe('real')
  })

  it('A_{n−1} through the general engine equals the SU(n) engine (weights of random irreps; two implementations)', () => {
    for (const [n, labels] of [
      [3, [2, 1]],
      [4, [1, 0, 2]],
      [5, [0, 1, 1, 0]],
      [2, [5]],
    ] as const) {
      expect(lieWeights(RootSystem.of('A', n - 1), [...labels])).toEqual(suWeights(n, [...labels]))
    }
  })

  it('singlet count by Weyl integration: G2 7⊗7⊗7 has one invariant, E6 27⊗27⊗27 one, E6 27⊗27̄ one (Slansky, Table 45 / 48)', () => {
    const g2 = rootSystemOf('G2')
    const seven = lieWeights(g2, [1, 0])
    expect(lieSingletCount(g2, characterProduct(characterProduct(seven, seven), seven))).toBe(1)
    const e6 = rootSystemOf('E6')
    const t = lieWeights(e6, [1, 0, 0, 0, 0, 0])
    const tb = lieWeights(e6, [0, 0, 0, 0, 0, 1])
    expect(lieSingletCount(e6, characterProduct(characterProduct(t, t), t))).toBe(1)
    expect(lieSingletCount(e6, characterProduct(t, tb))).toBe(1)
    expect(lieSingletCount(e6, characterProduct(t, t))).toBe(0)
  })

  it('bad input names the algebra and the labels', () => {
    expect(() => lieDimension(rootSystemOf('G2'), [1, 0, 0])).toThrow('G2 needs 2 non-negative Dynkin labels, got [1,0,0]')
    expect(() => rootSystemOf('SO', 4)).toThrow('SO(n) needs an integer n from 5 to 18, got n = 4')
    expect(() => rootSystemOf('Sp', 5)).toThrow(EngineInputError)
  })
})
