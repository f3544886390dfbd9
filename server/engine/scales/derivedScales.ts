/**
 * Derived scales of a ladder: a base scale times a factor times powers of expansion
 * parameters (e.g. the Rydberg energy ½ m_e α², the Bohr momentum m_e α).
 */
import { EngineInputError } from '../errors'
import { div, mul, parseRational, rat, toString as ratText, type Rational } from '../exact/rational'
import { parseDecimal, rationalToNumber } from './decimal'
import type { DerivedScaleInput } from '../../../shared/schemas/scaleLadder'
import { fromMeV, isLengthUnit, UNIT_POWER_OF_TEN } from './units'

export interface ResolvedScale {
  kind: 'energy' | 'length'
  valueMeV: number
  native?: Rational
}
export interface ParameterValue {
  value: number
  exact?: Rational
}
export interface DerivedScale {
  name: string
  from: string
  value: number
  unit: string
  valueMeV: number
  exactMeV?: string
}

/** r^k for an integer k (negative powers invert). */
export function powRational(r: Rational, k: number): Rational {
  let out = rat(1)
  for (let i = 0; i < Math.abs(k); i++) out = mul(out, r)
  return k >= 0 ? out : div(rat(1), out)
}

function factorOf(f: number | string | undefined): ParameterValue {
  if (f === undefined) return { value: 1, exact: rat(1) }
  if (typeof f === 'number') return { value: f }
  const exact = f.includes('/') ? parseRational(f) : parseDecimal(f)
  return { value: rationalToNumber(exact), exact }
}

/**
 * The value of a derived scale in MeV (exact when the base is an exact energy and every factor is exact).
 * @example derivedScale({ name: 'Ry', from: 'me', factor: '1/2', powers: { alpha: 2 }, unit: 'eV' }, scales, params).value // 13.605693
 * Method: product of the base scale, the factor and the parameter powers.
 * Reference: common practice (natural units; e.g. hydrogen: Rydberg energy ½ m_e α², CODATA 2018).
 */
export function derivedScale(d: DerivedScaleInput, scales: Map<string, ResolvedScale>, params: Map<string, ParameterValue>): DerivedScale {
  const base = scales.get(d.from)
  if (!base) throw new EngineInputError('buildScaleLadder', `Derived scale "${d.name}" starts from "${d.from}", which is not a scale of the ladder; choose one of its scales`)
  const f = factorOf(d.factor)
  if (!(f.value > 0)) throw new EngineInputError('buildScaleLadder', `Derived scale "${d.name}" needs a positive factor, but the factor is ${d.factor}`)
  let valueMeV = base.valueMeV * f.value
  let exact = base.kind === 'energy' && base.native && f.exact ? mul(base.native, f.exact) : undefined
  for (const [name, k] of Object.entries(d.powers)) {
    const p = params.get(name)
    if (!p) throw new EngineInputError('buildScaleLadder', `Derived scale "${d.name}" uses the expansion parameter "${name}", which the ladder does not declare; add it or correct the name`)
    valueMeV *= p.value ** k
    exact = exact && p.exact ? mul(exact, powRational(p.exact, k)) : undefined
  }
  const unit = d.unit ?? 'MeV'
  const value = fromMeV(valueMeV, unit)
  const out: DerivedScale = { name: d.name, from: d.from, value, unit, valueMeV }
  if (exact && !isLengthUnit(unit)) {
    const p = UNIT_POWER_OF_TEN[unit]
    const inUnit = p >= 0 ? div(exact, rat(10n ** BigInt(p))) : mul(exact, rat(10n ** BigInt(-p)))
    return { ...out, value: rationalToNumber(inUnit), exactMeV: ratText(exact) }
  }
  return out
}
