/**
 * Gauge/global non-abelian part (SU(n), any simple Lie group, finite groups) of the
 * Hilbert-series integrand for one cycle type:
 * ∫ dμ_SU(n) Π_i χ_{R_i}(g^{c_i}) = number of singlets (signed) in the virtual character
 * Π_i ψ^{c_i}(χ_{R_i}), computed once per multiset {(R_i, c_i)} and cached.
 * (U(1) and Z_n parts do not depend on the cycle type: Σ_cycles c·q = total charge, so they
 * reduce to the charge-sum selection rule applied when classes are enumerated.)
 * Reference: Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016, sect. 3 (Haar measure
 * integration); Weyl integration by the Weyl-group alternating sum is done by the group engine.
 */
import { characterAdams } from '../group/character'
import { suWeights } from '../group/weights'
import type { Character } from '../group/types'
import type { RootSystem } from '../../../shared/physics/lie/rootSystem'
import { lieWeights } from '../group/lie/lieWeights'
import { lieChamber } from '../group/lie/lieIrrep'
import { type Chamber, multiplyIrrepsIn, suChamber } from '../group/brauer'
import type { FiniteGroupTable } from '../../../shared/physics/finite/tables'
import { type ClassFunction, adamsClass, classAverage, classProduct } from '../group/finite/finiteGroup'

export interface GroupEntry {
  /** Dynkin labels joined by ',' (Lie groups) or the irrep index (finite groups). */
  rep: string
  cycle: number
}

/**
 * How one group integrates: ψ^c of an irrep's character (a factor F), the running product T of
 * factors, and its invariant count. Lie groups: F is a weight multiset and T the product
 * decomposed into irreps (Brauer–Klimyk); finite groups: class functions (T = F).
 */
export interface IntegrationScheme<T, F = T> {
  power(rep: string, cycle: number): F
  start(f: F): T
  multiply(acc: T, f: F): T
  singlets(acc: T): number
}

const labels = (rep: string): number[] => (rep === '' ? [] : rep.split(',').map(Number))

/** SU(n): weights from the Kostka numbers, Weyl integration of type A (decompose.ts). */
export function suScheme(n: number): IntegrationScheme<Map<string, number>, Character> {
  return irrepScheme(suChamber(n), (rep) => suWeights(n, labels(rep)))
}

/** Any simple Lie algebra: Freudenthal weights (lie/lieWeights.ts), its root system's chamber. */
export function lieScheme(rs: RootSystem): IntegrationScheme<Map<string, number>, Character> {
  return irrepScheme(lieChamber(rs), (rep) => lieWeights(rs, labels(rep)))
}

/**
 * The running product kept as irreps (Brauer–Klimyk, multiplyIrrepsIn), each new factor as the
 * weights of ψ^c χ; the invariant count is the trivial irrep's multiplicity. Far fewer entries
 * than the product's weights (SU(5) with a 10, a 24 and a 5 to dimension 8: about 5× faster).
 */
function irrepScheme(chamber: Chamber, weights: (rep: string) => Character): IntegrationScheme<Map<string, number>, Character> {
  const trivial = new Array<number>(chamber.rank).fill(0).join(',')
  return {
    power: (rep, c) => characterAdams(weights(rep), c),
    start: (f) => multiplyIrrepsIn(chamber, new Map([[trivial, 1]]), f),
    multiply: (acc, f) => multiplyIrrepsIn(chamber, acc, f),
    singlets: (acc) => acc.get(trivial) ?? 0,
  }
}

/** Finite group: class functions, the conjugacy-class sum in place of the Haar integral. */
export function finiteScheme(t: FiniteGroupTable): IntegrationScheme<ClassFunction> {
  return {
    power: (rep, c) => adamsClass(t, t.irreps[Number(rep)]!.chi, c),
    start: (f) => f,
    multiply: classProduct,
    singlets: (f) => classAverage(t, f),
  }
}

/** Per-run cache of one non-abelian group factor. */
export class GroupIntegrator<T = Character, F = T> {
  private readonly adams = new Map<string, F>()
  private readonly products = new Map<string, T>()
  private readonly singlets = new Map<string, number>()
  constructor(readonly scheme: IntegrationScheme<T, F>) {}

  /**
   * ∫ dμ Π ψ^{c_i} χ_{R_i} for a multiset of entries (any order).
   * @example new GroupIntegrator(suScheme(3)).integrate([{rep:'1,0',cycle:1},{rep:'0,1',cycle:1}]) // 1 (3 × 3̄ ∋ 1)
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
    const value = ch === null ? 1 : this.scheme.singlets(ch)
    this.singlets.set(key, value)
    return value
  }

  /** Character of the first m entries (prefix products cached); null for the empty product. */
  private product(entries: readonly GroupEntry[], m: number): T | null {
    if (m === 0) return null
    const key = entries.slice(0, m).map(entryKey).join('|')
    const hit = this.products.get(key)
    if (hit) return hit
    const last = this.adamsOf(entries[m - 1]!)
    const head = this.product(entries, m - 1)
    const ch = head === null ? this.scheme.start(last) : this.scheme.multiply(head, last)
    this.products.set(key, ch)
    return ch
  }

  private adamsOf(e: GroupEntry): F {
    const key = entryKey(e)
    let ch = this.adams.get(key)
    if (!ch) {
      ch = this.scheme.power(e.rep, e.cycle)
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
