/**
 * Number of independent operators of a relativistic EFT, per mass dimension and per class,
 * modulo equations of motion and integration by parts, by the Hilbert series of
 * Henning, Lu, Melia, Murayama, "2, 84, 30, 993, 560, 15456, 11962, 261485, ...: Higher
 * dimension operators in the SM EFT", JHEP 08 (2017) 016 (arXiv:1512.03433), and
 * Commun. Math. Phys. 347 (2016) 363.
 *
 * Counting convention: a non-Hermitian operator and its conjugate are counted separately
 * (they sit in conjugate classes), so the total equals the number of real Wilson-coefficient
 * parameters; a self-conjugate class counts Hermitian combinations.
 *
 * ΔH: the Hilbert series equals ∫ (1/P) Z + ΔH, where the correction ΔH only touches
 * operators of mass dimension <= 4 for the theories we ship (scalars, Weyl fermions and field
 * strengths in four dimensions; op. cit. sect. 4 and appendix); we therefore only report
 * dimensions >= 5, and every count is checked to be a non-negative integer.
 */
import type { Theory } from '../../../shared/schemas/theory'
import { EngineCancelledError, EngineInputError } from '../errors'
import { buildTheoryModel } from '../theory/model'
import { enumerateFieldContents } from './classes'
import { classKeyOfCounts } from '../theory/classKey'
import { CountContext, countFieldContent } from './contentCount'
import { checkCountBudget } from './budget'
import { CP_CONVENTION, CpContext, conjugateCounts, cpSplit, cpTrace, cpUnavailable, isSelfConjugate } from './cpCount'
import type { FieldContent } from './classes'

export interface CountOptions {
  maxDim: number
  /** Lowest dimension reported (default 5; must be >= 5). */
  minDim?: number
  /** Flavor number for every field that declares "flavors" (1..6). */
  nf?: number
  /**
   * Also return per-class flavor polynomials: coefficients of Nf^0, Nf^1, ... (rational strings),
   * Nf standing for the flavor number of every field that declares "flavors".
   */
  flavorPolynomials?: boolean
  onProgress?: (fraction: number, label: string) => void
  signal?: { aborted: boolean }
  /** Work budget in estimated cycle-index terms (default COUNT_WORK_BUDGET, see budget.ts). */
  workBudget?: number
  /** Also split the real parameters into CP-even and CP-odd ones (default true; cpCount.ts). */
  cp?: boolean
}

export interface DimensionCount {
  dimension: number
  operators: number
  classes: Record<string, number>
  flavorPolynomials?: Record<string, string[]>
  /** CP-even and CP-odd real parameters of the dimension (cpEven + cpOdd = operators). */
  cpEven?: number
  cpOdd?: number
  /**
   * Per class: a self-conjugate class lists its own split; a class with a distinct conjugate
   * class is listed once (under the first of the two) with the split of both together, n + n.
   */
  cp?: Record<string, CpEntry>
}

export interface CpEntry {
  even: number
  odd: number
  /** Key of the conjugate class counted in this entry (classes with a distinct conjugate). */
  conjugate?: string
}

export interface CountResult {
  theory: string
  byDimension: DimensionCount[]
  /** The CP convention of the cp fields (cpCount.ts). */
  cpConvention?: string
  /** Why the cp fields are absent, when they are. */
  cpUnavailable?: string
}

/** Highest mass dimension accepted (keeps class sizes n!/z and memory bounded). */
export const MAX_COUNT_DIMENSION = 16

/**
 * Count operators of dimensions minDim..maxDim (classes with a zero count are omitted; classes
 * appear in enumeration order: species multiplicities in theory-file order, then derivatives).
 * @example countOperators(smeft, { maxDim: 6, nf: 1 }).byDimension[1].operators // 84
 * Method: class by class (one field content at a time), cycle-index expansion of the
 * plethystic exponential, factorized Lorentz × SU(n) integrals cached per cycle type;
 * U(1) and Z_n enter as charge-sum selection rules. Reference: see the file header.
 */
