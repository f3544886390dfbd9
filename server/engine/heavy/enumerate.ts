/**
 * Heavy-particle (non-relativistic) frame: enumeration of the bilinear operators ψ† … ψ order
 * by order in 1/m, modulo the heavy field's EOM and integration by parts, and — when the
 * antiparticle field is present — the enumerated four-fermion contact sector ψ†ψ χ†χ at 1/m²
 * and 1/m⁴ (fourFermion.ts).
 *
 * What "modulo EOM" removes: every operator with D_t acting on ψ (X·D_t ψ) or, after
 * integration by parts, on ψ† — the leading-order field equation is iD_tψ = 0. Such
 * operators are traded by the field redefinition ψ → ψ + (X/m^k)ψ for operators of higher
 * order in 1/m, so the basis at each order is unchanged by the choice. Time derivatives that
 * survive act between the ψ's only through ℰ = [D_t, D] (E) or ∂_t of a field strength. The
 * gauge field's own EOM (Maxwell) is NOT used; see ConventionalOperator.gaugeEomNote.
 */
import { EngineCancelledError, EngineInputError } from '../errors'
import type { CancelFlag } from '../finite'
import type { Rational } from '../exact/rational'
import type { HeavyFrame } from '../../../shared/schemas/heavyFrame'
import { CONVENTIONAL_OPERATORS, LEADING_OPERATOR, NONABELIAN_OPERATORS, printedLatex } from './conventional'
import { comboLatex, structureBlocks } from './display'
import { orderSpace, orderSpaceFor, type SpaceConfig } from './orderSpace'
import { heavyGaugeSetup, type HeavyGauge } from './gaugeSetup'
import { enumerateHeavyHeavy, HEAVY_HEAVY_NOTE, type HeavyHeavyOrder } from './heavyHeavy'
import { expandCombo, type Combo } from './structure'
import { antiparticleCopy, ANTIPARTICLE_CONVENTION } from './antiparticle'
import { publishedOperators } from './published'
import { enumerateFourFermion, FOUR_FERMION_NOTE, type FourFermionOrder } from './fourFermion'
import { enumerateHeavyLight, HEAVY_LIGHT_NOTE, type HeavyLightClass } from './heavyLight'
import { lorentzKind, type TheoryFieldLike } from './lightFields'
import type { HeavyOperator } from './heavyOperator'

export type { HeavyOperator }

export interface HeavyOrder {
  order: number
  count: number
  basis: HeavyOperator[]
  /** The published operators of this order and whether they span exactly the same space. */
  conventional: HeavyOperator[]
  conventionalSpansBasis: boolean | null
  /** How many of the published operators are redundant here (e.g. d-symbol terms for SU(2)). */
  conventionalRedundant: number
  candidates: number
  relationRank: number
  /** With an antiparticle field: the χ-bilinears, coefficients fixed by charge conjugation (or CPT). */
  antiparticle: HeavyOperator[]
}

export interface HeavyEnumeration {
  particle: string
  antiparticle?: string
  charged: boolean
  /** Colour dimension: 1 for an abelian gauge field, N for SU(N). */
  colorN: number
  /** The gauge factors whose field strengths appear, in the order of the letters' factor index. */
  gaugeGroups: Array<{ name: string; kind: 'su' | 'u1'; coupled: boolean }>
  /** Which discrete symmetries were imposed on the operators. */
  symmetries: { parity: boolean; timeReversal: boolean }
  leading: HeavyOperator
  orders: HeavyOrder[]
  /** Enumerated four-fermion basis, all orders (1/m², and 1/m⁴ when maxOrder = 4). */
  fourFermion: HeavyOperator[]
  /** Per order: counts (also in the rest frame and without C) and the published operators checked. */
  fourFermionOrders: FourFermionOrder[]
  fourFermionNote?: string
  /** Two-particle contact operators (ψ†ψ)(ψ†ψ) at 1/m² and 1/m⁴. */
  heavyHeavy: HeavyHeavyOrder[]
  heavyHeavyNote: string
  /** Heavy–light contact operators per order and light content. */
  heavyLight: HeavyLightClass[]
  heavyLightNote?: string
  eomNote: string
  /** The antiparticle convention (stated on the board and in exports), when χ is present. */
  antiparticleNote?: string
}

export interface HeavyInput {
  heavy: HeavyFrame
  groups?: ReadonlyArray<{ name: string; type: string; n?: number; gauge?: boolean }>
  /** The theory's roster: its light scalars and fermions couple through heavy–light operators. */
  fields?: readonly TheoryFieldLike[]
}

export interface HeavyOptions {
  onProgress?: (fraction: number, label: string) => void
  signal?: CancelFlag
}

