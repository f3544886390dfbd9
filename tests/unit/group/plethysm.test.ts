import { describe, expect, it } from 'vitest'
import {
  alternatingPower,
  characterDimension,
  decomposeCharacter,
  classSize,
  kostka,
  partitionsOf,
  plethysm,
  schurFunctorCharacter,
  suDimension,
  suWeights,
  symmetricCharacter,
  symmetricPower,
} from '../../../server/engine/group/index'
import { EngineCancelledError } from '../../../server/engine/errors'

const dimOf = (n: number, m: Map<string, number>): number => [...m].reduce((s, [k, v]) => s + v * suDimension(n, k.split(',').map(Number)), 0)

function binom(a: number, b: number): number {
  let r = 1
  for (let i = 1; i <= b; i++) r = (r * (a - b + i)) / i
  return r
}

/** Hook-content formula dim S_λ(C^d) = Π_{boxes} (d + c)/h (Stanley EC2, Cor. 7.21.4). */
function hookContent(lambda: number[], d: number): number {
  const conj = (j: number) => lambda.filter((l) => l > j).length
  let num = 1
  let den = 1
  lambda.forEach((row, i) => {
    for (let j = 0; j < row; j++) {
      num *= d + j - i
      den *= row - j - 1 + conj(j) - i - 1 + 1
    }
  })
  return num / den
}

describe('symmetric group S_k', () => {
  it('character table of S_3 and S_4 (James & Kerber 1981, Appendix I.A; from memory)', () => {
    expect(symmetricCharacter([2, 1], [1, 1, 1])).toBe(2)
    expect(symmetricCharacter([2, 1], [2, 1])).toBe(0)
    expect(symmetricCharacter([2, 1], [3])).toBe(-1)
    expect(symmetricCharacter([2, 2], [2, 2])).toBe(2)
    expect(symmetricCharacter([3, 1], [4])).toBe(-1)
    expect(symmetricCharacter([2, 1, 1], [2, 2])).toBe(-1)
  })

  it('orthogonality Σ_λ χ^λ(μ)^2 = z_μ and Σ_μ |C_μ| χ(μ)^2 = k! (Sagan, The Symmetric Group, Thm 1.9.3)', () => {
    for (const k of [5, 7]) {
      const parts = partitionsOf(k)
      let fact = 1n
      for (let i = 2; i <= k; i++) fact *= BigInt(i)
      for (const mu of parts) {
        const s = parts.reduce((acc, l) => acc + BigInt(symmetricCharacter(l, mu) ** 2), 0n)
        expect(s * classSize(mu)).toBe(fact)
      }
      for (const l of parts) {
        const s = parts.reduce((acc, mu) => acc + classSize(mu) * BigInt(symmetricCharacter(l, mu) ** 2), 0n)
        expect(s).toBe(fact)
      }
    }
    expect(partitionsOf(8).length).toBe(22) // p(8) = 22 (OEIS A000041)
  })

  it('Kostka: K_{λ,1^k} = number of standard tableaux = χ^λ(1^k) (Sagan, §2.11); K_{(3,2),(2,2,1)} = 2', () => {
    for (const l of partitionsOf(6)) expect(kostka(l, [1, 1, 1, 1, 1, 1])).toBe(symmetricCharacter(l, [1, 1, 1, 1, 1, 1]))
    expect(kostka([3, 2], [2, 2, 1])).toBe(2) // Fulton, Young Tableaux, §2.2 example (from memory)
    expect(kostka([2, 2], [3, 1])).toBe(0) // not dominated
  })
})

