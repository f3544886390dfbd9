/**
 * Gauge/global SU(n) part of the Hilbert-series integrand for one cycle type:
 * ∫ dμ_SU(n) Π_i χ_{R_i}(g^{c_i}) = number of singlets (signed) in the virtual character
 * Π_i ψ^{c_i}(χ_{R_i}), computed once per multiset {(R_i, c_i)} and cached.
 * (U(1) and Z_n parts do not depend on the cycle type: Σ_cycles c·q = total charge, so they
 * reduce to the charge-sum selection rule applied when classes are enumerated.)
 * Reference: Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016, sect. 3 (Haar measure
 * integration); Weyl integration by the Weyl-group alternating sum is done by the group engine.
 */
import { characterPower, characterProduct } from '../group/character'
import { singletCount } from '../group/decompose'
import { suWeights } from '../group/weights'
import type { Character } from '../group/types'

export interface GroupEntry {
  /** Dynkin labels joined by ',' */
  rep: string
  cycle: number
}

/** Per-run cache of one SU(n) factor. */
export class GroupIntegrator {
  private readonly adams = new Map<string, Character>()
  private readonly products = new Map<string, Character>()
  private readonly singlets = new Map<string, number>()
  constructor(readonly n: number) {}

  /**
   * ∫ dμ Π ψ^{c_i} χ_{R_i} for entries already sorted canonically (see `entryKey`).
   * @example new GroupIntegrator(3).integrate([{rep:'1,0',cycle:1},{rep:'0,1',cycle:1}]) // 1 (3 × 3̄ ∋ 1)
   */
  integrate(entries: readonly GroupEntry[]): number {
    const sorted = sortEntries(entries.slice())
    return this.integrateKeyed(sorted.map(entryKey).join('|'), () => sorted)
  }

  /**
   * As `integrate`, for a caller that already has a canonical key of the multiset; `entries`
   * is only called on a cache miss and must return the entries (any order).
   */
  integrateKeyed(key: string, entries: () => readonly GroupEntry[]): number {
    const hit = this.singlets.get(key)
    if (hit !== undefined) return hit
    const list = sortEntries(entries().slice())
    const ch = this.product(list, list.length)
    const value = ch === null ? 1 : singletCount(this.n, ch)
    this.singlets.set(key, value)
    return value
  }

  /** Character of the first m entries (prefix products cached); null for the empty product. */
  private product(entries: readonly GroupEntry[], m: number): Character | null {
    if (m === 0) return null
    const key = entries.slice(0, m).map(entryKey).join('|')
    const hit = this.products.get(key)
    if (hit) return hit
    const last = this.adamsOf(entries[m - 1]!)
    const head = this.product(entries, m - 1)
    const ch = head === null ? last : characterProduct(head, last)
    this.products.set(key, ch)
    return ch
  }

  private adamsOf(e: GroupEntry): Character {
    const key = entryKey(e)
    let ch = this.adams.get(key)
    if (!ch) {
      const labels = e.rep === '' ? [] : e.rep.split(',').map(Number)
      ch = characterPower(this.n, suWeights(this.n, labels), e.cycle)
      this.adams.set(key, ch)
    }
    return ch
  }
}

/** Canonical text of an entry, e.g. "1,0^2". */
export function entryKey(e: GroupEntry): string {
  return `${e.rep}^${e.cycle}`
}

/** Sort entries canonically (by rep, then cycle) so equal multisets share a cache key. */
export function sortEntries(entries: GroupEntry[]): GroupEntry[] {
  return entries.sort((a, b) => (a.rep < b.rep ? -1 : a.rep > b.rep ? 1 : a.cycle - b.cycle))
}