const EOM_NOTE =
  'Removed by the heavy-field EOM iD_tψ = 0: every operator with D_t acting on ψ or (by parts) on ψ†; ' +
  'their effect is moved to higher orders by a field redefinition. Antisymmetric [D_i, D_j] is written as B ' +
  "and [D_t, D_i] as E. The gauge field's own EOM is not used."

function termsOf(c: Combo, field: string): Array<Record<string, number>> {
  const seen = new Map<string, Record<string, number>>()
  for (const t of c) {
    const b = structureBlocks(t.s, field)
    seen.set(JSON.stringify(Object.entries(b).sort()), b)
  }
  return [...seen.values()]
}

/**
 * Enumerate the heavy-frame operator basis order by order up to heavy.maxOrder (≤ 4).
 * @example enumerateHeavy({ heavy: { particle: { name: 'psi', charges: { X: '1' } }, gaugeGroup: 'X', maxOrder: 2 } })
 *   .orders.map((o) => o.count) // [2, 2]  (D², σ·B; Darwin, spin–orbit)
 * Method: rotation-scalar candidates (parity even unless P is switched off) completed to Hermitian,
 * T-even (unless switched off) operators;
 * independence modulo EOM + IBP from their gauge-field symbols (0, 1, 2 insertions) over two
 * primes; greedy basis. Four-fermion operators (with an antiparticle): rank of the contact
 * vertex, see enumerateFourFermion; two-particle and heavy–light operators likewise (heavyHeavy.ts,
 * heavyLight.ts). Reference: Caswell, Lepage, Phys. Lett. B 167 (1986) 437;
 * Manohar, Phys. Rev. D 56 (1997) 230; Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125.
 */
export function enumerateHeavy(input: HeavyInput, opts: HeavyOptions = {}): HeavyEnumeration {
  const { heavy } = input
  const gauge = heavyGaugeSetup(heavy, input.groups, input.fields)
  const { charged, colorN } = gauge
  const config: SpaceConfig = { setup: gauge.setup, parity: heavy.imposeParity !== false, timeReversal: heavy.imposeTimeReversal !== false }
  const field = heavy.particle.name
  const orders: HeavyOrder[] = []
  for (let n = 1; n <= heavy.maxOrder; n++) {
    if (opts.signal?.aborted) throw new EngineCancelledError('heavy enumeration')
    opts.onProgress?.((n - 1) / heavy.maxOrder, `order 1/m^${n}`)
    orders.push(bilinearOrder(n, input, gauge, config, opts.signal))
  }
  const anti = heavy.antiparticle?.name
  const ffOrders = anti ? [2, 4].filter((n) => n <= heavy.maxOrder) : []
  const fourFermionOrders = ffOrders.map((n) => {
    opts.onProgress?.(heavy.maxOrder / (heavy.maxOrder + 1), `four-fermion 1/m^${n}`)
    return enumerateFourFermion(n, colorN, field, anti!, opts.signal, config.timeReversal)
  })
  opts.onProgress?.(1, 'done')
  return {
    particle: field,
    antiparticle: anti,
    charged,
    colorN,
    gaugeGroups: gauge.names.map((name, i) => ({ name, kind: gauge.setup.factors[i]!.kind, coupled: gauge.setup.factors[i]!.coupled })),
    symmetries: { parity: config.parity, timeReversal: config.timeReversal },
    leading: { ...LEADING_OPERATOR, latex: printedLatex(LEADING_OPERATOR.latex, field), sector: 'leading', terms: [{ [field]: 1, [`${field}*`]: 1, D_t: 1 }] },
    orders,
    fourFermion: fourFermionOrders.flatMap((o) => [...o.basis, ...o.fieldStrength]),
    fourFermionOrders,
    fourFermionNote: anti ? FOUR_FERMION_NOTE + (config.parity ? '' : PARITY_ODD_CONTACT) : undefined,
    heavyHeavy: [2, 4].filter((n) => n <= heavy.maxOrder).map((n) => enumerateHeavyHeavy(n, colorN, field, config.timeReversal, opts.signal)),
    heavyHeavyNote: HEAVY_HEAVY_NOTE + (anti ? ' The antiparticle pair (χ†χ)(χ†χ) follows by charge conjugation and is not listed.' : '') + (config.parity ? '' : PARITY_ODD_CONTACT),
    ...heavyLightPart(input, opts.signal),
    eomNote:
      EOM_NOTE +
      (gauge.unseen.length
        ? ` Field strengths of ${gauge.unseen.join(', ')} (non-abelian groups the heavy particle does not feel) would enter through colour traces of their own and are not included.`
        : ''),
    antiparticleNote: anti ? ANTIPARTICLE_CONVENTION : undefined,
  }
}