describe('plethysm, Sym^k, Λ^k', () => {
  it('S_λ of the fundamental is the irrep with partition λ (Fulton & Harris, Prop. 15.15)', () => {
    expect(Object.fromEntries(plethysm(4, [1, 0, 0], [2, 1]))).toEqual({ '1,1,0': 1 })
    expect(Object.fromEntries(plethysm(3, [1, 0], [3, 1]))).toEqual({ '2,1': 1 })
    expect(Object.fromEntries(plethysm(3, [1, 0], [1, 1, 1, 1]))).toEqual({})
  })

  it('dimensions: Sym^k = C(d+k-1,k), Λ^k = C(d,k), S_λ = hook-content (Stanley EC2, Cor. 7.21.4)', () => {
    for (const [n, a] of [
      [2, [2]],
      [3, [1, 1]],
      [4, [0, 1, 0]],
      [5, [1, 0, 0, 0]],
    ] as const) {
      const d = suDimension(n, [...a])
      for (let k = 1; k <= 4; k++) {
        expect(dimOf(n, symmetricPower(n, [...a], k))).toBe(binom(d + k - 1, k))
        expect(dimOf(n, alternatingPower(n, [...a], k))).toBe(binom(d, k))
      }
      for (const l of [
        [2, 1],
        [2, 2],
        [3, 1],
        [2, 1, 1],
      ]) {
        expect(dimOf(n, plethysm(n, [...a], l)), `${n}:${a} ${l}`).toBe(hookContent(l, d))
      }
    }
  })

  it('known plethysms: Sym^2(8) = 1+8+27, Λ^2(8) = 8+10+10̄ of SU(3); Sym^3(2) = 4 of SU(2) (common practice)', () => {
    expect(Object.fromEntries(symmetricPower(3, [1, 1], 2))).toEqual({ '0,0': 1, '1,1': 1, '2,2': 1 })
    expect(Object.fromEntries(alternatingPower(3, [1, 1], 2))).toEqual({ '1,1': 1, '3,0': 1, '0,3': 1 })
    expect(Object.fromEntries(symmetricPower(2, [1], 3))).toEqual({ '3': 1 })
    expect(Object.fromEntries(symmetricPower(2, [1], 0))).toEqual({ '0': 1 })
  })

  it('Schur functors of a reducible character: Sym^2(2 ⊕ 2) = 3 copies of triplet + 1 singlet of SU(2) (common practice)', () => {
    const two = new Map([...suWeights(2, [1])].map(([k, m]) => [k, 2 * m]))
    const sym2 = schurFunctorCharacter(2, two, [2])
    expect(characterDimension(sym2)).toBe(10)
    expect(Object.fromEntries(sym2)).toEqual({ '2': 3, '0': 4, '-2': 3 })
  })

  it('two independent routes agree: weight-level Schur functor + Brauer–Klimyk vs irrep-level Brauer products (Fulton & Harris §25.3)', () => {
    const cases: Array<[number, number[], number[]]> = [
      [3, [1, 1], [3, 1]],
      [4, [0, 1, 0], [2, 2]],
      [5, [1, 0, 0, 1], [2, 1]],
      [2, [3], [4, 2]],
      [6, [0, 0, 1, 0, 0], [1, 1, 1]],
    ]
    for (const [n, a, l] of cases) {
      const viaWeights = decomposeCharacter(n, schurFunctorCharacter(n, suWeights(n, a), l))
      expect(Object.fromEntries(plethysm(n, a, l)), `${n}:${a} ${l}`).toEqual(Object.fromEntries(viaWeights))
    }
  })

  it('string-key fallback when weights are too large to pack: Sym^2{±50 ω1} of SU(8) (common practice)', () => {
    const w = '50,0,0,0,0,0,0'
    const ch = new Map([
      [w, 1],
      ['-50,0,0,0,0,0,0', 1],
    ])
    expect(Object.fromEntries(schurFunctorCharacter(8, ch, [2]))).toEqual({
      '100,0,0,0,0,0,0': 1,
      '0,0,0,0,0,0,0': 1,
      '-100,0,0,0,0,0,0': 1,
    })
    expect(Object.fromEntries(schurFunctorCharacter(8, ch, [1, 1]))).toEqual({ '0,0,0,0,0,0,0': 1 })
  })

  it('large case stays quick: Sym^6 of the SU(8) adjoint has dimension C(68,6) (common practice)', () => {
    expect(dimOf(8, symmetricPower(8, [1, 0, 0, 0, 0, 0, 1], 6))).toBe(binom(68, 6))
  })

  it('reports progress and honours cancellation (EngineCancelledError)', () => {
    const seen: number[] = []
    plethysm(3, [1, 0], [2, 2], { onProgress: (f) => seen.push(f) })
    expect(seen.at(-1)).toBe(1)
    expect(seen.length).toBe(partitionsOf(4).length)
    expect(() => plethysm(3, [1, 0], [2, 2], { signal: { aborted: true } })).toThrow(EngineCancelledError)
    expect(() => plethysm(3, [1, 0], [2, 2], { signal: { aborted: true } })).toThrow(expect.objectContaining({ where: 'plethysm', message: 'The computation was cancelled before it finished.' }))
  })
})
