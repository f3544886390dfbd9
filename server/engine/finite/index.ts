/** Prime-field arithmetic, dense exact linear algebra mod p, rational reconstruction, and the
 * multi-modular layer (agreement between primes, lifting to Q, solving over Q). */
export { PrimeField, isPrime, workingPrimes, MAX_PRIME } from './primeField'
export { SeededRandom } from './rng'
export { rref, rank, solve, type ModMatrix, type Echelon, type CancelFlag } from './matrix'
export { reconstructRational, reconstructRationalOrNull, wangBound, crt } from './rationalReconstruction'
export { agreedEchelon, agreedRank, agreedValue, type AgreedEchelon, type AgreementContext } from './agreement'
export { liftRational, liftReach, LIFT_SAFETY_BITS, type LiftReach } from './rationalLift'
export { solveOverQ, type ModSystem, type SolveOutcome } from './solveOverQ'
export { PrimeSet, WORKING_PRIME_COUNT } from './primeSet'
