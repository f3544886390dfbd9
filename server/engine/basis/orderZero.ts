/**
 * Order 0 of a relativistic basis: the renormalizable Lagrangian (mass dimension ≤ 4).
 * Two-field terms (kinetic, gauge kinetic, θ, masses) are written out in orderZeroBilinears.ts;
 * classes of three and four fields without derivatives (cubic and quartic scalar couplings,
 * Yukawas) come from the same contact-amplitude selection as the higher orders, with
 * fingerprints, so the board's rewrite works on them. See ORDER_ZERO_NOTE for what is assumed.
 */
import type { Theory } from '../../../shared/schemas/theory'
import { EngineCancelledError, EngineInputError } from '../errors'
import { buildTheoryModel } from '../theory/model'
import { enumerateClasses } from '../counting/classes'
import { classBasis, type Priorities } from './classBasis'
import { basisSpecies } from './species'
import { conjugateClass, parseClassKey, type OperatorClass } from './classKey'
import { describeOperators, describeAlternative, type BasisOperator } from './describe'
import { orderZeroBilinears, type OrderZeroRole, type OrderZeroTerm } from './orderZeroBilinears'
import { notationColumnTerms } from '../notation/written'

export const ORDER_ZERO_NOTE =
  'Order 0 is the renormalizable Lagrangian (mass dimension ≤ 4). The equations of motion are not used here: ' +
  'the kinetic terms define them. Assumed: matter kinetic terms canonical (mixing of fields with equal quantum numbers removed by field redefinitions, so they carry no free parameter); ' +
  'gauge kinetic terms carry the couplings, and two abelian field strengths may mix (listed, since the charges are fixed); ' +
  'total derivatives dropped except the θ terms, kept as topological terms; the linear (tadpole) term of a singlet scalar removed by shifting the field; ' +
  'a mass term is listed only where it is invariant under every group of the theory, gauge and global. Real parameters count before field ' +
  'redefinitions (rephasings and flavour rotations) remove the unphysical ones.'

export interface OrderZeroClass {
  key: string
  conjugateKey: string
  dimension: number
  role: OrderZeroRole
  rank: number
  /** Real parameters, one flavour of every field. */
  realParameters: number
  /** Real parameters with the declared flavours; null where not computed (repeated flavoured fields). */
  flavorParameters: number | null
  message?: string
  operators: (BasisOperator & { role: OrderZeroRole; note?: string })[]
  alternatives: BasisOperator[]
}

export interface OrderZeroReport {
  note: string
  classes: OrderZeroClass[]
  realParameters: number
  flavorParameters: number | null
}

function roleOf(cls: OperatorClass): OrderZeroRole {
  const fermions = cls.legs.filter((p) => p.fermion).length
  if (fermions === 2 && cls.legs.length === 3) return 'Yukawa'
  if (fermions === 0 && cls.legs.length === 3) return 'cubic'
  if (fermions === 0 && cls.legs.length === 4) return 'quartic'
  return 'other'
}

/** A hand-written operator in the shape of the engine's (no spinor data, no fingerprint). */
function written(t: OrderZeroTerm): BasisOperator & { role: OrderZeroRole; note?: string } {
  return {
    text: t.text,
    latex: t.latex,
    latex4: null,
    source: 'kept',
    fields: [],
    derivatives: [],
    angle: [],
    square: [],
    gauge: [],
    hermitian: t.hermitian,
    realParameters: t.realParameters,
    flavorComponents: 1,
    cp: null,
    parity: null,
    role: t.role,
    ...(t.note ? { note: t.note } : {}),
  } as BasisOperator & { role: OrderZeroRole; note?: string }
}

/** Real parameters with declared flavours: each distinct flavoured field multiplies; repeated ones are not computed. */
function flavorParametersOf(cls: OperatorClass, realParameters: number): number | null {
  const fields = cls.legs.map((p) => p.field)
  const repeatedFlavored = cls.legs.some((p, i) => p.flavors > 1 && fields.indexOf(p.field) !== i)
  if (repeatedFlavored) return null
  const distinct = [...new Map(cls.legs.map((p) => [p.field, p.flavors])).values()]
  return realParameters * distinct.reduce((a, b) => a * b, 1)
}

