/** Prime-field arithmetic, dense exact linear algebra mod p, rational reconstruction. */
export { PrimeField, isPrime, workingPrimes, MAX_PRIME } from './primeField'
export { SeededRandom } from './rng'
export { rref, rank, solve, type ModMatrix, type Echelon, type CancelFlag } from './matrix'
export { reconstructRational, crt } from './rationalReconstruction'