export function countOperators(theory: Theory, options: CountOptions): CountResult {
  const { maxDim, minDim = 5 } = options
  if (!Number.isInteger(maxDim) || maxDim < 5 || maxDim > MAX_COUNT_DIMENSION) {
    throw new EngineInputError('countOperators', `The maximum dimension of a count must be a whole number from 5 to ${MAX_COUNT_DIMENSION}, not ${maxDim}`)
  }
  if (!Number.isInteger(minDim) || minDim < 5 || minDim > maxDim) {
    throw new EngineInputError('countOperators', `The lowest dimension must be a whole number from 5 to the maximum dimension ${maxDim}, not ${minDim}`)
  }
  if (theory.frame !== 'relativistic') {
    throw new EngineInputError('countOperators', `Theory "${theory.name}" uses the ${theory.frame} frame, which the Hilbert-series count does not cover; start a basis run instead`)
  }
  const model = buildTheoryModel(theory, { nf: options.nf })
  const contents = enumerateFieldContents(model, minDim, maxDim)
  checkCountBudget(model, contents, maxDim, options.workBudget)
  const ctx = new CountContext(model, maxDim)
  const cpReason = options.cp === false ? null : cpUnavailable(model)
  const cpCtx = options.cp === false || cpReason !== null ? null : new CpContext(model)
  const byDimension: DimensionCount[] = []
  for (let d = minDim; d <= maxDim; d++) {
    byDimension.push({
      dimension: d,
      operators: 0,
      classes: {},
      ...(options.flavorPolynomials ? { flavorPolynomials: {} } : {}),
      ...(cpCtx ? { cpEven: 0, cpOdd: 0, cp: {} } : {}),
    })
  }
  const total = contents.length
  for (let i = 0; i < total; i++) {
    if (options.signal?.aborted) throw new EngineCancelledError('operator count')
    if (options.onProgress && i % 64 === 0) options.onProgress(i / total, `class ${i + 1} of ${total}`)
    const content = contents[i]!
    const result = countFieldContent(ctx, content)
    for (let j = 0; j < content.derivatives.length; j++) {
      const count = result.counts[j]!
      if (count === 0n) continue
      const k = content.derivatives[j]!
      const dim = (content.fieldDim2 + 2 * k) / 2
      const entry = byDimension[dim - minDim]!
      const key = classKeyOfCounts(model, content.counts, k)
      entry.classes[key] = safeNumber(count, key)
      entry.operators = safeNumber(BigInt(entry.operators) + count, `dimension ${dim}`)
      if (entry.flavorPolynomials) entry.flavorPolynomials[key] = result.polynomials[j]!
      if (cpCtx) recordCp(cpCtx, entry, content, j, count, key)
    }
  }
  options.onProgress?.(1, 'done')
  const cpFields = cpCtx ? { cpConvention: CP_CONVENTION } : cpReason ? { cpUnavailable: cpReason } : {}
  return { theory: theory.name, byDimension, ...cpFields }
}

/** Add one class's CP split to its dimension (a conjugate pair once, under its first class). */
function recordCp(ctx: CpContext, entry: DimensionCount, content: FieldContent, j: number, count: bigint, key: string): void {
  const k = content.derivatives[j]!
  let split: CpEntry
  if (isSelfConjugate(ctx.model, content.counts)) split = cpSplit(count, cpTrace(ctx, content)[j]!, key)
  else {
    const conjugate = classKeyOfCounts(ctx.model, conjugateCounts(ctx.model, content.counts), k)
    if (entry.cp![conjugate]) return
    split = { even: Number(count), odd: Number(count), conjugate }
  }
  entry.cp![key] = split
  entry.cpEven! += split.even
  entry.cpOdd! += split.odd
}

function safeNumber(v: bigint, what: string): number {
  if (v > BigInt(Number.MAX_SAFE_INTEGER))
    throw new EngineInputError('countOperators', `The count for ${what} (${v}) grows beyond 2^53, past exact arithmetic; lower the maximum dimension or the number of flavors`)
  return Number(v)
}
