/**
 * Non-abelian part of the CP-twisted Hilbert series: ∫ over the coset G·σ, σ = CP acting on
 * the internal indices by complex conjugation, with the convention CP(φ*) = CP(φ)* and CP
 * exchanging upper and lower SU(n) indices (so every Hermitian monomial without a Levi-Civita
 * symbol is CP-even; see cpCount.ts).
 * - SU(n): σ(g) = ḡ. Every twisted trace is a class function of M = ḡg, and ∫ χ_λ(ḡg) dg = 1
 *   for every irrep λ (Schur orthogonality in a real basis: ρ(ḡ) = conj ρ(g)), so the integral
 *   of a virtual character Σ m_λ χ_λ(M) is Σ m_λ. A pair (R, R̄) in a cycle c of (σg)²
 *   contributes ψ^c χ_R(M); a real field in R = [α; α] (traceless tensors with upper indices
 *   α and lower α) contributes, in a cycle c of σg, ψ^c τ_R(M) for odd c and ψ^{c/2} χ_R(M)
 *   for even c, where τ_R is the twining character of the index swap (twining.ts).
 * - SO(2k+1), Sp(2k), SO(4k), G2, F4, E7, E8: conjugation is inner, σ acts as an element
 *   commuting with G: a pair contributes FS(R)^c ψ^{2c} χ_R(g) (FS the Frobenius–Schur
 *   indicator), a real field ψ^c χ_R(g) (intrinsic CP +1), with the ordinary Weyl integral.
 * - SO(4k+2), E6 (outer conjugation) and the finite groups: not computed.
 * Reference: trace of an automorphism on invariants as a coset integral (Molien–Weyl for
 * disconnected groups); twisted Frobenius–Schur indicators, Kawanaka & Matsuyama, Hokkaido
 * Math. J. 19 (1990) 495.
 */
import { characterAdams } from '../group/character'
import { type Chamber, multiplyIrrepsIn, suChamber } from '../group/brauer'
import { suReality } from '../group/irrep'
import { suWeights } from '../group/weights'
import type { Character } from '../group/types'
import type { RootSystem } from '../../../shared/physics/lie/rootSystem'
import { lieWeights } from '../group/lie/lieWeights'
import { lieChamber, lieReality } from '../group/lie/lieIrrep'
import { twiningCharacter } from './twining'

/** One factor of the twisted integrand for one group: a pair or a real field, in a cycle. */
export interface TwistedGroupEntry {
  kind: 'pair' | 'self'
  /** Dynkin labels joined by ','. */
  rep: string
  cycle: number
}

export interface TwistedGroup {
  /** ∫ over the coset of the product of the entries' factors. */
  integrate(entries: readonly TwistedGroupEntry[]): number
}

const labels = (rep: string): number[] => rep.split(',').map(Number)

function irrepsProduct(chamber: Chamber, factors: Character[]): Map<string, number> {
  let acc = new Map([[new Array<number>(chamber.rank).fill(0).join(','), 1]])
  for (const f of factors) acc = multiplyIrrepsIn(chamber, acc, f)
  return acc
}

function cached(compute: (entries: readonly TwistedGroupEntry[]) => number): TwistedGroup {
  const memo = new Map<string, number>()
  return {
    integrate(entries) {
      const key = entries
        .map((e) => `${e.kind}:${e.rep}^${e.cycle}`)
        .sort()
        .join('|')
      let v = memo.get(key)
      if (v === undefined) memo.set(key, (v = compute(entries)))
      return v
    },
  }
}

/**
 * SU(n) in the M = ḡg picture: the sum of all irrep multiplicities of the product.
 * @example suTwisted(3).integrate([{ kind: 'pair', rep: '1,0', cycle: 1 }]) // 1: H†H is CP-even
 */
export function suTwisted(n: number): TwistedGroup {
  const chamber = suChamber(n)
  return cached((entries) => {
    const factors = entries.map((e) => {
      if (e.kind === 'pair' || e.cycle % 2 === 0) {
        const c = e.kind === 'pair' ? e.cycle : e.cycle / 2
        return characterAdams(suWeights(n, labels(e.rep)), c)
      }
      return characterAdams(twiningCharacter(n, labels(e.rep)), e.cycle)
    })
    let total = 0
    for (const m of irrepsProduct(chamber, factors).values()) total += m
    return total
  })
}

/**
 * A simple group whose conjugation is inner: ordinary Weyl integral with FS signs on pairs.
 * @example innerTwisted(rootSystemOf('Sp', 4)).integrate([{ kind: 'pair', rep: '1,0', cycle: 1 }]) // 1
 */
export function innerTwisted(rs: RootSystem): TwistedGroup {
  const chamber = lieChamber(rs)
  const trivial = new Array<number>(rs.rank).fill(0).join(',')
  return cached((entries) => {
    let sign = 1
    const factors = entries.map((e) => {
      const w = lieWeights(rs, labels(e.rep))
      if (e.kind === 'self') return characterAdams(w, e.cycle)
      if (lieReality(rs, labels(e.rep)) === 'pseudoreal' && e.cycle % 2 === 1) sign = -sign
      return characterAdams(w, 2 * e.cycle)
    })
    return sign * (irrepsProduct(chamber, factors).get(trivial) ?? 0)
  })
}

/** Whether complex conjugation of this simple group is inner (−1 in the Weyl group). */
export function conjugationIsInner(rs: RootSystem): boolean {
  if (rs.type === 'A') return rs.rank === 1
  if (rs.type === 'D') return rs.rank % 2 === 0
  return !(rs.type === 'E' && rs.rank === 6)
}

/** Whether a real field's SU(n) irrep has the mixed-tensor form [α; α] of twining.ts. */
export function suRealSupported(n: number, dynkin: readonly number[]): boolean {
  if (suReality(n, dynkin) !== 'real') return false
  return n % 2 === 1 || dynkin[n / 2 - 1]! % 2 === 0
}
