/**
 * Exact linear algebra of operators modulo a relation subspace (heavy-field equation of
 * motion; integration by parts is built into the representation): rank, greedy basis and
 * rewrites, each computed over two primes that must agree, rewrites lifted to Q by CRT and
 * rational reconstruction.
 */
import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../errors'
import { PrimeField, SeededRandom, workingPrimes, rref, solve, crt, reconstructRational, type CancelFlag } from '../finite'
import type { Rational } from '../exact/rational'
import type { Element } from './algebra'
import { evaluationRows, randomPoint, type KinematicPoint } from './symbol'

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
}

/** Sample points per sector until the sector's rank leaves at least 3 points unused. */
function samplePoints(F: PrimeField, rng: SeededRandom, cols: readonly Element[], n: number, colorN: number, signal?: CancelFlag): { pts: KinematicPoint[]; rows: number[][] } {
  let pts: KinematicPoint[] = []
  let rows: number[][] = []
  let want = 8
  for (;;) {
    if (signal?.aborted) throw new EngineCancelledError('heavy enumeration')
    while (pts.length < want) {
      const p = randomPoint(F, rng, n, colorN)
      pts.push(p)
      rows = rows.concat(evaluationRows(F, cols, [p]))
    }
    const r = rows.length === 0 ? 0 : rref(F, rows, signal).rank
    if (r <= pts.length - 3) return { pts, rows }
    want *= 2
  }
}

/**
 * The space span(candidates) / span(relations), computed exactly.
 * `basis` lists candidate indices chosen greedily in the given order.
 */
export class QuotientSpace {
  readonly relationRank: number
  readonly basis: number[]
  private readonly data: PrimeData[]
  private readonly nRel: number

  constructor(readonly candidates: readonly Element[], readonly relations: readonly Element[], opts: QuotientOptions = {}) {
    const sectors = opts.sectors ?? [0, 1, 2]
    const cols = [...relations, ...candidates]
    this.nRel = relations.length
    this.data = workingPrimes(2).map((p, i) => {
      const F = new PrimeField(p)
      const rng = new SeededRandom((opts.seed ?? 20261202) + 7919 * i)
      let points: KinematicPoint[] = []
      let rows: number[][] = []
      for (const n of sectors) {
        const s = samplePoints(F, rng, cols, n, opts.colorN ?? 1, opts.signal)
        points = points.concat(s.pts)
        rows = rows.concat(s.rows)
      }
      return { F, points, rows }
    })
    const results = this.data.map((d) => (d.rows.length === 0 ? { pivots: [] as number[] } : rref(d.F, d.rows, opts.signal)))
    const keys = results.map((r) => r.pivots.join(','))
    if (keys[0] !== keys[1]) throw new EngineConsistencyError('QuotientSpace', `primes disagree on pivots: ${keys[0]} vs ${keys[1]}`)
    const piv = results[0]!.pivots
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
    const residues = this.data.map((d) => {
      const rhs = evaluationRows(d.F, [target], d.points).map((r) => r[0]!)
      const a = d.rows.map((r) => [...r.slice(0, this.nRel), ...this.basis.map((b) => r[this.nRel + b]!)])
      let x: number[]
      try {
        x = solve(d.F, a, rhs)
      } catch {
        throw new EngineInputError('QuotientSpace.rewrite', 'the operator is not in the span of the enumerated operators modulo EOM and IBP')
      }
      return x.slice(this.nRel)
    })
    return residues[0]!.map((_, i) => {
      const { residue, modulus } = crt([BigInt(residues[0]![i]!), BigInt(residues[1]![i]!)], [BigInt(this.data[0]!.F.p), BigInt(this.data[1]!.F.p)])
      return reconstructRational(residue, modulus)
    })
  }

  /** True when the element is zero modulo the relations. */
  isNull(target: Element): boolean {
    const d = this.data[0]!
    const t = evaluationRows(d.F, [target], d.points).map((r) => r[0]!)
    const rel = d.rows.map((r, i) => [...r.slice(0, this.nRel), t[i]!])
    const withT = rref(d.F, rel).rank
    const without = this.nRel === 0 ? 0 : rref(d.F, rel.map((r) => r.slice(0, -1))).rank
    return withT === without
  }
}
