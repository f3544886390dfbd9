import { describe, expect, it } from 'vitest'
import {
  type Character,
  characterPower,
  characterProduct,
  characterSum,
  decomposeCharacter,
  dynkinKey,
  singletCount,
  suConjugate,
  suDimension,
  suWeights,
  tensorProduct,
} from '../../../server/engine/group/index'

/** Seeded generator (mulberry32), common practice. */
function rng(seed: number): () => number {
  let s = seed >>> 0
  return () => {
    s = (s + 0x6d2b79f5) >>> 0
    let t = Math.imul(s ^ (s >>> 15), s | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}

/**
 * Oracle written independently of Brauer–Klimyk: peel the weight with the largest height
 * (w, 2ρ) = Σ_i i(n-i) w_i (it is a highest weight), subtract that irrep's weights, repeat.
 * Reference: Fulton & Harris, Representation Theory, §14.1 (highest-weight theory).
 */
function peel(n: number, ch: Character): Map<string, number> {
  const rest = new Map(ch)
  const out = new Map<string, number>()
  const height = (k: string) => k.split(',').reduce((s, x, i) => s + Number(x) * (i + 1) * (n - i - 1), 0)
  while (rest.size > 0) {
    let best = ''
    let bestH = -Infinity
    for (const k of rest.keys()) if (height(k) > bestH) [best, bestH] = [k, height(k)]
    const m = rest.get(best)!
    const hw = best.split(',').map(Number)
    expect(hw.every((x) => x >= 0)).toBe(true)
    out.set(best, m)
    for (const [w, mw] of suWeights(n, hw)) {
      const v = (rest.get(w) ?? 0) - m * mw
      if (v === 0) rest.delete(w)
      else rest.set(w, v)
    }
  }
  return out
}

/** Random irrep of dimension at most 60 (keeps the brute force quick). */
function randomIrrep(r: () => number, n: number, max: number): number[] {
  for (;;) {
    const a = Array.from({ length: n - 1 }, () => Math.floor(r() * (max + 1)))
    if (suDimension(n, a) <= 60) return a
  }
}

describe('singletCount and decomposeCharacter', () => {
  it('decomposition equals highest-weight peeling on random products (brute-force oracle, Fulton & Harris §14.1)', () => {
    const r = rng(7)
    for (let t = 0; t < 40; t++) {
      const n = 2 + Math.floor(r() * 4)
      const max = n === 2 ? 4 : n === 3 ? 2 : 1
      const ch = characterProduct(characterProduct(suWeights(n, randomIrrep(r, n, max)), suWeights(n, randomIrrep(r, n, max))), suWeights(n, randomIrrep(r, n, max)))
      const full = peel(n, ch)
      expect(Object.fromEntries(decomposeCharacter(n, ch))).toEqual(Object.fromEntries(full))
      expect(singletCount(n, ch)).toBe(full.get(dynkinKey(new Array(n - 1).fill(0))) ?? 0)
    }
  })

  it('singlets in A⊗B⊗C = multiplicity of C̄ in A⊗B (Schur lemma, common practice)', () => {
    const r = rng(11)
    for (let t = 0; t < 40; t++) {
      const n = 2 + Math.floor(r() * 5)
      const max = n <= 3 ? 2 : 1
      const [a, b, c] = [randomIrrep(r, n, max), randomIrrep(r, n, max), randomIrrep(r, n, max)]
      const ch = characterProduct(characterProduct(suWeights(n, a), suWeights(n, b)), suWeights(n, c))
      expect(singletCount(n, ch), `${n}: ${a} ${b} ${c}`).toBe(tensorProduct(n, a, b).get(dynkinKey(suConjugate(n, c))) ?? 0)
    }
  })

  it('known invariants: SU(3) 8⊗8⊗8 has 2 (f and d), 3⊗3⊗3 has 1 (ε) (common practice)', () => {
    const eight = suWeights(3, [1, 1])
    expect(singletCount(3, characterProduct(characterProduct(eight, eight), eight))).toBe(2)
    const three = suWeights(3, [1, 0])
    expect(singletCount(3, characterProduct(characterProduct(three, three), three))).toBe(1)
  })

  it('virtual characters give signed counts: ψ^2 of SU(2) doublet squared (Sym^2 - Λ^2 of 2⊗2) (Macdonald I.8)', () => {
    const d = suWeights(2, [1])
    const virt = characterSum([
      [1, characterProduct(d, d)],
      [-1, characterPower(2, d, 2)],
    ]) // 2 Λ^2(2)
    expect(singletCount(2, virt)).toBe(2)
    expect(singletCount(2, characterPower(2, d, 2))).toBe(-1) // ψ^2(2) = Sym^2 - Λ^2 = 3 - 1
  })
})
