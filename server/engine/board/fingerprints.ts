/**
 * Coverage and rewrites on the basis board from operator fingerprints: each operator's
 * symmetrised contact amplitude evaluated at the class's fixed random on-shell sample points,
 * over the working primes. With the points fixed per class, linear relations between
 * operators — modulo equations of motion and integration by parts — are linear relations
 * between their fingerprints, so coverage is a rank and a rewrite is a linear solve, exact mod
 * each prime, lifted to rationals from all primes together (finite/solveOverQ.ts).
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import { PrimeSet } from '../finite/primeSet'
import type { Rational } from '../exact/rational'

export interface Fingerprint {
  /** The primes, in the same order for every operator of a class. */
  primes: number[]
  /** values[i][k]: amplitude at sample point k, mod primes[i]. */
  values: number[][]
}

function checkAligned(fn: string, prints: Fingerprint[]) {
  const ref = prints[0]
  for (const fp of prints) {
    if (!ref || fp.primes.join() !== ref.primes.join() || fp.values.length !== fp.primes.length || fp.values.some((row, i) => row.length !== ref.values[i]!.length)) {
      throw new EngineConsistencyError(fn, 'fingerprints of one class must share primes and sample points')
    }
  }
}

/** Matrix with the sample points as rows and the given operators as columns, for prime index i. */
function columns(prints: Fingerprint[], i: number, points: number): number[][] {
  return Array.from({ length: points }, (_, k) => prints.map((fp) => fp.values[i]![k]!))
}

/**
 * Rank of a set of operators (the board's coverage numerator); the primes must agree.
 * @example coverageRank([a, b, a+b]) // 2
 */
export function coverageRank(prints: Fingerprint[]): number {
  if (!prints.length) return 0
  checkAligned('coverageRank', prints)
  const set = new PrimeSet(prints[0]!.primes)
  return set.rank(
    prints[0]!.values.map((row, i) => columns(prints, i, row.length)),
    { fn: 'coverageRank' },
  )
}

export interface Combination {
  /** Coefficient of each basis operator, same order as given; exact rationals. */
  coefficients: Rational[]
}

/**
 * Write `target` as an exact rational combination of `basis` operators, or return null when
 * it is not in their span (it is independent of them). The coefficients are lifted from all
 * primes together and checked against each; a coefficient beyond their reach (see
 * finite/rationalLift.ts) is refused with EngineInputError rather than guessed.
 * @example expressIn([a, b], 2a − b/3) // { coefficients: [2, −1/3] }
 */
export function expressIn(basis: Fingerprint[], target: Fingerprint): Combination | null {
  checkAligned('expressIn', [...basis, target])
  const set = new PrimeSet(target.primes)
  const systems = target.values.map((b, i) => ({ a: columns(basis, i, b.length), b }))
  const out = set.solve(systems, { fn: 'expressIn' })
  if (out.status === 'outside-span') return null
  if (out.status === 'not-liftable') throw tooLarge(set, out.index)
  return { coefficients: out.coefficients }
}

function tooLarge(set: PrimeSet, index: number): EngineInputError {
  const { each, product } = set.reach
  return new EngineInputError(
    'expressIn',
    `The coefficient of kept operator ${index + 1} is not a fraction with numerator and denominator up to ${each} (product up to ${product}), the most that the stored fingerprints determine; such a rewrite cannot be given exactly`,
  )
}
