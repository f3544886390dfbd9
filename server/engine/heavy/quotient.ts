/**
 * Exact linear algebra of operators modulo a relation subspace (heavy-field equation of
 * motion; integration by parts is built into the representation): rank, greedy basis and
 * rewrites, each computed over the working primes, which must agree; rewrites are lifted to Q
 * from all primes together (finite/solveOverQ.ts), with one more prime when two do not reach.
 */
import { EngineCancelledError, EngineInputError } from '../errors'
import { PrimeSet, SeededRandom, rref, type CancelFlag, type PrimeField, type SolveOutcome } from '../finite'
import type { Rational } from '../exact/rational'
import type { Element } from './algebra'
import { evaluationRows, randomPoint, singleFactor, type GaugeSetup, type KinematicPoint } from './symbol'

interface PrimeData {
  F: PrimeField
  points: KinematicPoint[]
  /** Evaluation rows of [relations…, candidates…]. */
  rows: number[][]
}

export interface QuotientOptions {
  /** Gauge-field insertion numbers to evaluate (default [0, 1, 2]). */
  sectors?: number[]
  seed?: number
  signal?: CancelFlag
  /** Colour dimension of the gauge-field insertions (1 = abelian, N for SU(N) fundamental). */
  colorN?: number
  /** Gauge factors (default: one factor, U(1) or SU(colorN)); each sector is sampled for every multiset of factors. */
  setup?: GaugeSetup
}

/** Multisets of n factor indices out of f. */
function factorTuples(n: number, f: number, from = 0): number[][] {
  if (n === 0) return [[]]
  const out: number[][] = []
  for (let g = from; g < f; g++) for (const rest of factorTuples(n - 1, f, g)) out.push([g, ...rest])
  return out
}

/**
 * Sample points per sector until the last three points add nothing to the rank (each point
 * gives 4·N² rows: spin components times colour entries), so the rank is that of the symbols.
 */
function samplePoints(F: PrimeField, rng: SeededRandom, cols: readonly Element[], factors: readonly number[], setup: GaugeSetup, signal?: CancelFlag): { pts: KinematicPoint[]; rows: number[][] } {
  const pts: KinematicPoint[] = []
  let rows: number[][] = []
  const perPoint: number[] = []
  let want = 4
  for (;;) {
    if (signal?.aborted) throw new EngineCancelledError('heavy enumeration')
    while (pts.length < want) {
      const p = randomPoint(F, rng, factors, setup)
      pts.push(p)
      const r = evaluationRows(F, cols, [p])
      perPoint.push(r.length)
      rows = rows.concat(r)
    }
    const last3 = perPoint.slice(-3).reduce((a, b) => a + b, 0)
    const all = rows.length === 0 ? 0 : rref(F, rows, signal).rank
    const fewer = rows.length - last3 === 0 ? 0 : rref(F, rows.slice(0, rows.length - last3), signal).rank
    if (all === fewer) return { pts, rows }
    want *= 2
  }
}

/** Evaluation data of working prime number `index` (its own seeded points, sector by sector). */
function primeData(F: PrimeField, index: number, cols: readonly Element[], opts: QuotientOptions): PrimeData {
  const rng = new SeededRandom((opts.seed ?? 20261202) + 7919 * index)
  let points: KinematicPoint[] = []
  let rows: number[][] = []
  const setup = opts.setup ?? singleFactor(opts.colorN ?? 1)
  for (const n of opts.sectors ?? [0, 1, 2])
    for (const factors of factorTuples(n, setup.factors.length)) {
      const s = samplePoints(F, rng, cols, factors, setup, opts.signal)
      points = points.concat(s.pts)
      rows = rows.concat(s.rows)
    }
  return { F, points, rows }
}

/** Most primes a rewrite widens to before it refuses a coefficient. */
const MAX_REWRITE_PRIMES = 3

/**
 * The space span(candidates) / span(relations), computed exactly.
 * `basis` lists candidate indices chosen greedily in the given order.
 */
export class QuotientSpace {
  readonly relationRank: number
  readonly basis: number[]
  private data: PrimeData[]
  private set = PrimeSet.working()
  private readonly cols: readonly Element[]
  private readonly nRel: number

  constructor(
    readonly candidates: readonly Element[],
    readonly relations: readonly Element[],
    private readonly opts: QuotientOptions = {},
  ) {
    this.cols = [...relations, ...candidates]
    this.nRel = relations.length
    this.data = this.set.fields.map((F, i) => primeData(F, i, this.cols, opts))
    const piv = this.set.echelon(
      this.data.map((d) => d.rows),
      { fn: 'QuotientSpace' },
      opts.signal,
    ).pivots
    this.relationRank = piv.filter((c) => c < this.nRel).length
    this.basis = piv.filter((c) => c >= this.nRel).map((c) => c - this.nRel)
  }

  /** Dimension of the quotient spanned by the candidates. */
  get dimension(): number {
    return this.basis.length
  }

  /**
   * Coefficients of `target` on the basis elements (modulo relations), exact rationals.
   * Throws EngineInputError when the target is not in span(candidates) + span(relations).
   */
  rewrite(target: Element): Rational[] {
    let out = this.solve(target)
    // Two primes did not reach a coefficient: add the next working prime (rare, and cheap
    // next to the enumeration), checked against the others like them.
    while (out.status === 'not-liftable' && this.set.size < MAX_REWRITE_PRIMES) {
      this.addPrime()
      out = this.solve(target)
    }
    if (out.status === 'outside-span')
      throw new EngineInputError('QuotientSpace.rewrite', 'This operator is not a combination of the enumerated operators (modulo equations of motion and integration by parts)')
    if (out.status === 'not-liftable') {
      const { each, product } = this.set.reach
      throw new EngineInputError(
        'QuotientSpace.rewrite',
        `The coefficient of basis operator ${out.index + 1} is not a fraction with numerator and denominator up to ${each} (product up to ${product}); it cannot be given exactly`,
      )
    }
    return out.coefficients
  }

  private solve(target: Element): SolveOutcome {
    const systems = this.data.map((d) => ({
      a: d.rows.map((r) => [...r.slice(0, this.nRel), ...this.basis.map((b) => r[this.nRel + b]!)]),
      b: evaluationRows(d.F, [target], d.points).map((r) => r[0]!),
    }))
    const lift = this.basis.map((_, i) => this.nRel + i)
    return this.set.solve(systems, { fn: 'QuotientSpace.rewrite' }, { lift })
  }

  /**
   * Widen to the next working prime; its pivots must agree with the others'. Not cancellable:
   * the space may be shared (orderSpace's memo) beyond the run whose flag it was built with.
   */
  private addPrime(): void {
    const set = PrimeSet.working(this.set.size + 1)
    const data = [...this.data, primeData(set.fields[set.size - 1]!, set.size - 1, this.cols, { ...this.opts, signal: undefined })]
    set.echelon(
      data.map((d) => d.rows),
      { fn: 'QuotientSpace' },
    )
    this.set = set
    this.data = data
  }

  /** True when the element is zero modulo the relations. */
  isNull(target: Element): boolean {
    const ctx = { fn: 'QuotientSpace.isNull' }
    const rel = this.data.map((d) => {
      const t = evaluationRows(d.F, [target], d.points).map((r) => r[0]!)
      return d.rows.map((r, i) => [...r.slice(0, this.nRel), t[i]!])
    })
    const withT = this.set.rank(rel, ctx)
    const without =
      this.nRel === 0
        ? 0
        : this.set.rank(
            rel.map((m) => m.map((r) => r.slice(0, -1))),
            ctx,
          )
    return withT === without
  }
}
