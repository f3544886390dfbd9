/**
 * Explicit operator basis of a theory, dimension by dimension and class by class, with the
 * tally check against the Hilbert-series counts of server/engine/counting.
 */
import { EngineCancelledError, EngineInputError } from '../errors'
import type { Theory } from '../../../shared/schemas/theory'
import { buildTheoryModel } from '../theory/model'
import { enumerateClasses } from '../counting/classes'
import { countOperators } from '../counting/countOperators'
import { classBasis, BASIS_NOTE, type ClassBasis, type Priorities } from './classBasis'
import { basisSpecies } from './species'
import { conjugateClass, parseClassKey, type OperatorClass } from './classKey'
import { describeOperators, describeAlternative, type BasisOperator } from './describe'
import { flavorDecomposition, type FlavorSummary } from './flavor'
import { massRatioOrder } from '../rules/defaultWeights'
import { orderZero, type OrderZeroReport } from './orderZero'
import { applyCpTally } from './cpTally'
import type { ClassReport } from './classReport'
import { notationColumnTerms } from '../notation/written'

export interface BuildOptions {
  maxDim: number
  minDim?: number
  nf?: number
  priorities?: Priorities
  onProgress?: (fraction: number, label: string) => void
  signal?: { aborted: boolean }
  /** Also enumerate order 0, the renormalizable Lagrangian (see orderZero.ts). */
  orderZero?: boolean
}

export type { ClassReport }

export interface DimensionReport {
  dimension: number
  /** Order under the mass-ratio rule (dimension − 4), stored with each class. */
  order: number
  operators: number
  tallyOk: boolean
  message?: string
  classes: ClassReport[]
}

export interface BasisReport {
  theory: string
  note: string
  /** Flavor number override (undefined: as declared by the theory). */
  nf?: number
  byDimension: DimensionReport[]
  /** Order 0 (mass dimension ≤ 4), when asked for. */
  orderZero?: OrderZeroReport
}

/**
 * Build the explicit basis of dimensions minDim..maxDim (default 5..maxDim).
 * @example buildBasis(smeft, { maxDim: 6 }).byDimension[1].operators // 84 (one flavor)
 * Method: per class, classBasis(); counts from countOperators() for the tally
 * (Henning, Lu, Melia & Murayama, JHEP 08 (2017) 016).
 */
export function buildBasis(theory: Theory, opts: BuildOptions): BasisReport {
  const { maxDim, minDim = 5, nf } = opts
  if (!Number.isInteger(maxDim) || maxDim < 5 || maxDim > 12) throw new EngineInputError('buildBasis', `The maximum dimension of an explicit basis must be a whole number from 5 to 12, not ${maxDim}`)
  if (nf !== undefined && (!Number.isInteger(nf) || nf < 1 || nf > 6)) throw new EngineInputError('buildBasis', `The number of flavors must be a whole number from 1 to 6, not ${nf}`)
  const particles = basisSpecies(theory)
  const model = buildTheoryModel(theory, { nf: 1 })
  const counts = countOperators(theory, { maxDim, minDim, nf: 1 })
  const flavored = particles.some((p) => p.flavored && (nf ?? p.flavors) > 1)
  const countsNf = flavored ? countOperators(theory, { maxDim, minDim, nf }) : counts
  const todo = []
  for (let d = minDim; d <= maxDim; d++) for (const c of enumerateClasses(model, d)) todo.push({ d, key: c.key })
  const done = new Set<string>()
  const byDimension: DimensionReport[] = []
  todo.forEach(({ d, key }, i) => {
    if (opts.signal?.aborted) throw new EngineCancelledError('basis')
    opts.onProgress?.(i / todo.length, `class ${key}`)
    let entry = byDimension.find((e) => e.dimension === d)
    if (!entry) byDimension.push((entry = { dimension: d, order: massRatioOrder(d), operators: 0, tallyOk: true, classes: [] }))
    if (done.has(key)) return
    const hOf = (k: string, nfCounts: typeof counts): number => nfCounts.byDimension.find((x) => x.dimension === d)?.classes[k] ?? 0
    const parsed = parseClassKey(particles, key, 1)
    if (parsed.legs.length < 3) {
      // One- and two-field classes are removed by EOM and IBP (no contact amplitude).
      if (hOf(key, counts) !== 0) entry.classes.push(twoFieldMismatch(key, hOf(key, counts)))
      entry.tallyOk &&= hOf(key, counts) === 0
      return
    }
    const cls = representative(parsed, conjugateClass(particles, parsed))
    const b = classBasis(theory, cls, { priorities: opts.priorities, signal: opts.signal, printed: notationColumnTerms })
    done.add(b.key).add(b.conjugateKey)
    const report = classReport(b, hOf(b.key, counts), hOf(b.conjugateKey, counts))
    const flavoredClass = flavored && b.class.legs.some((p) => p.flavored)
    applyCpTally(
      report,
      (flavoredClass ? countsNf : counts).byDimension.find((x) => x.dimension === d),
      flavoredClass,
    )
    if (flavoredClass) {
      report.flavor = flavorDecomposition(theory, b, nf, hOf(b.key, countsNf), opts.signal)
      flavorParity(b, report, report.flavor)
      const hc = hOf(b.conjugateKey, countsNf)
      if (!report.flavor.tallyOk || hc !== report.flavor.count) {
        report.tallyOk = false
        report.message = report.flavor.message ?? `class ${b.conjugateKey}: flavor count ${report.flavor.count} differs from Hilbert-series count ${hc}`
      }
    }
    const empty = b.rank === 0 && report.hilbert === 0 && report.hilbertConjugate === 0
    if (empty && (!report.flavor || (report.flavor.count === 0 && report.flavor.hilbert === 0))) return
    entry.classes.push(report)
    entry.operators += report.flavor ? report.flavor.realParameters : report.realParameters
    entry.tallyOk &&= report.tallyOk
  })
  for (const e of byDimension) {
    const total = countsNf.byDimension.find((x) => x.dimension === e.dimension)?.operators ?? 0
    if (e.operators !== total) {
      e.tallyOk = false
      e.message = `dimension ${e.dimension}: ${e.operators} real parameters from the explicit basis, ${total} from the Hilbert series`
    }
  }
  const zero = opts.orderZero ? { orderZero: orderZero(theory, { priorities: opts.priorities, signal: opts.signal }) } : {}
  opts.onProgress?.(1, 'done')
  return { theory: theory.name, note: BASIS_NOTE, nf, byDimension: byDimension.filter((e) => e.dimension >= minDim), ...zero }
}

