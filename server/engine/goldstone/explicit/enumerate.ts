/**
 * Enumeration of the monomials with a given list of letters (kind and number of derivatives):
 * every arrangement into flavor traces (the cycles of a permutation) and, for source letters of
 * SU(2) or SU(3), one determinant, times every contraction of the Lorentz slots (perfect
 * matchings, with one ε^{μνρσ} when asked), up to the trivial symmetries (canonical.ts).
 * Contractions that belong to other letter contents in the free limit are left out: two
 * derivatives of one letter (□X, moved by parts onto the others), ∇^μ u_μ (the equation of
 * motion gives χ_−) and f_μ^μ-type traces (zero). Single-letter traces of traceless letters vanish.
 */
import { canonicalCode, slotGroups } from './canonical'
import { OWN_SLOTS, SOURCE_SIDES, type Factor, type Letter, type LetterKind, type Monomial } from './monomial'

export interface LetterSpec {
  kind: LetterKind
  derivs: number
}

export interface EnumerationRules {
  /** Kinds that are traceless N × N matrices (⟨X⟩ = 0). */
  traceless: ReadonlySet<LetterKind>
  /** 'none', 'one' (exactly one ε) or 'any' (both). */
  eps: 'none' | 'one' | 'any'
  /** Size N of a determinant of χ (or χ†) letters, when N is 2 or 3; otherwise none. */
  detSize?: number
}

interface Slot {
  letter: number
  label: number
  group: string
}

function permutations(n: number): number[][] {
  if (n === 0) return [[]]
  return permutations(n - 1).flatMap((p) => Array.from({ length: n }, (_, i) => [...p.slice(0, i), n - 1, ...p.slice(i)]))
}

function combinations(items: readonly number[], k: number): number[][] {
  if (k === 0) return [[]]
  if (items.length < k) return []
  const [first, ...rest] = items
  return [...combinations(rest, k - 1).map((c) => [first!, ...c]), ...combinations(rest, k)]
}

/** Trace words whose neighbouring source letters share a flavor group (R χ L†: χ is R←L). */
function chained(letters: readonly LetterKind[]): boolean {
  for (let i = 0; i < letters.length; i++) {
    const a = SOURCE_SIDES[letters[i]!]
    const b = SOURCE_SIDES[letters[(i + 1) % letters.length]!]
    if (a && b && a[1] !== b[0]) return false
  }
  return true
}

/** All arrangements of letters 0..m−1 into factors (list of index lists with their type). */
function arrangements(specs: readonly LetterSpec[], rules: EnumerationRules): { type: Factor['type']; members: number[] }[][] {
  const m = specs.length
  const out: { type: Factor['type']; members: number[] }[][] = []
  const shapes = new Set<string>()
  const dets: number[][] = [[]]
  if (rules.detSize) {
    for (const kind of ['chi', 'chibar'] as const) {
      const ofKind = specs.map((s, i) => (s.kind === kind ? i : -1)).filter((i) => i >= 0)
      dets.push(...combinations(ofKind, rules.detSize))
    }
  }
  for (const det of dets) {
    const rest = Array.from({ length: m }, (_, i) => i).filter((i) => !det.includes(i))
    for (const p of permutations(rest.length)) {
      const seen = new Array<boolean>(rest.length).fill(false)
      const traces: number[][] = []
      for (let s = 0; s < rest.length; s++) {
        if (seen[s]) continue
        const cycle: number[] = []
        for (let t = s; !seen[t]; t = p[t]!) {
          seen[t] = true
          cycle.push(rest[t]!)
        }
        traces.push(cycle)
      }
      const ok = traces.every((c) => !(c.length === 1 && rules.traceless.has(specs[c[0]!]!.kind)) && chained(c.map((i) => specs[i]!.kind)))
      if (!ok) continue
      // letters with equal specs are interchangeable: one arrangement per shape is enough, since
      // every contraction of the slots is tried on it
      const key = arrangementKey(specs, det, traces)
      if (shapes.has(key)) continue
      shapes.add(key)
      out.push([...(det.length ? [{ type: 'det' as const, members: det }] : []), ...traces.map((members) => ({ type: 'trace' as const, members }))])
    }
  }
  return out
}

