/**
 * The couplings a theory file gives its order-0 operators, resolved against the order-0 basis
 * the engine enumerates: each names a class of the basis (either orientation, fields in any
 * order) and one of its KEPT operators (the text may be left out when the class keeps one).
 * A coupling on an operator the basis does not have is an input error that names it and lists
 * what the class does have. Tree-level matching writes its coefficients in these symbols.
 */
import type { Theory } from '../../../shared/schemas/theory'
import type { CouplingValue } from '../../../shared/schemas/couplings'
import { normalizeSpaces } from '../../../shared/schemas/couplings'
import { EngineInputError } from '../errors'
import { readClassKey } from '../theory/classKey'
import { orderZero, orderZeroHeavy, type OrderZeroClass, type OrderZeroReport } from './orderZero'

export interface ResolvedCoupling {
  /** The class key as the basis writes it, and the kept operator's text. */
  classKey: string
  operator: string
  symbol: string
  value?: CouplingValue
}

/** Fields in any order, powers or repeats: "S H H*" = "H* S H"; a key the reader cannot parse compares as text. */
function classSignature(key: string): string {
  try {
    const { derivatives, blocks } = readClassKey(key)
    return `${derivatives}|${blocks
      .map((b) => `${b.label}^${b.power}`)
      .sort()
      .join(' ')}`
  } catch {
    return normalizeSpaces(key)
  }
}

function findClass(report: OrderZeroReport, key: string): OrderZeroClass | undefined {
  const want = classSignature(key)
  return report.classes.find((c) => classSignature(c.key) === want || classSignature(c.conjugateKey) === want)
}

function resolveOne(report: OrderZeroReport, c: NonNullable<Theory['couplings']>[number]): ResolvedCoupling | string {
  const cls = findClass(report, c.class)
  const where = `Coupling "${c.symbol}"`
  if (!cls) return `${where}: the order-0 basis has no class "${c.class}" (its classes are ${report.classes.map((k) => k.key).join(', ')}); name one of them`
  const kept = cls.operators.map((o) => o.text)
  if (c.operator === undefined) {
    if (kept.length === 1) return { classKey: cls.key, operator: kept[0]!, symbol: c.symbol, ...(c.value ? { value: c.value } : {}) }
    return `${where}: the class "${cls.key}" keeps ${kept.length} operators (${kept.join('; ')}); say which one with "operator"`
  }
  const text = normalizeSpaces(c.operator)
  const hit = kept.find((t) => normalizeSpaces(t) === text)
  if (hit !== undefined) return { classKey: cls.key, operator: hit, symbol: c.symbol, ...(c.value ? { value: c.value } : {}) }
  const setAside = cls.alternatives.some((o) => normalizeSpaces(o.text) === text)
  const why = setAside ? 'is set aside in this basis (a redundant alternative)' : 'is not an operator of this class'
  return `${where}: "${c.operator}" ${why}; the class "${cls.key}" keeps ${kept.join('; ')}`
}

/**
 * Every coupling of the theory, resolved; throws one EngineInputError listing every problem.
 * @example resolveCouplings(toy) // [{ classKey: 'S H H*', operator: '1', symbol: 'mu' }]
 */
export function resolveCouplings(theory: Theory, opts: { signal?: { aborted: boolean } } = {}): ResolvedCoupling[] {
  const couplings = theory.couplings ?? []
  if (couplings.length === 0) return []
  if (theory.frame === 'goldstone') throw new EngineInputError('resolveCouplings', 'Couplings name order-0 operators of the relativistic or heavy-particle frame; remove them, or change the frame')
  const report = theory.frame === 'heavy' ? orderZeroHeavy(theory, opts) : orderZero(theory, opts)
  const results = couplings.map((c) => resolveOne(report, c))
  const problems = results.filter((r): r is string => typeof r === 'string')
  if (problems.length) throw new EngineInputError('resolveCouplings', problems.join('\n'))
  return results as ResolvedCoupling[]
}
