/**
 * Lift a value known modulo several primes to the exact rational it is the image of: combine
 * the residues by the Chinese remainder theorem, reconstruct from the combined modulus, accept
 * only a fraction small enough that a random residue would almost never produce one, and check
 * the result against every prime.
 */
import { EngineConsistencyError } from '../errors'
import type { Rational } from '../exact/rational'
import { crt, reconstructRationalOrNull, wangBound } from './rationalReconstruction'

/**
 * A lifted fraction n/d is accepted only when |n|·d·2^LIFT_SAFETY_BITS·⌈log₂ M⌉ ≤ M. Then a
 * residue that is not the image of a small rational (a coefficient beyond reach, a factor i)
 * passes with probability about 2^-20 instead of more than one half for Wang's bound alone.
 */
export const LIFT_SAFETY_BITS = 20

function bitLength(m: bigint): number {
  return m.toString(2).length
}

/** Largest accepted |n|·d for the combined modulus m (see LIFT_SAFETY_BITS). */
function productLimit(m: bigint): bigint {
  return m / (BigInt(bitLength(m)) << BigInt(LIFT_SAFETY_BITS))
}

export interface LiftReach {
  /** Bound on |numerator| and on denominator (Wang's ⌊√(M/2)⌋). */
  each: bigint
  /** Bound on |numerator| × denominator (the safety margin). */
  product: bigint
}

/**
 * Which rationals a set of primes recovers: every n/d with |n|, d ≤ each and |n|·d ≤ product.
 * @example liftReach(workingPrimes(2)) // { each: 47453092n, product: 82595384n }
 */
export function liftReach(primes: readonly number[]): LiftReach {
  const m = primes.reduce((acc, p) => acc * BigInt(p), 1n)
  return { each: wangBound(m), product: productLimit(m) }
}

function checkResidues(residues: readonly number[], primes: readonly number[]): void {
  if (residues.length !== primes.length || primes.length === 0) {
    throw new EngineConsistencyError('liftRational', `need one residue per prime, got ${residues.length} residues for ${primes.length} primes`)
  }
  residues.forEach((r, i) => {
    if (!Number.isSafeInteger(r) || r < 0 || r >= primes[i]!) {
      throw new EngineConsistencyError('liftRational', `residue ${r} is not an element of F_${primes[i]}`)
    }
  })
}

/** True when q maps to residue r modulo p (and p does not divide its denominator). */
function imageMatches(q: Rational, r: number, p: number): boolean {
  const P = BigInt(p)
  if (q.den % P === 0n) return false
  return (((q.num - BigInt(r) * q.den) % P) + P) % P === 0n
}

/**
 * The rational whose image modulo primes[i] is residues[i] for every i, or null when the
 * primes do not determine one (it lies beyond liftReach(primes), or the residues do not
 * come from a small rational).
 * @example liftRational([F1.fromRational(rat(7001, 3)), F2.fromRational(rat(7001, 3))], [p1, p2]) // 7001/3
 * Method: CRT over all primes, Wang's reconstruction from the combined modulus, acceptance
 * threshold after Monagan's maximal-quotient test, check of the result against each prime.
 * References: Knuth, TAOCP vol. 2, §4.3.2 (CRT); P. S. Wang, Proc. SYMSAC 1981, 212;
 * M. Monagan, Proc. ISSAC 2004, 243 (threshold T = 2^c·⌈log₂ m⌉).
 */
export function liftRational(residues: readonly number[], primes: readonly number[]): Rational | null {
  checkResidues(residues, primes)
  const { residue, modulus } = crt(residues.map(BigInt), primes.map(BigInt))
  const q = reconstructRationalOrNull(residue, modulus)
  if (!q) return null
  const size = (q.num < 0n ? -q.num : q.num) * q.den
  if (size > productLimit(modulus)) return null
  return residues.every((r, i) => imageMatches(q, r, primes[i]!)) ? q : null
}
