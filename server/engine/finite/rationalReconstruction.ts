/**
 * Rational reconstruction and the Chinese remainder theorem: recover an exact rational
 * n/d from its image modulo m (or modulo several primes combined).
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import { rat, type Rational } from '../exact/rational'

/** ⌊√n⌋ by Newton's iteration on bigints (exact for any size, so any number of primes). */
function isqrt(n: bigint): bigint {
  if (n < 2n) return n
  let x = 1n << BigInt(Math.ceil(n.toString(2).length / 2))
  for (;;) {
    const y = (x + n / x) >> 1n
    if (y >= x) return x
    x = y
  }
}

/**
 * Find n/d with |n|, d ≤ sqrt(m/2) and n ≡ a·d (mod m); unique when it exists.
 * Throws EngineInputError when no such fraction exists (the modulus is too small).
 * @example reconstructRational(51n, 101n) // { num: 1n, den: 2n }, since 2·51 ≡ 1 (mod 101)
 * Method: extended Euclid stopped at the bound (Wang's algorithm).
 * Reference: P. S. Wang, Proc. SYMSAC 1981, 212; von zur Gathen & Gerhard, Modern
 * Computer Algebra, §5.10.
 */
export function reconstructRational(a: bigint, m: bigint): Rational {
  const q = reconstructRationalOrNull(a, m)
  if (!q) throw new EngineInputError('reconstructRational', `no rational with bound ${wangBound(m)} has image ${a} mod ${m}`)
  return q
}

/** The bound ⌊√(m/2)⌋ on |n| and d in Wang's reconstruction. @example wangBound(101n) // 7n */
export function wangBound(m: bigint): bigint {
  return isqrt(m / 2n)
}

/**
 * As reconstructRational, but null when no fraction within the bound has image a mod m.
 * @example reconstructRationalOrNull(3n, 7n) // null
 * Method/reference: as reconstructRational.
 */
export function reconstructRationalOrNull(a: bigint, m: bigint): Rational | null {
  const bound = wangBound(m)
  let [r0, r1] = [m, ((a % m) + m) % m]
  let [t0, t1] = [0n, 1n]
  while (r1 > bound) {
    const q = r0 / r1
    ;[r0, r1] = [r1, r0 - q * r1]
    ;[t0, t1] = [t1, t0 - q * t1]
  }
  if (t1 === 0n || (t1 < 0n ? -t1 : t1) > bound) return null
  return rat(r1, t1)
}

/**
 * Combine residues r_i mod pairwise-coprime m_i into r mod Π m_i.
 * @example crt([2n, 3n], [3n, 5n]) // { residue: 8n, modulus: 15n }
 * Method: incremental Garner/CRT. Reference: Knuth, TAOCP vol. 2, §4.3.2.
 */
export function crt(residues: bigint[], moduli: bigint[]): { residue: bigint; modulus: bigint } {
  if (residues.length !== moduli.length || moduli.length === 0) {
    throw new EngineConsistencyError('crt', `need equally many residues and moduli, got ${residues.length} and ${moduli.length}`)
  }
  let r = ((residues[0]! % moduli[0]!) + moduli[0]!) % moduli[0]!
  let m = moduli[0]!
  for (let i = 1; i < moduli.length; i++) {
    const mi = moduli[i]!
    const ri = ((residues[i]! % mi) + mi) % mi
    const k = (((((ri - r) % mi) + mi) % mi) * modInverse(m % mi, mi)) % mi
    r = r + m * k
    m = m * mi
  }
  return { residue: r, modulus: m }
}

function modInverse(a: bigint, m: bigint): bigint {
  let [r0, r1] = [m, ((a % m) + m) % m]
  let [t0, t1] = [0n, 1n]
  while (r1 !== 0n) {
    const q = r0 / r1
    ;[r0, r1] = [r1, r0 - q * r1]
    ;[t0, t1] = [t1, t0 - q * t1]
  }
  if (r0 !== 1n) throw new EngineConsistencyError('crt', `moduli not coprime: gcd(${a}, ${m}) = ${r0}`)
  return ((t0 % m) + m) % m
}