/** The ψ-bilinears of one order, the published cards where the literature has a list, and χ's copies. */
function bilinearOrder(n: number, input: HeavyInput, gauge: HeavyGauge, config: SpaceConfig, signal?: CancelFlag): HeavyOrder {
  const { heavy } = input
  const field = heavy.particle.name
  const os = orderSpaceFor(n, config, signal)
  const names = gauge.setup.factors.length > 1 ? gauge.names : undefined
  const basis = os.space.basis.map((b, i): HeavyOperator => {
    const c = os.candidates[b]!
    return {
      id: `m${n}.${i + 1}`,
      order: n,
      sector: 'bilinear',
      latex: comboLatex(c.combo, c.antiHermitian, field, names),
      terms: termsOf(c.combo, field),
      combo: c.combo,
      antiHermitian: c.antiHermitian,
      relations: [],
      ...(c.parityOdd ? { parityOdd: true } : {}),
      ...(c.timeOdd ? { timeOdd: true } : {}),
    }
  })
  const single = gauge.setup.factors.length === 1 && config.parity && config.timeReversal
  const published =
    gauge.charged && single ? publishedOperators(n, field, basis, gauge.colorN > 1 ? NONABELIAN_OPERATORS : CONVENTIONAL_OPERATORS, gauge.colorN, signal) : { cards: [], spans: null, redundant: 0 }
  return {
    order: n,
    count: basis.length,
    basis,
    conventional: published.cards,
    conventionalSpansBasis: published.spans,
    conventionalRedundant: published.redundant,
    candidates: os.candidates.length,
    relationRank: os.space.relationRank,
    antiparticle: heavy.antiparticle ? basis.map((b) => antiparticleCopy(b, field, heavy.antiparticle!.name)) : [],
  }
}

const PARITY_ODD_CONTACT = ' P is not imposed, but P-odd contact operators (an odd number of derivatives, 1/m³) are not enumerated here.'

/** The heavy–light sector of a theory with light scalars or fermions (empty without them). */
function heavyLightPart(input: HeavyInput, signal?: CancelFlag): { heavyLight: HeavyLightClass[]; heavyLightNote?: string } {
  const { heavy } = input
  const light = (input.fields ?? []).filter((f) => lorentzKind(f) !== 'strength')
  if (light.length === 0) return { heavyLight: [] }
  const r = enumerateHeavyLight(
    {
      particle: heavy.particle.name,
      heavy: { reps: heavy.particle.reps ?? {}, charges: heavy.particle.charges ?? {} },
      fields: light,
      groups: input.groups ?? [],
      maxOrder: heavy.maxOrder,
      parity: heavy.imposeParity !== false,
      timeReversal: heavy.imposeTimeReversal !== false,
    },
    signal,
  )
  const left = r.unpaired.length ? ` Left out: ${r.unpaired.join(', ')} (a Weyl fermion without a partner of opposite chirality and the same charges).` : ''
  return {
    heavyLight: r.classes,
    heavyLightNote: `${HEAVY_LIGHT_NOTE}${heavy.antiparticle ? ' Operators of the antiparticle field with light fields follow from CPT and are not listed.' : ''}${left}`,
  }
}

/**
 * Enumerate for a whole theory file: requires "frame": "heavy" and a "heavy" key.
 * @example enumerateHeavyTheory(parseTheory(vexoniumPreset)).orders.map((o) => o.count) // [2, 2, 7]
 * Method/reference: as enumerateHeavy.
 */
export function enumerateHeavyTheory(theory: { frame: string; groups: HeavyInput['groups']; fields?: HeavyInput['fields']; heavy?: HeavyFrame }, opts: HeavyOptions = {}): HeavyEnumeration {
  if (theory.frame !== 'heavy') throw new EngineInputError('enumerateHeavyTheory', `This theory uses the ${theory.frame} frame; heavy-particle operators need the heavy-particle frame`)
  if (!theory.heavy)
    throw new EngineInputError(
      'enumerateHeavyTheory',
      'A theory in the heavy-particle frame needs its heavy particle (the particle field, the gauge group it couples to and the highest power of 1/m); declare it in the editor',
    )
  return enumerateHeavy({ heavy: theory.heavy, groups: theory.groups, fields: theory.fields }, opts)
}

/**
 * Rewrite any bilinear operator of one order (given as a combination of structures) as an
 * exact combination of the enumerated basis, modulo EOM and IBP.
 * @example rewriteHeavy(combo([[1,'D_i T D_i']]), 2) // Darwin-type: coefficients on the 1/m² basis
 * Method: solve over two primes, CRT and rational reconstruction. Reference: Wang, SYMSAC 1981.
 */
export function rewriteHeavy(target: Combo, order: number, charged = true, signal?: CancelFlag, colorN = 1): Array<{ id: string; coef: Rational }> {
  const os = orderSpace(order, charged, signal, colorN)
  const coefs = os.space.rewrite(expandCombo(target))
  return coefs.map((coef, i) => ({ id: `m${order}.${i + 1}`, coef }))
}