/** Classes of three and four fields at dimension 3 and 4 without derivatives. */
function contactClasses(theory: Theory, opts: { priorities?: Priorities; signal?: { aborted: boolean } }): OrderZeroClass[] {
  const particles = basisSpecies(theory)
  const model = buildTheoryModel(theory, { nf: 1 })
  const done = new Set<string>()
  const out: OrderZeroClass[] = []
  for (const d of [3, 4]) {
    for (const c of enumerateClasses(model, d)) {
      if (opts.signal?.aborted) throw new EngineCancelledError('basis')
      if (c.derivatives > 0 || done.has(c.key)) continue
      const parsed = parseClassKey(particles, c.key, 1)
      if (parsed.legs.length < 3) continue
      const conj = conjugateClass(particles, parsed)
      const cls = conj.legs.filter((p) => p.conj).length < parsed.legs.filter((p) => p.conj).length ? conj : parsed
      const b = classBasis(theory, cls, { ...opts, printed: notationColumnTerms })
      done.add(b.key).add(b.conjugateKey)
      if (b.rank === 0) continue
      const primes = b.primes.map((pd) => pd.F.p)
      const role = roleOf(cls)
      const operators = describeOperators(b).map((op, i) => ({ ...op, role, fingerprint: { primes, values: b.primes.map((pd) => pd.keptRows.map((row) => row[i]!)) } }))
      const alternatives = b.alternatives.map(({ column, rows }) => ({ ...describeAlternative(b, column), fingerprint: { primes, values: rows } }))
      const realParameters = b.selfConjugate ? b.rank : 2 * b.rank
      out.push({ key: b.key, conjugateKey: b.conjugateKey, dimension: d, role, rank: b.rank, realParameters, flavorParameters: flavorParametersOf(cls, realParameters), operators, alternatives })
    }
  }
  return out
}

/**
 * The renormalizable operators of a relativistic theory, class by class.
 * @example orderZero(qed).classes.map(c => c.role) // ['kinetic', 'kinetic', 'gauge kinetic', 'mass'] (θ shares the gauge class)
 */
export function orderZero(theory: Theory, opts: { priorities?: Priorities; signal?: { aborted: boolean } } = {}): OrderZeroReport {
  if (theory.frame !== 'relativistic')
    throw new EngineInputError('orderZero', `Theory "${theory.name}" uses the ${theory.frame} frame; the renormalizable Lagrangian is enumerated this way for relativistic theories only`)
  const model = buildTheoryModel(theory, { nf: 1 })
  const byKey = new Map<string, OrderZeroClass>()
  for (const t of orderZeroBilinears(model, theory)) {
    const c = byKey.get(t.key) ?? { key: t.key, conjugateKey: t.conjugateKey, dimension: t.dimension, role: t.role, rank: 0, realParameters: 0, flavorParameters: 0, operators: [], alternatives: [] }
    c.rank += 1
    c.realParameters += t.realParameters
    c.flavorParameters = c.flavorParameters === null || t.flavorParameters === null ? null : c.flavorParameters + t.flavorParameters
    c.operators.push(written(t))
    byKey.set(t.key, c)
  }
  const classes = [...byKey.values(), ...contactClasses(theory, opts)]
  const realParameters = classes.reduce((s, c) => s + c.realParameters, 0)
  const flavorParameters = classes.some((c) => c.flavorParameters === null) ? null : classes.reduce((s, c) => s + c.flavorParameters!, 0)
  return { note: ORDER_ZERO_NOTE, classes, realParameters, flavorParameters }
}

export const HEAVY_ORDER_ZERO_NOTE =
  'Order 0 in the heavy-particle frame: the leading term ψ†iD_tψ of each heavy field (its rest mass removed by the phase ' +
  "redefinition ψ → e^{−imt}ψ, and its normalisation canonical) and the light fields' renormalizable Lagrangian, with the assumptions above."

/**
 * Order 0 of a heavy-frame theory: ψ†iD_tψ (and χ's) beside the light fields' renormalizable Lagrangian.
 * @example orderZeroHeavy(vexonium).classes[0].operators[0].text // "psi* iD_t psi"
 */
export function orderZeroHeavy(theory: Theory, opts: { signal?: { aborted: boolean } } = {}): OrderZeroReport {
  if (!theory.heavy) throw new EngineInputError('orderZeroHeavy', `Theory "${theory.name}" has no heavy particle; give it a "heavy" block or use the relativistic frame`)
  const light = orderZero({ ...theory, frame: 'relativistic', heavy: undefined }, opts)
  const names = [theory.heavy.particle.name, theory.heavy.antiparticle?.name].filter((n): n is string => !!n)
  const heavy = names.map((n): OrderZeroClass => {
    const t: OrderZeroTerm = {
      key: `${n}* ${n} (1/m^0)`,
      conjugateKey: `${n}* ${n} (1/m^0)`,
      dimension: 4,
      role: 'kinetic',
      text: `${n}* iD_t ${n}`,
      latex: `{${n}^{\\dagger}}\\,iD_t\\,${n}`,
      hermitian: true,
      realParameters: 0,
      flavorParameters: 0,
    }
    return { key: t.key, conjugateKey: t.key, dimension: 4, role: 'kinetic', rank: 1, realParameters: 0, flavorParameters: 0, operators: [written(t)], alternatives: [] }
  })
  return { note: `${light.note} ${HEAVY_ORDER_ZERO_NOTE}`, classes: [...heavy, ...light.classes], realParameters: light.realParameters, flavorParameters: light.flavorParameters }
}
