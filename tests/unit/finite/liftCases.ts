/**
 * Named cases for lifting coefficients from their images modulo the working primes, shared by
 * the layer's own tests (multiModular.test.ts) and by every caller's path (callers.test.ts).
 * With two working primes p1 = 67108837, p2 = 67108777 (M = p1·p2 ≈ 4.5·10^15) the reach is
 * |n|, d ≤ 47453092 (Wang's ⌊√(M/2)⌋) and |n|·d ≤ 82595384 (the safety margin of
 * rationalLift.ts); with three working primes it is 388735423912 and 3695249063652183.
 * One prime alone reaches 5792, the bound that used to break the board's rewrites.
 * Values are exact by construction (common practice: a combination built with known
 * rational coefficients must come back exactly; one beyond reach must be refused, not guessed).
 */
import { rat, type Rational } from '../../../server/engine/exact/rational'

export type Outcome = 'exact' | 'refused'

export interface LiftCase {
  name: string
  value: Rational
  /** What two working primes (every caller today) must do with it. */
  twoPrimes: Outcome
  /** What three working primes must do with it (a caller asking for one more prime). */
  threePrimes: Outcome
  /**
   * The value is 0 modulo one working prime: scaling an operator of a basis by it makes that
   * prime see a smaller rank than the other, which the callers must report as a disagreement.
   */
  vanishesModuloAPrime?: true
}

const P1 = 67108837n

export const LIFT_CASES: LiftCase[] = [
  { name: 'zero', value: rat(0), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'one', value: rat(1), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'negative small fraction', value: rat(-1, 3), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'bug report: 7001/3', value: rat(7001, 3), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'bug report: 1/9000', value: rat(1, 9000), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'bug report: 123457', value: rat(123457), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'at the single-prime bound: 5792/5791', value: rat(5792, 5791), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'just past the single-prime bound: -5793/5794', value: rat(-5793, 5794), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'integer at the two-prime bound: 47453092', value: rat(47453092), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'negative unit fraction at the two-prime bound', value: rat(-1, 47453092), twoPrimes: 'exact', threePrimes: 'exact' },
  { name: 'integer just past the two-prime bound: 47453093', value: rat(47453093), twoPrimes: 'refused', threePrimes: 'exact' },
  { name: "balanced fraction inside Wang's bound but past the safety margin", value: rat(40000001, 39999999), twoPrimes: 'refused', threePrimes: 'exact' },
  { name: 'integer above 2^26: 67108879', value: rat(2 ** 26 + 15), twoPrimes: 'refused', threePrimes: 'exact' },
  { name: 'the first working prime itself (zero modulo that prime)', value: rat(P1), twoPrimes: 'refused', threePrimes: 'exact', vanishesModuloAPrime: true },
  { name: 'denominator above 2^26: -1/67108879', value: rat(-1, 2 ** 26 + 15), twoPrimes: 'refused', threePrimes: 'exact' },
  { name: 'integer near 2^35: 34359738371', value: rat(2 ** 35 + 3), twoPrimes: 'refused', threePrimes: 'exact' },
  { name: 'beyond three primes too: 2^40 + 15', value: rat(2 ** 40 + 15), twoPrimes: 'refused', threePrimes: 'refused' },
]

/** The case names, for messages. */
export const caseName = (c: LiftCase): string => `${c.name} (${c.value.num}/${c.value.den})`
