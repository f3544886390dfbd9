/**
 * CP split of a class of the explicit basis against the CP-twisted Hilbert series
 * (counting/cpCount.ts): with one flavor the CP labels of the kept operators must give the
 * count's split (a mismatch fails the tally); with several flavors, or where the operators are
 * not CP eigenvectors (kept as typed), the class takes the count's split.
 */
import type { DimensionCount } from '../counting/countOperators'
import type { ClassReport } from './classReport'

/**
 * Compare or fill report.cpEven / cpOdd from the count of the same dimension.
 * @example applyCpTally(report of "D Q Q* H H*", smeft dim-6 count, false) // cpEven 2, cpOdd 0, tally kept
 */
export function applyCpTally(report: ClassReport, count: DimensionCount | undefined, flavored: boolean): void {
  const entry = count?.cp?.[report.key] ?? count?.cp?.[report.conjugateKey]
  if (!entry) return
  if (flavored || report.cpEven === null || report.cpOdd === null) {
    report.cpEven = entry.even
    report.cpOdd = entry.odd
    return
  }
  if (report.cpEven !== entry.even || report.cpOdd !== entry.odd) {
    report.tallyOk = false
    report.message = `class ${report.key}: CP split of the explicit basis (${report.cpEven} even, ${report.cpOdd} odd) differs from the CP-twisted Hilbert series (${entry.even} even, ${entry.odd} odd)`
  }
}
