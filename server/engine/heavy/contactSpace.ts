/**
 * Rank of contact operators from their vertices at random points, exactly over two primes
 * that must agree on the greedy basis (Schwartz–Zippel: a non-zero polynomial vanishes at a
 * random point with probability ≤ degree/p). Points are added until the rank leaves at least
 * three of them unused, so the rank is that of the functions, not of too few samples.
 */
import { EngineCancelledError, EngineConsistencyError } from '../errors'
import { PrimeField, SeededRandom, workingPrimes, rref, type CancelFlag } from '../finite'

export interface ContactModel<Point> {
  /** Number of candidate operators. */
  size: number
  sample(F: PrimeField, rng: SeededRandom): Point
  /** Vertex values of every candidate at one point. */
  values(F: PrimeField, pt: Point): number[]
}

export interface ContactRank {
  /** Candidate indices of the greedy basis (in candidate order). */
  basis: number[]
}

/**
 * Greedy basis of the candidates' vertex functions.
 * @example contactRank(model, { seed: 1 }).basis.length // the number of independent operators
 */
export function contactRank<P>(model: ContactModel<P>, opts: { seed?: number; signal?: CancelFlag; label?: string } = {}): ContactRank {
  if (model.size === 0) return { basis: [] }
  const pivots = workingPrimes(2).map((p, i) => {
    const F = new PrimeField(p)
    const rng = new SeededRandom((opts.seed ?? 20261203) + 7907 * i)
    const rows: number[][] = []
    let want = 8
    for (;;) {
      while (rows.length < want) {
        if (opts.signal?.aborted) throw new EngineCancelledError(opts.label ?? 'contact operators')
        rows.push(model.values(F, model.sample(F, rng)))
      }
      const r = rref(F, rows, opts.signal)
      if (r.rank <= rows.length - 3) return r.pivots
      want *= 2
    }
  })
  if (pivots[0]!.join(',') !== pivots[1]!.join(',')) {
    throw new EngineConsistencyError(opts.label ?? 'contactRank', `primes disagree on pivots: ${pivots[0]} vs ${pivots[1]}`)
  }
  return { basis: pivots[0]! }
}
