/**
 * The gauge factors a heavy particle sees: every gauge group under which it is charged (U(1))
 * or sits in the fundamental or antifundamental (SU(N), at most one such group), plus the
 * abelian field strengths the roster declares for groups it is neutral under (their E and B
 * still couple, e.g. through a magnetic moment). Non-abelian fields of groups it does not feel
 * would enter only through colour traces of their own and are not included (stated in the note).
 */
import { EngineInputError } from '../errors'
import type { HeavyFrame } from '../../../shared/schemas/heavyFrame'
import type { GaugeFactor, GaugeSetup } from './symbol'
import { lorentzKind, type TheoryFieldLike, type TheoryGroupLike } from './lightFields'

export interface HeavyGauge {
  setup: GaugeSetup
  /** Group name per factor (same order as setup.factors). */
  names: string[]
  /** Coupled to at least one gauge field. */
  charged: boolean
  colorN: number
  /** Non-abelian field strengths in the roster for groups the particle does not feel. */
  unseen: string[]
}

function isZeroCharge(q: string | number | undefined): boolean {
  return q === undefined || /^\s*-?0+(\s*\/\s*\d+)?\s*$/.test(String(q))
}

function fundamental(heavy: HeavyFrame, g: TheoryGroupLike): boolean {
  const n = g.n ?? 0
  const labels = heavy.particle.reps?.[g.name]
  if (!labels || labels.every((x) => x === 0)) return false
  const ok = labels.length === n - 1 && labels.reduce((a, b) => a + b, 0) === 1 && (labels[0] === 1 || labels[n - 2] === 1)
  if (!ok) throw new EngineInputError('enumerateHeavy', `The heavy particle must be a fundamental or an antifundamental of SU(${n}), but its Dynkin labels are [${labels.join(',')}]`)
  return true
}

/**
 * The heavy particle's gauge setup from its groups, charges and representations.
 * @example heavyGaugeSetup(qcdAndQed).names // ["C", "QED"]: SU(3) first, then U(1)
 */
export function heavyGaugeSetup(heavy: HeavyFrame, groups: readonly TheoryGroupLike[] | undefined, fields: readonly TheoryFieldLike[] = []): HeavyGauge {
  const primary = groups?.find((x) => x.name === heavy.gaugeGroup)
  if (groups && !primary) throw new EngineInputError('enumerateHeavy', `The heavy particle couples to "${heavy.gaugeGroup}", which is not a symmetry of the theory; choose one of its gauge groups`)
  if (primary && primary.type !== 'U1' && primary.type !== 'SU') {
    throw new EngineInputError(
      'enumerateHeavy',
      `The heavy particle couples to "${heavy.gaugeGroup}", a ${primary.type === 'Z' ? `discrete Z_${primary.n ?? 'n'}` : primary.type} group; it needs a U(1) or SU(N) gauge group`,
    )
  }
  const all = groups ?? [{ name: heavy.gaugeGroup, type: 'U1', gauge: true }]
  const su: Array<{ name: string; n: number }> = []
  const u1: string[] = []
  for (const g of all) {
    if (g.gauge === false && g.name !== heavy.gaugeGroup) continue
    if (g.type === 'SU' && fundamental(heavy, g)) su.push({ name: g.name, n: g.n ?? 0 })
    if (g.type === 'U1' && !isZeroCharge(heavy.particle.charges?.[g.name])) u1.push(g.name)
  }
  if (su.length > 1) {
    throw new EngineInputError(
      'enumerateHeavy',
      `The heavy particle is charged under two non-abelian groups (${su.map((s) => s.name).join(', ')}); one SU(N) together with any number of U(1) groups is supported`,
    )
  }
  const strengths = fields.filter((f) => lorentzKind(f) === 'strength').map((f) => (f as { gaugeOf?: string }).gaugeOf)
  const external = all.filter((g) => g.type === 'U1' && !u1.includes(g.name) && strengths.includes(g.name)).map((g) => g.name)
  const unseen = all.filter((g) => g.type === 'SU' && !su.some((s) => s.name === g.name) && strengths.includes(g.name)).map((g) => g.name)
  const factors: GaugeFactor[] = [
    ...su.map((): GaugeFactor => ({ kind: 'su', coupled: true })),
    ...u1.map((): GaugeFactor => ({ kind: 'u1', coupled: true })),
    ...external.map((): GaugeFactor => ({ kind: 'u1', coupled: false })),
  ]
  const colorN = su[0]?.n ?? 1
  return { setup: { colorN, factors }, names: [...su.map((s) => s.name), ...u1, ...external], charged: su.length + u1.length > 0, colorN, unseen }
}
