/**
 * The primes one exact computation is repeated over, with the checks that make the repetition
 * worth it: every rank, pivot choice and invariant must agree between the primes, and every
 * rational is lifted from all of them together. Callers hold one matrix (or system) per prime,
 * in the order of `fields`.
 */
import { EngineConsistencyError } from '../errors'
import type { Rational } from '../exact/rational'
import { PrimeField, workingPrimes } from './primeField'
import type { CancelFlag, ModMatrix } from './matrix'
import { agreedEchelon, agreedRank, agreedValue, type AgreedEchelon, type AgreementContext } from './agreement'
import { liftRational, liftReach, type LiftReach } from './rationalLift'
import { solveOverQ, type ModSystem, type SolveOutcome } from './solveOverQ'

/** How many primes a basis run, its fingerprints and the heavy engine use. */
export const WORKING_PRIME_COUNT = 2

const workingSets = new Map<number, PrimeSet>()

/**
 * @example PrimeSet.working().primes // [67108837, 67108777]
 * @example PrimeSet.working().lift([residue mod p1, residue mod p2]) // 7001/3
 */
export class PrimeSet {
  readonly fields: readonly PrimeField[]
  readonly primes: readonly number[]

  constructor(primes: readonly number[]) {
    if (primes.length === 0 || new Set(primes).size !== primes.length) {
      throw new EngineConsistencyError('PrimeSet', `need one or more distinct primes, got [${primes.join(', ')}]`)
    }
    this.primes = [...primes]
    this.fields = primes.map((p) => new PrimeField(p))
  }

  /** The first `count` working primes (largest below 2^26 with √−1); one shared object per count. */
  static working(count: number = WORKING_PRIME_COUNT): PrimeSet {
    let s = workingSets.get(count)
    if (!s) workingSets.set(count, (s = new PrimeSet(workingPrimes(count))))
    return s
  }

  get size(): number {
    return this.primes.length
  }

  /** The image of an exact number modulo each prime. @example PrimeSet.working().image(rat(-1)) // [p1 − 1, p2 − 1] */
  image(q: Rational | number): number[] {
    return this.fields.map((F) => (typeof q === 'number' ? F.from(q) : F.fromRational(q)))
  }

  /** −x for per-prime values x (one value per prime). */
  negated(values: readonly number[]): number[] {
    return this.fields.map((F, i) => F.neg(values[i]!))
  }

  /** See agreement.ts: one matrix per prime, pivots required to agree. */
  echelon(matrices: readonly ModMatrix[], ctx: AgreementContext, signal?: CancelFlag): AgreedEchelon {
    return agreedEchelon(this.fields, matrices, ctx, signal)
  }

  rank(matrices: readonly ModMatrix[], ctx: AgreementContext, signal?: CancelFlag): number {
    return agreedRank(this.fields, matrices, ctx, signal)
  }

  agree<T extends string | number | boolean>(values: readonly T[], ctx: AgreementContext, what: string): T {
    return agreedValue(this.fields, values, ctx, what)
  }

  /** One residue per prime to a rational, or null beyond `reach` (rationalLift.ts). */
  lift(residues: readonly number[]): Rational | null {
    return liftRational(residues, this.primes)
  }

  /** The rationals these primes recover. */
  get reach(): LiftReach {
    return liftReach(this.primes)
  }

  /** One system per prime, solved over Q (solveOverQ.ts). */
  solve(systems: readonly ModSystem[], ctx: AgreementContext, opts: { lift?: readonly number[]; signal?: CancelFlag } = {}): SolveOutcome {
    return solveOverQ(this.fields, systems, ctx, opts)
  }
}
