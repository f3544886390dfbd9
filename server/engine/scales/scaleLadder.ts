/**
 * Scale ladder of a theory: its physical scales in one unit, the expansion parameters built
 * as ratios of scales (or of literal numbers), and the estimated size of each order.
 */
import { EngineInputError } from '../errors'
import { describeIssue, describeZodError } from '../../../shared/schemas/describeZodError'
import { div, mul, ONE, parseRational, rat, toString as ratText, type Rational } from '../exact/rational'
import { parseDecimal, rationalToNumber } from './decimal'
import { OrderListSchema, ScaleLadderInputSchema, type ExpansionParameterInput, type OrderSpec, type ScaleInput, type ScaleLadderInput } from '../../../shared/schemas/scaleLadder'
import { isLengthUnit, toMeV, UNIT_POWER_OF_TEN } from './units'
import { ladderOverBudget, overBudgetMessage } from '../../../shared/schemas/ladderBudget'
import { derivedScale, powRational, type DerivedScale, type ResolvedScale } from './derivedScales'

export interface LadderScale {
  name: string
  value: number
  unit: string
  valueMeV: number
  /** Exact value in MeV (energy units given as text), as "p/q"; absent for lengths and floats. */
  exactMeV?: string
}
export interface LadderParameter {
  name: string
  value: number
  exact?: string
}
export interface LadderOrder {
  order: number | string
  estimate: number
  exactEstimate?: string
  belowTarget: boolean
}
export interface ScaleLadder {
  scales: LadderScale[]
  derived: DerivedScale[]
  parameters: LadderParameter[]
  orders: LadderOrder[]
  precisionTarget?: number
  countingParameter?: string
  /** The order estimated as 1 when it is not order 0 (2: the p² Lagrangian of a Goldstone-frame theory). */
  leadingOrder?: number
}

/** Exact rational of a literal given as text; numbers stay numeric (undefined). */
function literal(v: number | string): { value: number; exact?: Rational } {
  if (typeof v === 'number') return { value: v }
  const exact = v.includes('/') ? parseRational(v) : parseDecimal(v)
  return { value: rationalToNumber(exact), exact }
}

function resolveScale(s: ScaleInput): ResolvedScale {
  const { value, exact } = literal(s.value)
  const valueMeV = toMeV(value, s.unit)
  const p = UNIT_POWER_OF_TEN[s.unit]
  const tenPow = p >= 0 ? rat(10n ** BigInt(p)) : rat(1n, 10n ** BigInt(-p))
  const native = exact ? mul(exact, tenPow) : undefined
  return { kind: isLengthUnit(s.unit) ? 'length' : 'energy', valueMeV, native }
}

/** One side of a ratio: a scale (by name) or a literal number. */
function side(p: ExpansionParameterInput, v: number | string, scales: Map<string, ResolvedScale>) {
  if (typeof v === 'string' && scales.has(v)) return { scale: scales.get(v)! }
  if (typeof v === 'string' && !/^[\s\d+\-./eE]+$/.test(v)) {
    throw new EngineInputError('buildScaleLadder', `Expansion parameter "${p.name}": "${v}" is neither the name of a scale nor a number; name a scale of the ladder or write a number`)
  }
  return { lit: literal(v) }
}

function resolveParameter(p: ExpansionParameterInput, scales: Map<string, ResolvedScale>): { value: number; exact?: Rational } {
  const a = side(p, p.numerator, scales)
  const b = side(p, p.denominator, scales)
  if (a.lit && b.lit) {
    if (b.lit.value === 0) throw new EngineInputError('buildScaleLadder', `Expansion parameter "${p.name}" divides by zero; give it a non-zero denominator`)
    return { value: a.lit.value / b.lit.value, exact: a.lit.exact && b.lit.exact ? div(a.lit.exact, b.lit.exact) : undefined }
  }
  if (!a.scale || !b.scale) {
    throw new EngineInputError(
      'buildScaleLadder',
      `Expansion parameter "${p.name}" mixes a scale with a plain number (${p.numerator} / ${p.denominator}); a ratio must be dimensionless, so divide a scale by a scale or a number by a number`,
    )
  }
  const value = a.scale.valueMeV / b.scale.valueMeV
  if (!a.scale.native || !b.scale.native || a.scale.kind !== b.scale.kind) return { value }
  // Lengths are inverse energies: E_a / E_b = L_b / L_a.
  const exact = a.scale.kind === 'energy' ? div(a.scale.native, b.scale.native) : div(b.scale.native, a.scale.native)
  return { value, exact }
}

function estimateOrder(spec: OrderSpec, params: Map<string, { value: number; exact?: Rational }>, counting: string | undefined, leading: number, target?: number): LadderOrder {
  const powers = typeof spec === 'number' ? countingPowers(spec, counting, leading) : spec.powers
  let estimate = 1
  let exact: Rational | undefined = ONE
  for (const [name, k] of Object.entries(powers)) {
    const p = params.get(name)
    if (!p)
      throw new EngineInputError(
        'buildScaleLadder',
        `Order ${typeof spec === 'number' ? spec : spec.order} uses the expansion parameter "${name}", which the ladder does not declare; add it or correct the name`,
      )
    estimate *= p.value ** k
    exact = exact && p.exact ? mul(exact, powRational(p.exact, k)) : undefined
  }
  const order = typeof spec === 'number' ? spec : spec.order
  const belowTarget = target !== undefined && Math.abs(estimate) < target
  return exact ? { order, estimate, exactEstimate: ratText(exact), belowTarget } : { order, estimate, belowTarget }
}

