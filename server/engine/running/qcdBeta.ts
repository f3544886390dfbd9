/**
 * β-function coefficients of QCD (gauge group SU(3), n_f Dirac quarks in the fundamental)
 * in the MS-bar scheme to four loops.
 */
import { EngineInputError } from '../errors'
import { parseRational, rat, ZERO } from '../exact/rational'
import { zr, zrPolynomial, zrToNumber, type ZetaRational } from './zetaRational'

const q = parseRational

/** Coefficients of n_f^0, n_f^1, n_f^2, n_f^3 for β0 … β3 (van Ritbergen, Vermaseren, Larin 1997, eq. (8)). */
const BETA_NF_POLYNOMIALS: readonly (readonly ZetaRational[])[] = [
  [zr(q('11')), zr(q('-2/3'))],
  [zr(q('102')), zr(q('-38/3'))],
  [zr(q('2857/2')), zr(q('-5033/18')), zr(q('325/54'))],
  [zr(q('149753/6'), q('3564')), zr(q('-1078361/162'), q('-6508/27')), zr(q('50065/162'), q('6472/81')), zr(q('1093/729'), ZERO)],
]

function assertFlavours(fn: string, nf: number): void {
  if (!Number.isInteger(nf) || nf < 0 || nf > 6) {
    throw new EngineInputError(fn, `The number of active quark flavours must be a whole number from 0 to 6, not ${nf}`)
  }
}

/**
 * Exact β0 … β3 of QCD for n_f flavours, as rational + rational·ζ(3).
 * Convention: a = α_s/(4π), da/d ln μ² = −β0 a² − β1 a³ − β2 a⁴ − β3 a⁵ (MS-bar).
 * @example qcdBetaExact(5)[0] // { rational: 23/3, zeta3: 0 }
 * Method: the published n_f polynomials evaluated exactly at n_f.
 * Reference: T. van Ritbergen, J. A. M. Vermaseren, S. A. Larin, Phys. Lett. B 400 (1997) 379, eq. (8).
 */
export function qcdBetaExact(nf: number): ZetaRational[] {
  assertFlavours('qcdBetaExact', nf)
  return BETA_NF_POLYNOMIALS.map((p) => zrPolynomial(p, rat(nf)))
}

/**
 * Numeric β0 … β3 (same convention as qcdBetaExact).
 * @example qcdBeta(5) // [7.6667, 38.6667, 180.907, 4826.16]
 * Method: exact coefficients evaluated with ζ(3) in double precision.
 * Reference: van Ritbergen, Vermaseren, Larin, Phys. Lett. B 400 (1997) 379.
 */
export function qcdBeta(nf: number): number[] {
  assertFlavours('qcdBeta', nf)
  return qcdBetaExact(nf).map(zrToNumber)
}
