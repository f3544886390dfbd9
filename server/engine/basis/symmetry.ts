/**
 * Bose/Fermi symmetrisation over identical legs: the permutations of legs that map every
 * leg to a leg of the same particle, with the sign of the permutation of fermionic legs.
 */
import type { Species } from '../theory/model'

export interface LegPermutation {
  /** map[i] = leg whose data replaces leg i. */
  map: number[]
  /** Weight of the term: ±1 for Fermi statistics, any integer in Young symmetrizers. */
  sign: number
}

/** All orderings of `xs` (n! of them; callers keep n small). */
export function perms(xs: number[]): number[][] {
  if (xs.length <= 1) return [xs.slice()]
  const out: number[][] = []
  xs.forEach((x, i) => {
    for (const r of perms([...xs.slice(0, i), ...xs.slice(i + 1)])) out.push([x, ...r])
  })
  return out
}

function parity(p: number[]): number {
  let s = 1
  for (let i = 0; i < p.length; i++) for (let j = i + 1; j < p.length; j++) if (p[i]! > p[j]!) s = -s
  return s
}

/**
 * The group Π_blocks S_m of identical-leg permutations with Fermi signs.
 * @example identicalLegPermutations([phi, phi, phi]).length // 6
 * Method: spin–statistics (common practice).
 */
export function identicalLegPermutations(legs: Species[]): LegPermutation[] {
  const blocks: number[][] = []
  legs.forEach((p, i) => {
    if (i > 0 && legs[i - 1]!.label === p.label) blocks[blocks.length - 1]!.push(i)
    else blocks.push([i])
  })
  let out: LegPermutation[] = [{ map: legs.map((_, i) => i), sign: 1 }]
  for (const b of blocks) {
    if (b.length < 2) continue
    const fermion = legs[b[0]!]!.fermion
    const next: LegPermutation[] = []
    for (const base of out) {
      for (const p of perms(b)) {
        const map = base.map.slice()
        b.forEach((leg, i) => {
          map[leg] = p[i]!
        })
        next.push({ map, sign: fermion ? base.sign * parity(p.map((x) => x - b[0]!)) : base.sign })
      }
    }
    out = next
  }
  return out
}