/** Of a class and its conjugate, the one with fewer conjugated fields and right-handed strengths. */
function representative(a: OperatorClass, b: OperatorClass): OperatorClass {
  const score = (c: OperatorClass): number => c.legs.filter((p) => p.conj).length
  return score(b) < score(a) || (score(b) === score(a) && b.key < a.key) ? b : a
}

function twoFieldMismatch(key: string, hilbert: number): ClassReport {
  return {
    key,
    conjugateKey: key,
    selfConjugate: false,
    rank: 0,
    hilbert,
    hilbertConjugate: hilbert,
    realParameters: 0,
    tallyOk: false,
    message: `class ${key}: fewer than three fields has no contact amplitude (rank 0) but the Hilbert-series count is ${hilbert}`,
    candidates: 0,
    operators: [],
    cpEven: 0,
    cpOdd: 0,
    pEven: 0,
    pOdd: 0,
    parityImageKey: null,
  }
}

function cpCounts(b: ClassBasis, ops: BasisOperator[]): { cpEven: number | null; cpOdd: number | null } {
  if (!b.selfConjugate) return { cpEven: b.rank, cpOdd: b.rank }
  if (ops.some((o) => o.cp !== 'even' && o.cp !== 'odd')) return { cpEven: null, cpOdd: null }
  return { cpEven: ops.filter((o) => o.cp === 'even').length, cpOdd: ops.filter((o) => o.cp === 'odd').length }
}

function classReport(b: ClassBasis, hilbert: number, hilbertConjugate: number): ClassReport {
  const primes = b.primes.map((pd) => pd.F.p)
  const ops = describeOperators(b).map((op, i) => ({ ...op, fingerprint: { primes, values: b.primes.map((pd) => pd.keptRows.map((row) => row[i]!)) } }))
  const alternatives = b.alternatives.map(({ column, rows }) => ({ ...describeAlternative(b, column), fingerprint: { primes, values: rows } }))
  const ok = b.rank === hilbert && b.rank === hilbertConjugate
  return {
    key: b.key,
    conjugateKey: b.conjugateKey,
    selfConjugate: b.selfConjugate,
    rank: b.rank,
    hilbert,
    hilbertConjugate,
    realParameters: b.selfConjugate ? b.rank : 2 * b.rank,
    tallyOk: ok,
    ...(ok ? {} : { message: `class ${b.key}: amplitude rank ${b.rank} differs from Hilbert-series count ${hilbert} (conjugate class ${b.conjugateKey}: ${hilbertConjugate})` }),
    candidates: b.candidates,
    operators: ops,
    alternatives,
    ...cpCounts(b, ops),
    pEven: b.parity.pEven,
    pOdd: b.parity.pOdd,
    parityImageKey: b.parity.imageKey,
    ...(b.parity.reason ? { parityReason: b.parity.reason } : {}),
  }
}

/**
 * Parity counts with several flavors: classes paired with another class (or with the
 * conjugate class) carry the flavored real parameters split as for one flavor; classes
 * mapped to themselves are not computed (parity acts on the flavor indices too).
 */
function flavorParity(b: ClassBasis, report: ClassReport, flavor: FlavorSummary): void {
  const real = flavor.realParameters
  if (b.parity.kind === 'conjugate') Object.assign(report, { pEven: real / 2, pOdd: real / 2 })
  else if (b.parity.kind === 'pair') Object.assign(report, b.parity.credit === 'even' ? { pEven: real, pOdd: 0 } : { pEven: 0, pOdd: real })
  else if (b.parity.kind === 'self') {
    Object.assign(report, { pEven: null, pOdd: null, parityReason: `class ${b.key}: parity counts with several flavors are not computed for a class mapped to itself` })
  }
}
