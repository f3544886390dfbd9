/**
 * Brauer's formula in irrep space: (Σ_λ q_λ V_λ) ⊗ X for a Weyl-invariant character X,
 * without ever listing the weights of the left factor.
 */
import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../errors'
import type { Character, PlethysmOptions } from './types'
import { reflectToDominant } from './decompose'
import { parseWeightKey } from './labels'
import { characterAdams } from './character'
import { classSize, factorial, partitionsOf, symmetricCharacter } from './symmetricGroup'

/** A Weyl chamber: reflect μ + shift + ρ to the dominant chamber (null on a wall). */
export interface Chamber {
  rank: number
  /** Name used in error messages, e.g. "SU(3)" or "E6". */
  label: string
  reflect(mu: ArrayLike<number>, shift: ArrayLike<number> | null): { sign: number; labels: number[] } | null
}

/** The chamber of SU(n) (type A_{n−1}). */
export function suChamber(n: number): Chamber {
  return {
    rank: n - 1,
    label: `SU(${n})`,
    reflect: (mu, shift) => {
      const r = reflectToDominant(mu, shift)
      return r && { sign: r.sign, labels: r.dynkin }
    },
  }
}

/**
 * Irreps of (Σ_λ q_λ V_λ) ⊗ X, X a Weyl-invariant (possibly virtual) character:
 * V_λ ⊗ X = Σ_{ν ∈ X} m_X(ν) ε(w) V_{w(λ+ν+ρ)-ρ} (walls dropped).
 * @example multiplyIrreps(2, new Map([["1", 1]]), suWeights(2, [1])) // {"2":1,"0":1}
 * Reference: Fulton & Harris, Representation Theory, exercise 25.33; Klimyk (1968).
 */
export function multiplyIrreps(n: number, irreps: Map<string, number>, x: Character): Map<string, number> {
  return multiplyIrrepsIn(suChamber(n), irreps, x)
}

/** multiplyIrreps for any Weyl chamber (simple Lie algebras: lie/rootSystem.ts). */
export function multiplyIrrepsIn(c: Chamber, irreps: Map<string, number>, x: Character): Map<string, number> {
  const out = new Map<string, number>()
  const weights = [...x].map(([k, m]) => [parseWeightKey('multiplyIrreps', k), m] as const)
  for (const [key, q] of irreps) {
    const lambda = parseWeightKey('multiplyIrreps', key)
    for (const [nu, m] of weights) {
      if (nu.length !== c.rank)
        throw new EngineInputError('multiplyIrreps', `The weight "${[...nu].join(',')}" does not have the ${c.rank} labels of ${/^[AEFHILMNORSX]/.test(c.label) ? 'an' : 'a'} ${c.label} weight`)
      const r = c.reflect(nu, lambda)
      if (!r) continue
      const k = r.labels.join(',')
      const v = (out.get(k) ?? 0) + r.sign * q * m
      if (!Number.isSafeInteger(v)) throw new EngineInputError('multiplyIrreps', `A multiplicity (${v}) grows beyond 2^53, past exact arithmetic; lower the maximum dimension or the number of flavors`)
      if (v === 0) out.delete(k)
      else out.set(k, v)
    }
  }
  return out
}

/**
 * Irreps of the Schur functor S_λ(χ) of a Weyl-invariant character χ (cycle index of S_k),
 * each cycle-type product Π_i ψ^{μ_i}(χ) built up irrep by irrep with multiplyIrreps.
 * @example schurFunctorIrreps(3, suWeights(3, [1, 1]), [2]) // {"2,2":1,"1,1":1,"0,0":1}
 * Reference: Macdonald, Symmetric Functions, I.7–I.8; Fulton & Harris, §6.1 and §25.3.
 */
export function schurFunctorIrreps(n: number, ch: Character, partition: readonly number[], k: number, opts: PlethysmOptions = {}): Map<string, number> {
  return schurFunctorIrrepsIn(suChamber(n), ch, partition, k, opts)
}

/** schurFunctorIrreps for any Weyl chamber. */
export function schurFunctorIrrepsIn(c: Chamber, ch: Character, partition: readonly number[], k: number, opts: PlethysmOptions = {}): Map<string, number> {
  const zero = new Array<number>(c.rank).fill(0).join(',')
  const acc = new Map<string, bigint>()
  const adams = new Map<number, Character>()
  const prefix = new Map<string, Map<string, number>>()
  const classes = partitionsOf(k)
  classes.forEach((mu, idx) => {
    if (opts.signal?.aborted) throw new EngineCancelledError('plethysm')
    const chi = symmetricCharacter(partition, mu)
    if (chi !== 0) {
      let cur = new Map([[zero, 1]])
      let key = ''
      for (const r of [...mu].reverse()) {
        key += `${r},`
        const hit = prefix.get(key)
        if (hit) cur = hit
        else {
          if (!adams.has(r)) adams.set(r, characterAdams(ch, r))
          cur = multiplyIrrepsIn(c, cur, adams.get(r)!)
          prefix.set(key, cur)
        }
      }
      const coeff = BigInt(chi) * classSize(mu)
      for (const [irr, m] of cur) acc.set(irr, (acc.get(irr) ?? 0n) + coeff * BigInt(m))
    }
    opts.onProgress?.((idx + 1) / classes.length, `cycle type ${mu.join(',')}`)
  })
  const kf = factorial(k)
  const out = new Map<string, number>()
  for (const [irr, m] of acc) {
    if (m % kf !== 0n) throw new EngineConsistencyError('schurFunctorIrreps', `k! does not divide ${m} at ${irr}`)
    if (m !== 0n) out.set(irr, Number(m / kf))
  }
  return out
}