function countingPowers(n: number, counting: string | undefined, leading: number): Record<string, number> {
  if (n === leading) return {}
  if (!counting) throw new EngineInputError('buildScaleLadder', `Order ${n} needs an expansion parameter to be estimated, but the ladder has none; add one (e.g. E/M)`)
  if (n < leading)
    throw new EngineInputError(
      'buildScaleLadder',
      `Order ${n} lies below the leading order ${leading} of this theory's power counting (a Goldstone-frame theory starts at p²); list orders from ${leading} up`,
    )
  return { [counting]: n - leading }
}

/** How plain orders are estimated: order n is ε^(n − leadingOrder) (0 in general; 2 in the Goldstone frame, see shared/physics/leadingOrder.ts). */
export interface LadderCounting {
  leadingOrder?: number
}

/**
 * The scale ladder: scales sorted from highest to lowest energy, expansion parameters, and per
 * order its estimated size (product of the parameters to their powers; a plain order n under
 * the counting parameter ε is ε^(n − leadingOrder), e.g. (E/M)^n, or (p/Λ_χ)^(k−2) for the chiral
 * order p^k of a Goldstone-frame theory) flagged when below the precision target.
 * @example buildScaleLadder({ scales: [{ name: 'E', value: '1', unit: 'GeV' }, { name: 'M', value: '1', unit: 'TeV' }],
 *   parameters: [{ name: 'eps', numerator: 'E', denominator: 'M' }], precisionTarget: 1e-5 }, [1, 2])
 *   // orders: [{ order: 1, estimate: 1e-3, exactEstimate: '1/1000', belowTarget: false }, { order: 2, estimate: 1e-6, exactEstimate: '1/1000000', belowTarget: true }]
 * Method: naive dimensional analysis with O(1) coefficients; exact rationals when every input is printed text.
 * Reference: common practice of EFT power counting (e.g. H. Georgi, Annu. Rev. Nucl. Part. Sci. 43 (1993) 209).
 */
export function buildScaleLadder(input: ScaleLadderInput, orders: OrderSpec[], rule: LadderCounting = {}): ScaleLadder {
  const parsed = ScaleLadderInputSchema.safeParse(input)
  if (!parsed.success) throw new EngineInputError('buildScaleLadder', describeZodError(parsed.error, input, 'the scale ladder'))
  const ords = OrderListSchema.safeParse(orders)
  if (!ords.success) throw new EngineInputError('buildScaleLadder', ords.error.issues.map((i) => describeIssue({ path: ['orders', ...i.path], message: i.message }, { orders })).join('; '))
  const inp = parsed.data
  const over = ladderOverBudget({ ...inp, orders: ords.data })
  if (over.length) throw new EngineInputError('buildScaleLadder', overBudgetMessage(over[0]!))
  const scales = new Map<string, ResolvedScale>()
  for (const s of inp.scales) {
    if (scales.has(s.name)) throw new EngineInputError('buildScaleLadder', `Two scales are named "${s.name}"; give each scale its own name`)
    scales.set(s.name, resolveScale(s))
  }
  const params = new Map<string, { value: number; exact?: Rational }>()
  for (const p of inp.parameters) {
    if (params.has(p.name) || scales.has(p.name)) throw new EngineInputError('buildScaleLadder', `The name "${p.name}" is used twice among the scales and expansion parameters; give each its own name`)
    params.set(p.name, resolveParameter(p, scales))
  }
  const counting = inp.countingParameter ?? inp.parameters[0]?.name
  if (inp.countingParameter && !params.has(inp.countingParameter)) {
    throw new EngineInputError('buildScaleLadder', `The counting parameter "${inp.countingParameter}" is not one of the ladder's expansion parameters; choose one of them`)
  }
  return {
    scales: inp.scales.map((s) => ladderScale(s, scales.get(s.name)!)).sort((a, b) => b.valueMeV - a.valueMeV),
    derived: derivedScales(inp, scales, params),
    parameters: [...params].map(([name, p]) => (p.exact ? { name, value: p.value, exact: ratText(p.exact) } : { name, value: p.value })),
    orders: ords.data.map((o) => estimateOrder(o, params, counting, rule.leadingOrder ?? 0, inp.precisionTarget)),
    ...(inp.precisionTarget !== undefined ? { precisionTarget: inp.precisionTarget } : {}),
    ...(counting ? { countingParameter: counting } : {}),
    ...(rule.leadingOrder ? { leadingOrder: rule.leadingOrder } : {}),
  }
}

function derivedScales(inp: ScaleLadderInput, scales: Map<string, ResolvedScale>, params: Map<string, { value: number; exact?: Rational }>): DerivedScale[] {
  const seen = new Set<string>()
  return (inp.derived ?? []).map((d) => {
    if (seen.has(d.name) || scales.has(d.name) || params.has(d.name))
      throw new EngineInputError('buildScaleLadder', `The name "${d.name}" is used twice among the scales, expansion parameters and derived scales; give each its own name`)
    seen.add(d.name)
    return derivedScale(d, scales, params)
  })
}

function ladderScale(s: ScaleInput, r: ResolvedScale): LadderScale {
  const base = { name: s.name, value: typeof s.value === 'number' ? s.value : rationalToNumber(literal(s.value).exact!), unit: s.unit, valueMeV: r.valueMeV }
  return r.kind === 'energy' && r.native ? { ...base, exactMeV: ratText(r.native) } : base
}
