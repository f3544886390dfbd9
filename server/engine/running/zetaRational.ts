/**
 * Exact numbers of the form r + z·ζ(3) with r, z rational: the shape of the QCD β-function
 * coefficients up to four loops. Numeric evaluation uses ζ(3) to double precision.
 */
import { add, mul, rat, ZERO, toString as ratText, type Rational } from '../exact/rational'
import { rationalToNumber } from '../scales/decimal'

/** Apéry's constant ζ(3) = Σ 1/n³ (to double precision). */
export const ZETA3 = 1.2020569031595942

export interface ZetaRational {
  readonly rational: Rational
  readonly zeta3: Rational
}

/** r + z ζ(3) from its parts. @example zrToString(zr(rat(3), rat(1))) // '3 + 1*zeta3' */
export function zr(rational: Rational, zeta3: Rational = ZERO): ZetaRational {
  return { rational, zeta3 }
}

/** Sum of two such numbers. @example zrToString(zrAdd(zr(rat(1)), zr(rat(0), rat(2)))) // '1 + 2*zeta3' */
export function zrAdd(a: ZetaRational, b: ZetaRational): ZetaRational {
  return { rational: add(a.rational, b.rational), zeta3: add(a.zeta3, b.zeta3) }
}

/** a times a plain rational. @example zrToString(zrScale(zr(rat(1), rat(1)), rat(2))) // '2 + 2*zeta3' */
export function zrScale(a: ZetaRational, k: Rational): ZetaRational {
  return { rational: mul(a.rational, k), zeta3: mul(a.zeta3, k) }
}

/**
 * Polynomial Σ c_i x^i with ZetaRational coefficients at a rational x (exact).
 * @example zrToString(zrPolynomial([zr(rat(11)), zr(rat(-2, 3))], rat(5))) // '23/3'
 */
export function zrPolynomial(coeffs: readonly ZetaRational[], x: Rational): ZetaRational {
  let out = zr(ZERO)
  let power = rat(1)
  for (const c of coeffs) {
    out = zrAdd(out, zrScale(c, power))
    power = mul(power, x)
  }
  return out
}

/** Numeric value r + z ζ(3). @example zrToNumber(zr(rat(0), rat(1))) // 1.2020569031595942 */
export function zrToNumber(a: ZetaRational): number {
  return rationalToNumber(a.rational) + rationalToNumber(a.zeta3) * ZETA3
}

/** "r + z*zeta3" (or just "r" when z = 0). @example zrToString(zr(rat(1, 2))) // '1/2' */
export function zrToString(a: ZetaRational): string {
  return a.zeta3.num === 0n ? ratText(a.rational) : `${ratText(a.rational)} + ${ratText(a.zeta3)}*zeta3`
}
