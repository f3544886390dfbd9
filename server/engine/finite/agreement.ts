/**
 * Results computed separately modulo several primes must agree before they are trusted: the
 * rank and greedy pivot columns of a sampled matrix, or any integer-valued invariant. A
 * disagreement means an unlucky prime or sample point, or a bug; it is never hidden.
 */
import { EngineConsistencyError } from '../errors'
import type { PrimeField } from './primeField'
import { rref, type CancelFlag, type Echelon, type ModMatrix } from './matrix'

/** Who asks (the function named in an error) and about what (e.g. `class H^3 H*^3`). */
export interface AgreementContext {
  fn: string
  about?: string
}

function prefix(ctx: AgreementContext): string {
  return ctx.about ? `${ctx.about}: ` : ''
}

/**
 * The common value of one quantity computed modulo each prime; throws EngineConsistencyError
 * naming the primes and values when they differ.
 * @example agreedValue([F1, F2], [3, 3], { fn: 'classParity' }, 'parity trace') // 3
 */
export function agreedValue<T extends string | number | boolean>(fields: readonly PrimeField[], values: readonly T[], ctx: AgreementContext, what: string): T {
  if (values.some((v) => v !== values[0])) {
    const list = values.map((v, i) => `${v} mod ${fields[i]!.p}`).join(', ')
    throw new EngineConsistencyError(ctx.fn, `${prefix(ctx)}the primes disagree on the ${what} (${list})`)
  }
  return values[0]!
}

export interface AgreedEchelon {
  /** Greedy independent columns, the same for every prime. */
  pivots: number[]
  rank: number
  /** The reduced matrix of each prime, in the order of the fields. */
  echelons: Echelon[]
}

/**
 * Row-reduce one sampled matrix per prime (matrices[i] over fields[i]) and require the same
 * pivot columns from every prime.
 * @example agreedEchelon([F1, F2], [m1, m2], { fn: 'classBasis' }).pivots // [0, 2]
 * Method: Gauss–Jordan per prime (matrix.ts); the pivots of a matrix of integers agree with
 * those over Q except for primes dividing certain minors (common practice in multi-modular
 * algorithms; von zur Gathen & Gerhard, Modern Computer Algebra, §5.5).
 */
export function agreedEchelon(fields: readonly PrimeField[], matrices: readonly ModMatrix[], ctx: AgreementContext, signal?: CancelFlag): AgreedEchelon {
  if (fields.length !== matrices.length) throw new EngineConsistencyError(ctx.fn, `${prefix(ctx)}${matrices.length} matrices for ${fields.length} primes`)
  const echelons = fields.map((F, i) => rref(F, matrices[i]!, signal))
  const keys = echelons.map((e) => e.pivots.join(','))
  if (keys.some((k) => k !== keys[0])) {
    const list = echelons.map((e, i) => `rank ${e.rank} mod ${fields[i]!.p}`).join(', ')
    throw new EngineConsistencyError(ctx.fn, `${prefix(ctx)}the primes disagree on the independent columns (${list})`)
  }
  return { pivots: echelons[0]!.pivots, rank: echelons[0]!.rank, echelons }
}

/**
 * The rank of one sampled matrix per prime, required to agree.
 * @example agreedRank([F1, F2], [[[1, 0], [0, 1]], [[1, 0], [0, 1]]], { fn: 'FourSpace.rankOf' }) // 2
 */
export function agreedRank(fields: readonly PrimeField[], matrices: readonly ModMatrix[], ctx: AgreementContext, signal?: CancelFlag): number {
  const ranks = fields.map((F, i) => rref(F, matrices[i]!, signal).rank)
  return agreedValue(fields, ranks, ctx, 'rank')
}
