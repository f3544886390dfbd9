/**
 * Choice of the kept operators of one chiral order from the free-limit values: operators are
 * filtered by their number of letters m, and in each filtration degree the leading values (one
 * letter per leg, at configurations with m legs) of the candidates are computed until their rank
 * reaches the Hilbert-series count of the classes with m letters. The kept operators are the
 * greedy independent columns in priority order. Because an operator with m letters vanishes at
 * configurations with fewer legs, the exact values are block-triangular in m with these leading
 * blocks on the diagonal: the kept operators are independent and complete exactly, not only in
 * the free limit (Henning, Lu, Melia, Murayama, JHEP 10 (2017) 199, sect. 6, for the argument).
 */
import { EngineCancelledError, EngineConsistencyError } from '../../errors'
import { rref } from '../../finite/matrix'
import type { PrimeField } from '../../finite/primeField'
import type { SeededRandom } from '../../finite/rng'
import type { Candidate } from './candidates'
import { classContent, classPatterns } from './configs'
import { IncrementalEchelon } from './echelon'
import { FreeEvaluator } from './freeValue'
import { randomConfig, type Config, type LegKind } from './kinematics'
import { exactCode } from './canonical'
import type { Monomial } from './monomial'

export interface BlockResult {
  m: number
  target: number
  rank: number
  configs: Config[]
  patterns: LegKind[][]
  /** Candidates of the block after zero ones were dropped, priority order kept. */
  candidates: Candidate[]
  kept: Candidate[]
  /** Per class key: rank of its candidates. */
  classRanks: Map<string, number>
  /** Leading values: column of each live candidate at the configurations. */
  columns: Map<Candidate, number[]>
  /** Indices of the configurations that raised a class's rank: enough to separate the kept operators exactly. */
  pivots: number[]
}

export interface BlockOptions {
  F: PrimeField
  rng: SeededRandom
  N: number
  /** Kinds of legs odd letters can take (pion, and p, a with the sources). */
  oddKinds: readonly LegKind[]
  signal?: { aborted: boolean }
}

const MARGIN = 3

/**
 * The letter degree m: for each class (key and Hilbert count) draw configurations of its leg
 * patterns until its candidates reach the count (then a few more, which must not raise it);
 * contact candidates are evaluated everywhere, other classes' candidates vanish there by parity.
 * Then vanishing candidates are dropped and the kept ones picked greedily in priority order.
 * @example selectBlock(candidates, 4, [{ key: '{u,χ−,f−}^4', count: 3 }], opts).kept.length // 3 for N = 3 without sources
 */
export function selectBlock(cands: readonly Candidate[], m: number, classes: readonly { key: string; count: number }[], o: BlockOptions): BlockResult {
  const configs: Config[] = []
  const used: LegKind[][] = []
  const rows: number[][] = []
  const classRanks = new Map<string, number>()
  const pivots: number[] = []
  for (const cls of classes) {
    const own = cands.map((c, j) => (c.classKey === cls.key ? j : -1)).filter((j) => j >= 0)
    const evaluated = cands.map((c, j) => (c.classKey === cls.key || c.contact ? j : -1)).filter((j) => j >= 0)
    const patterns = classPatterns(classContent(cls.key), o.oddKinds)
    const echelon = new IncrementalEchelon(o.F, own.length)
    let quiet = 0
    for (let t = 0; patterns.length > 0 && t < 3 * cls.count + 40 && (echelon.rank < cls.count || quiet < MARGIN); t++) {
      if (o.signal?.aborted) throw new EngineCancelledError('basis')
      const kinds = patterns[t % patterns.length]!
      const config = randomConfig(o.F, o.rng, o.N, kinds)
      const ev = new FreeEvaluator(o.F, config)
      const row = new Array<number>(cands.length).fill(0)
      for (const j of evaluated) row[j] = ev.operator(cands[j]!.op)
      configs.push(config)
      used.push(kinds)
      rows.push(row)
      const grew = echelon.add(own.map((j) => row[j]!))
      if (grew) pivots.push(rows.length - 1)
      if (echelon.rank > cls.count) throw new EngineConsistencyError('selectBlock', `class ${cls.key} has rank above its Hilbert-series count ${cls.count}`)
      quiet = echelon.rank >= cls.count && !grew ? quiet + 1 : 0
    }
    classRanks.set(cls.key, echelon.rank)
  }
  const live = cands.map((c, j) => ({ c, j })).filter(({ j }) => rows.some((r) => r[j] !== 0))
  const matrix = rows.map((r) => live.map(({ j }) => r[j]!))
  const e = rref(o.F, matrix.length ? matrix : [[]])
  const kept = e.pivots.map((col) => live[col]!.c)
  const target = classes.reduce((s, c) => s + c.count, 0)
  const columns = new Map(live.map(({ c, j }) => [c, rows.map((r) => r[j]!)]))
  return { m, target, rank: e.rank, configs, patterns: used, candidates: live.map(({ c }) => c), kept, classRanks, columns, pivots }
}

/**
 * Merge terms that are the same operator up to sign (O + C(O) with C(O) = ±O exactly; ⟨χχ†⟩ +
 * ⟨χ†χ⟩ = 2⟨χχ†⟩): same exact code (exactCode: no symmetrization of derivatives, so the merge
 * holds beyond the free limit), the sign read off the values; then divide the integer
 * coefficients by their greatest common divisor. A merge is only accepted when the merged
 * operator reproduces the column.
 */
export function simplify(F: PrimeField, c: Candidate, column: number[], evaluators: FreeEvaluator[]): Candidate {
  const groups = new Map<string, { coef: number; mono: Monomial }[]>()
  for (const t of c.op.terms) {
    const k = exactCode(t.mono)
    groups.set(k, [...(groups.get(k) ?? []), t])
  }
  if (groups.size === c.op.terms.length || evaluators.length === 0) return normalized(c)
  const terms: { coef: number; mono: Monomial }[] = []
  for (const group of groups.values()) {
    const first = group[0]!.mono
    const base = evaluators.map((ev) => ev.monomial(first))
    let coef = 0
    for (const t of group) {
      const v = evaluators.map((ev) => ev.monomial(t.mono))
      const sign = v.every((x, k) => x === base[k]) ? 1 : v.every((x, k) => x === F.neg(base[k]!)) ? -1 : 0
      if (sign === 0) return normalized(c)
      coef += sign * t.coef
    }
    if (coef !== 0) terms.push({ coef, mono: first })
  }
  const merged = { ...c, op: { ...c.op, terms } }
  const same = evaluators.every((ev, k) => ev.operator(merged.op) === column[k])
  return same ? normalized(merged) : normalized(c)
}

function normalized(c: Candidate): Candidate {
  const gcd = (a: number, b: number): number => (b === 0 ? Math.abs(a) : gcd(b, a % b))
  const g = c.op.terms.reduce((x, t) => gcd(x, t.coef), 0)
  if (g <= 1) return c
  return { ...c, op: { ...c.op, terms: c.op.terms.map((t) => ({ ...t, coef: t.coef / g })) } }
}
