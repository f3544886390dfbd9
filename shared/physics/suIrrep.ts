/**
 * Two facts of an SU(n) irrep that the theory-file schema checks on the client and the server:
 * its dimension and its reality. Pure and unchecked: callers pass an integer n >= 2 and n − 1
 * non-negative integer Dynkin labels (the engine's suDimension / suReality validate first).
 */

/**
 * Weyl dimension formula, exact: dim = Π_{1<=i<j<=n} (λ_i − λ_j + j − i)/(j − i), λ the
 * partition of the Dynkin labels a (λ_i = a_i + … + a_{n−1}).
 * @example weylDimension(3, [1, 1]) // 8n
 * Reference: Fulton & Harris, Representation Theory (Springer 1991), Thm 6.3 / eq. (15.17).
 */
export function weylDimension(n: number, dynkin: readonly number[]): bigint {
  const lambda = new Array<number>(n).fill(0)
  for (let i = n - 2; i >= 0; i--) lambda[i] = lambda[i + 1]! + dynkin[i]!
  let num = 1n
  let den = 1n
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      num *= BigInt(lambda[i]! - lambda[j]! + j - i)
      den *= BigInt(j - i)
    }
  }
  return num / den
}

/**
 * Reality of an SU(n) irrep: 'complex' unless self-conjugate (palindromic labels); a
 * self-conjugate irrep is pseudoreal iff the Frobenius–Schur exponent Σ_i i(n−i) a_i is odd.
 * @example irrepReality(2, [1]) // 'pseudoreal'
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, §4 and Table 11; Bourbaki, Lie VIII §7 ex. 5.
 */
export function irrepReality(n: number, dynkin: readonly number[]): 'real' | 'pseudoreal' | 'complex' {
  for (let i = 0; i < n - 1; i++) if (dynkin[i] !== dynkin[n - 2 - i]) return 'complex'
  let exponent = 0n
  for (let i = 1; i < n; i++) exponent += BigInt(i * (n - i)) * BigInt(dynkin[i - 1]!)
  return exponent % 2n === 0n ? 'real' : 'pseudoreal'
}
