/**
 * The size budget of a scale ladder's exact arithmetic. Estimates are exact rationals when every
 * input is text; their digits grow with the digits of the inputs times the powers, and bigint
 * arithmetic on them grows faster still. The budget is checked before anything is computed.
 */

/** The parts of a ladder (input and orders) the budget reads. */
export interface LadderDocumentShape {
  scales: { name: string; value: number | string }[]
  parameters: { name: string; numerator: number | string; denominator: number | string }[]
  derived?: { name: string; from: string; factor?: number | string; powers: Record<string, number> }[]
  orders: (number | { order: number | string; powers: Record<string, number> })[]
  countingParameter?: string
}

/** Digits (numerator and denominator together) an exact number of the ladder may have. */
export const MAX_EXACT_DIGITS = 2_000

const DECIMAL = /^\s*[+-]?(\d+)(?:\.(\d*))?(?:[eE]([+-]?\d+))?\s*$/
const RATIO = /^\s*[+-]?(\d+)\s*\/\s*[+-]?(\d+)\s*$/

/** Digits of the exact rational a literal stands for (0 for a plain JS number: no exact value). */
export function literalDigits(v: number | string): number {
  if (typeof v === 'number') return 0
  const r = RATIO.exec(v)
  if (r) return r[1]!.length + r[2]!.length
  const m = DECIMAL.exec(v)
  if (!m) return 0
  const frac = m[2] ?? ''
  return m[1]!.length + frac.length + Math.abs(Number(m[3] ?? '0') - frac.length)
}

/** One exact number over budget: where it is and about how many digits it would have. */
export interface OverBudget {
  path: (string | number)[]
  what: string
  digits: number
}

function powersDigits(powers: Record<string, number>, params: Map<string, number>) {
  return Object.entries(powers).reduce((sum, [name, k]) => sum + Math.abs(k) * (params.get(name) ?? 0), 0)
}

/**
 * Every number of the ladder whose exact value would exceed MAX_EXACT_DIGITS (first ones only),
 * estimated from the inputs' digits: a ratio adds its sides, a power multiplies.
 */
export function ladderOverBudget(doc: LadderDocumentShape): OverBudget[] {
  const scales = new Map(doc.scales.map((s) => [s.name, literalDigits(s.value) + 15]))
  const side = (v: number | string) => (typeof v === 'string' && scales.has(v) ? scales.get(v)! : literalDigits(v))
  const params = new Map(doc.parameters.map((p) => [p.name, side(p.numerator) + side(p.denominator)]))
  const counting = doc.countingParameter ?? doc.parameters[0]?.name
  const out: OverBudget[] = []
  doc.parameters.forEach((p, i) => out.push({ path: ['parameters', i], what: `parameter "${p.name}"`, digits: params.get(p.name)! }))
  ;(doc.derived ?? []).forEach((d, i) =>
    out.push({
      path: ['derived', i],
      what: `derived scale "${d.name}"`,
      digits: (scales.get(d.from) ?? 0) + literalDigits(d.factor ?? 1) + powersDigits(d.powers, params),
    }),
  )
  doc.orders.forEach((o, i) =>
    out.push({
      path: ['orders', i],
      what: `order ${typeof o === 'object' ? o.order : o}`,
      digits: typeof o === 'object' ? powersDigits(o.powers, params) : o * (counting ? (params.get(counting) ?? 0) : 0),
    }),
  )
  return out.filter((o) => o.digits > MAX_EXACT_DIGITS)
}

/** The message for a number over budget, in the user's terms. */
export function overBudgetMessage(o: OverBudget): string {
  return (
    `${o.what} would be an exact number of about ${o.digits.toLocaleString('en')} digits; the limit is ${MAX_EXACT_DIGITS.toLocaleString('en')}. ` +
    'Write the numbers with fewer digits, use smaller powers, or give the values as plain numbers (not text) for a floating-point estimate'
  )
}
