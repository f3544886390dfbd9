/**
 * Arithmetic in the prime field F_p for primes p < 2^26, held in plain JS numbers.
 * Every product a·b with a, b < 2^26 is below 2^52 and therefore exact in a double, so
 * (a*b) % p is exact. Elements are integers in [0, p).
 */
import { EngineConsistencyError } from '../errors'
import type { Rational } from '../exact/rational'

/** Largest modulus accepted, so that products stay exact in IEEE doubles. */
export const MAX_PRIME = 2 ** 26

/**
 * Deterministic primality test by trial division (fine for n < 2^26).
 * @example isPrime(67108837) // true
 */
export function isPrime(n: number): boolean {
  if (!Number.isSafeInteger(n) || n < 2) return false
  if (n % 2 === 0) return n === 2
  for (let d = 3; d * d <= n; d += 2) if (n % d === 0) return false
  return true
}

/**
 * The field F_p.
 * @example new PrimeField(7).inv(3) // 5, since 3·5 = 15 ≡ 1 (mod 7)
 * Method: schoolbook modular arithmetic, inverse by the extended Euclidean algorithm.
 * Reference: Knuth, TAOCP vol. 2, §4.5.2.
 */
export class PrimeField {
  readonly p: number
  constructor(p: number) {
    if (!isPrime(p) || p >= MAX_PRIME) {
      throw new EngineConsistencyError('PrimeField', `modulus must be a prime below 2^26, got ${p}`)
    }
    this.p = p
  }
  add(a: number, b: number): number {
    const s = a + b
    return s >= this.p ? s - this.p : s
  }
  sub(a: number, b: number): number {
    const s = a - b
    return s < 0 ? s + this.p : s
  }
  neg(a: number): number {
    return a === 0 ? 0 : this.p - a
  }
  mul(a: number, b: number): number {
    return (a * b) % this.p
  }
  /** Multiplicative inverse; throws EngineConsistencyError for 0. */
  inv(a: number): number {
    if (a % this.p === 0) throw new EngineConsistencyError('PrimeField.inv', `0 has no inverse mod ${this.p}`)
    let [r0, r1] = [this.p, a % this.p]
    let [t0, t1] = [0, 1]
    while (r1 !== 0) {
      const q = Math.floor(r0 / r1)
      ;[r0, r1] = [r1, r0 - q * r1]
      ;[t0, t1] = [t1, t0 - q * t1]
    }
    return t0 < 0 ? t0 + this.p : t0
  }
  div(a: number, b: number): number {
    return this.mul(a, this.inv(b))
  }
  pow(a: number, e: number): number {
    let r = 1
    let b = a % this.p
    let k = e
    while (k > 0) {
      if (k & 1) r = this.mul(r, b)
      b = this.mul(b, b)
      k = Math.floor(k / 2)
    }
    return r
  }
  /** Reduce any safe integer or bigint into [0, p). */
  from(x: number | bigint): number {
    if (typeof x === 'bigint') {
      const r = Number(((x % BigInt(this.p)) + BigInt(this.p)) % BigInt(this.p))
      return r
    }
    if (!Number.isSafeInteger(x)) throw new EngineConsistencyError('PrimeField.from', `not a safe integer: ${x}`)
    const r = x % this.p
    return r < 0 ? r + this.p : r
  }
  /** Image of an exact rational num/den; throws if p divides the denominator. */
  fromRational(q: Rational): number {
    return this.div(this.from(q.num), this.from(q.den))
  }
  /** A square root of −1 (exists iff p ≡ 1 mod 4); throws otherwise. */
  sqrtMinusOne(): number {
    if (this.p % 4 !== 1) throw new EngineConsistencyError('PrimeField.sqrtMinusOne', `p = ${this.p} is not 1 mod 4`)
    for (let g = 2; g < this.p; g++) {
      const c = this.pow(g, (this.p - 1) / 4)
      if (this.mul(c, c) === this.p - 1) return c
    }
    throw new EngineConsistencyError('PrimeField.sqrtMinusOne', `no root found mod ${this.p}`)
  }
}

/**
 * The `count` largest primes below 2^26 that are ≡ 1 (mod 4) (so that i = √−1 exists).
 * @example workingPrimes(2) // [67108837, 67108777]
 * Method: descending trial-division search. Reference: common practice.
 */
export function workingPrimes(count: number): number[] {
  const out: number[] = []
  for (let n = MAX_PRIME - 3; out.length < count && n > 3; n -= 4) if (isPrime(n)) out.push(n)
  return out
}
