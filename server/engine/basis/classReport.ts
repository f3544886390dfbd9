// One class's part of an explicit basis: the report type that buildBasis assembles and cpTally
// completes (in its own file so that the two need not import each other).
import type { BasisOperator } from './describe'
import type { FlavorSummary } from './flavor'

export interface ClassReport {
  key: string
  conjugateKey: string
  selfConjugate: boolean
  rank: number
  hilbert: number
  hilbertConjugate: number
  /** Real parameters for one flavor: rank (self-conjugate) or 2·rank (with its conjugate). */
  realParameters: number
  tallyOk: boolean
  message?: string
  candidates: number
  /** Kept operators, each with its fingerprint (values at the class's sample points, two primes). */
  operators: BasisOperator[]
  /** A few redundant candidates with fingerprints: set-aside material with exact rewrites. */
  alternatives?: BasisOperator[]
  /**
   * CP-even / CP-odd real parameters (convention of counting/cpCount.ts): a non-Hermitian
   * operator gives one of each (O + h.c. and i(O − h.c.)); Hermitian ones are counted from
   * their CP and checked against the CP-twisted Hilbert series (cpTally.ts); with several
   * flavors, the Hilbert-series split. Null where neither is available.
   */
  cpEven: number | null
  cpOdd: number | null
  /**
   * P-even / P-odd real parameters (conventions in parity.ts). P(C) = C: from the parity
   * eigenvalues of the kept operators; P(C) = C̄: rank of each; P(C) another class: the class
   * of the pair whose orbit key sorts first counts the combinations O + P(O) as P-even, its
   * image O − P(O) as P-odd (so pEven + pOdd = realParameters in every class). Null where P
   * is undefined (parityReason says why) and for self-mapped classes with several flavors.
   */
  pEven: number | null
  pOdd: number | null
  /** Key of the parity image class P(C), null where P is undefined. */
  parityImageKey: string | null
  parityReason?: string
  flavor?: FlavorSummary
}
