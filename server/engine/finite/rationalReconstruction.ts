/**
 * Rational reconstruction and the Chinese remainder theorem: recover an exact rational
 * n/d from its image modulo m (or modulo several primes combined).
 */
import { EngineInputError } from '../errors'
import { rat, type Rational } from '../exact/rational'

function isqrt(n: bigint): bigint {
  if (n < 2n) return n
  let x = BigInt(Math.floor(Math.sqrt(Number(n))))
  while (x * x > n) x--
  while ((x + 1n) * (x + 1n) <= n) x++
  return x
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
  const bound = isqrt(m / 2n)
  let [r0, r1] = [m, ((a % m) + m) % m]
  let [t0, t1] = [0n, 1n]
  while (r1 > bound) {
    const q = r0 / r1
    ;[r0, r1] = [r1, r0 - q * r1]
    ;[t0, t1] = [t1, t0 - q * t1]
  }
  if (t1 === 0n || (t1 < 0n ? -t1 : t1) > bound) {
    throw new EngineInputError('reconstructRational', `no rational with bound ${bound} has image ${a} mod ${m}`)
  }
  return rat(r1, t1)
}

/**
 * Combine residues r_i mod pairwise-coprime m_i into r mod Π m_i.
 * @example crt([2n, 3n], [3n, 5n]) // { residue: 8n, modulus: 15n }
 * Method: incremental Garner/CRT. Reference: Knuth, TAOCP vol. 2, §4.3.2.
 */
export function crt(residues: bigint[], moduli: bigint[]): { residue: bigint; modulus: bigint } {
  if (residues.length !== moduli.length || moduli.length === 0) {
    throw new EngineInputError('crt', `need equally many residues and moduli, got ${residues.length} and ${moduli.length}`)
  }
  let r = ((residues[0]! % moduli[0]!) + moduli[0]!) % moduli[0]!
  let m = moduli[0]!
  for (let i = 1; i < moduli.length; i++) {
    const mi = moduli[i]!
    const ri = ((residues[i]! % mi) + mi) % mi
    const k = (((ri - r) % mi) + mi) % mi * modInverse(m % mi, mi) % mi
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
  if (r0 !== 1n) throw new EngineInputError('crt', `moduli not coprime: gcd(${a}, ${m}) = ${r0}`)
  return ((t0 % m) + m) % m
}
