/**
 * Coverage and rewrites on the basis board from operator fingerprints: each operator's
 * symmetrised contact amplitude evaluated at the class's fixed random on-shell sample points,
 * over two primes. With the points fixed per class, linear relations between operators —
 * modulo equations of motion and integration by parts — are linear relations between their
 * fingerprints, so coverage is a rank and a rewrite is a linear solve, exact mod each prime,
 * lifted to rationals by reconstruction and accepted only when both primes agree.
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import { PrimeField } from '../finite/primeField'
import { rref } from '../finite/matrix'
import { reconstructRational, crt } from '../finite/rationalReconstruction'
import { equals, toString as ratString, type Rational } from '../exact/rational'

export interface Fingerprint {
  /** The primes, in the same order for every operator of a class. */
  primes: number[]
  /** values[i][k]: amplitude at sample point k, mod primes[i]. */
  values: number[][]
}

function checkAligned(fn: string, prints: Fingerprint[]) {
  const ref = prints[0]
  for (const fp of prints) {
    if (!ref || fp.primes.join() !== ref.primes.join() || fp.values.some((row, i) => row.length !== ref.values[i]!.length)) {
      throw new EngineInputError(fn, 'fingerprints of one class must share primes and sample points')
    }
  }
}

/** Matrix with sample points as rows and the given operators as columns, for prime index i. */
function columns(prints: Fingerprint[], i: number): number[][] {
  const n = prints[0]!.values[i]!.length
  return Array.from({ length: n }, (_, k) => prints.map((fp) => fp.values[i]![k]!))
}

/**
 * Rank of a set of operators (the board's coverage numerator), checked on both primes.
 * @example coverageRank([a, b, a+b]) // 2
 */
export function coverageRank(prints: Fingerprint[]): number {
  if (!prints.length) return 0
  checkAligned('coverageRank', prints)
  const ranks = prints[0]!.primes.map((p, i) => rref(new PrimeField(p), columns(prints, i)).rank)
  if (new Set(ranks).size !== 1) throw new EngineConsistencyError('coverageRank', `the primes disagree on the rank (${ranks.join(' vs ')})`)
  return ranks[0]!
}

export interface Combination {
  /** Coefficient of each basis operator, same order as given; exact rationals. */
  coefficients: Rational[]
}

/**
 * Write `target` as an exact rational combination of `basis` operators, or return null when
 * it is not in their span (it is independent of them). Both primes must give the same rationals.
 * @example expressIn([a, b], 2a − b/3) // { coefficients: [2, −1/3] }
 */
export function expressIn(basis: Fingerprint[], target: Fingerprint): Combination | null {
  checkAligned('expressIn', [...basis, target])
  const perPrime: bigint[][] = []
  for (const [i, p] of target.primes.entries()) {
    const F = new PrimeField(p)
    const m = columns([...basis, target], i)
    const e = rref(F, m)
    if (e.pivots.includes(basis.length)) {
      if (i > 0 && perPrime.length) throw new EngineConsistencyError('expressIn', 'the primes disagree on whether the operator is redundant')
      return null
    }
    const x = new Array<bigint>(basis.length).fill(0n)
    e.pivots.forEach((col, row) => { x[col] = BigInt(e.rows[row]![basis.length]!) })
    perPrime.push(x)
  }
  return { coefficients: liftToRationals(target.primes, perPrime) }
}

function liftToRationals(primes: number[], perPrime: bigint[][]): Rational[] {
  return perPrime[0]!.map((_, j) => {
    const single = primes.map((p, i) => reconstructRational(perPrime[i]![j]!, BigInt(p)))
    if (single.every((q) => equals(q, single[0]!))) return single[0]!
    const { residue, modulus } = crt(perPrime.map((x) => x[j]!), primes.map(BigInt))
    try {
      return reconstructRational(residue, modulus)
    } catch {
      throw new EngineConsistencyError('expressIn', `no rational agrees with both primes for coefficient ${j} (${single.map(ratString).join(' vs ')})`)
    }
  })
}