function arrangementKey(specs: readonly LetterSpec[], det: readonly number[], traces: readonly number[][]): string {
  const name = (i: number) => `${specs[i]!.kind}${specs[i]!.derivs}`
  const cyc = traces.map((c) => {
    const words = c.map((_, r) => [...c.slice(r), ...c.slice(0, r)].map(name).join(' '))
    return words.sort()[0]!
  })
  return `${det.map(name).sort().join(' ')}|${cyc.sort().join('/')}`
}

/** Slots of the letters: derivatives first, then own indices. */
function slotsOf(specs: readonly LetterSpec[]): Slot[] {
  const out: Slot[] = []
  specs.forEach((s, letter) => {
    const l: Letter = { kind: s.kind, d: new Array<number>(s.derivs).fill(0), idx: new Array<number>(OWN_SLOTS[s.kind]).fill(0) }
    const groups = slotGroups(l)
    groups.forEach((g, i) => out.push({ letter, label: i, group: g }))
  })
  return out
}

/** Two slots may not be contracted (or both put into ε, for 'S'): same letter and same group. */
function clash(a: Slot, b: Slot, forEps: boolean): boolean {
  if (a.letter !== b.letter) return false
  if (a.group === 'S' && b.group === 'S') return true
  if (forEps) return false
  // a derivative contracted with the letter's own index: allowed for f (divergence), not for u (EOM)
  if (a.group === 'A' && b.group === 'A') return true
  return false
}

function matchings(slots: readonly number[], all: readonly Slot[]): [number, number][][] {
  if (slots.length === 0) return [[]]
  const [first, ...rest] = slots
  const out: [number, number][][] = []
  rest.forEach((other, i) => {
    if (clash(all[first!]!, all[other]!, false)) return
    const remaining = rest.filter((_, j) => j !== i)
    for (const m of matchings(remaining, all)) out.push([[first!, other], ...m])
  })
  return out
}

/** Contractions: [ε slots or null, pairs]. */
function contractions(specs: readonly LetterSpec[], rules: EnumerationRules): [number[] | null, [number, number][]][] {
  const slots = slotsOf(specs)
  const all = slots.map((_, i) => i)
  const out: [number[] | null, [number, number][]][] = []
  if (rules.eps !== 'one' && all.length % 2 === 0) for (const m of matchings(all, slots)) out.push([null, m])
  if (rules.eps !== 'none' && all.length >= 4 && all.length % 2 === 0) {
    for (const e of combinations(all, 4)) {
      if (e.some((a, i) => e.some((b, j) => j > i && clash(slots[a]!, slots[b]!, true)))) continue
      for (const m of matchings(
        all.filter((x) => !e.includes(x)),
        slots,
      ))
        out.push([e, m])
    }
  }
  return out
}

/**
 * Every monomial with these letters, one per canonical code.
 * @example enumerateMonomials([{kind:'u',derivs:0},{kind:'u',derivs:0}], { traceless: new Set(['u']), eps: 'none' }) // [⟨u_μ u^μ⟩]
 */
export function enumerateMonomials(specs: readonly LetterSpec[], rules: EnumerationRules): Monomial[] {
  const slots = slotsOf(specs)
  const found = new Map<string, Monomial>()
  const contr = contractions(specs, rules)
  for (const arrangement of arrangements(specs, rules)) {
    for (const [eps, pairs] of contr) {
      const labelOf = new Array<number>(slots.length)
      pairs.forEach(([a, b], k) => {
        labelOf[a] = k
        labelOf[b] = k
      })
      eps?.forEach((a, k) => {
        labelOf[a] = pairs.length + k
      })
      const letters: Letter[] = specs.map((s, i) => {
        const mine = slots.map((sl, j) => (sl.letter === i ? labelOf[j]! : -1)).filter((x) => x >= 0)
        return { kind: s.kind, d: mine.slice(0, s.derivs), idx: mine.slice(s.derivs) }
      })
      const mono: Monomial = {
        factors: arrangement.map((f) => ({ type: f.type, letters: f.members.map((i) => letters[i]!) })),
        ...(eps ? { eps: eps.map((a) => labelOf[a]!) as [number, number, number, number] } : {}),
      }
      const code = canonicalCode(mono)
      if (!found.has(code)) found.set(code, mono)
    }
  }
  return [...found.values()]
}
