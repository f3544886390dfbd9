/**
 * Exact one- and two-loop gauge β coefficients of a product of simple groups and U(1)s, with
 * the kinetic mixing of several U(1)s, for the multiplets active in one range of μ.
 *
 * Couplings are written as "slots": one per simple group a (α_a = g_a²/4π) and one per pair of
 * U(1)s k ≤ l (α_kl, the entries of the abelian coupling matrix α = G Gᵀ/4π, where the
 * covariant derivative holds Σ_k Q_k (G A)_k). In terms of the inverses — x_a = 1/α_a for a
 * simple group and the matrix X = α⁻¹ for the U(1)s —
 *
 *   d y_T / d ln μ = −(1/2π) [ b_T + (1/4π) Σ_c B_Tc α_c ],   y_T = x_a or X_kl,
 *
 * with α_c = α_b or α_mn, each pair m < n counted once (its coefficient carries the 2 of the
 * symmetric sum). Without mixing X_kk = 1/α_k, and the diagonal slots give the usual form
 * μ dg_i/dμ = g_i³ b_i/(16π²) + g_i³ Σ_j B_ij g_j²/(16π²)² (U(1) charges as written).
 * Yukawa couplings are not part of a theory file, so their two-loop terms are absent.
 */
import { EngineInputError } from '../../errors'
import { add, mul, rat, ZERO, type Rational } from '../../exact/rational'
import type { GaugeContent } from './gaugeContent'
import { contentFactors, LOOP_WEIGHTS, type ContentFactors, type FieldFactors } from './fieldFactors'

/** A simple group ([name]) or a pair of U(1)s ([k, l], k = l on the diagonal). */
export interface CouplingSlot {
  groups: [string] | [string, string]
  abelian: boolean
}

export interface GaugeBetaCoefficients {
  /** Diagonal slots first, in theory order (simple groups and U(1)s), then the pairs k < l. */
  slots: CouplingSlot[]
  oneLoop: Rational[]
  twoLoop: Rational[][]
  /** True when running makes unmixed U(1)s mix (an off-diagonal row has a term in b or in a diagonal coupling). */
  mixes: boolean
}

/** Most U(1) gauge groups whose mixing we follow (the slot count grows as n²). */
export const MAX_ABELIAN_GROUPS = 8

interface SlotPlan {
  slot: CouplingSlot
  simple?: number
  pair?: [number, number]
}

function plan(content: GaugeContent, f: ContentFactors): SlotPlan[] {
  const simpleAt = new Map(f.simple.map((g, i) => [g.name, i]))
  const abelianAt = new Map(f.abelian.map((g, i) => [g.name, i]))
  const diagonal: SlotPlan[] = content.groups.map((g) =>
    g.abelian
      ? { slot: { groups: [g.name, g.name], abelian: true }, pair: [abelianAt.get(g.name)!, abelianAt.get(g.name)!] }
      : { slot: { groups: [g.name], abelian: false }, simple: simpleAt.get(g.name)! },
  )
  const off: SlotPlan[] = []
  f.abelian.forEach((k, i) =>
    f.abelian.forEach((l, j) => {
      if (i < j) off.push({ slot: { groups: [k.name, l.name], abelian: true }, pair: [i, j] })
    }),
  )
  return [...diagonal, ...off]
}

/** Σ over active fields of weight(kind) × term(field). */
function fieldSum(fields: readonly FieldFactors[], weight: 'w1' | 'w2' | 'w3', term: (f: FieldFactors) => Rational): Rational {
  return fields.reduce((s, f) => add(s, mul(LOOP_WEIGHTS[f.kind][weight], term(f))), ZERO)
}

/** The charge weight of a field in a slot: S_a for a simple group, d Q_k Q_l for a pair. */
function slotWeight(p: SlotPlan, f: FieldFactors): Rational {
  if (p.simple !== undefined) return f.index[p.simple]!
  return mul(f.components, mul(f.charge[p.pair![0]]!, f.charge[p.pair![1]]!))
}

/** What a coupling slot "sees" of a field at two loops: C2 for a simple group, Q_m Q_n (×2 off the diagonal) for a pair. */
function slotCasimir(c: SlotPlan, f: FieldFactors): Rational {
  if (c.simple !== undefined) return f.casimir[c.simple]!
  const [m, n] = c.pair!
  return mul(rat(m === n ? 1 : 2), mul(f.charge[m]!, f.charge[n]!))
}

function oneLoop(p: SlotPlan, fields: readonly FieldFactors[], f: ContentFactors): Rational {
  const matter = fieldSum(fields, 'w1', (x) => slotWeight(p, x))
  if (p.simple === undefined) return matter
  return add(mul(rat(-11, 3), f.simple[p.simple]!.factors.adjointCasimir), matter)
}

function twoLoop(t: SlotPlan, c: SlotPlan, fields: readonly FieldFactors[], f: ContentFactors): Rational {
  let v = fieldSum(fields, 'w2', (x) => mul(slotWeight(t, x), slotCasimir(c, x)))
  if (t.simple !== undefined && t.simple === c.simple) {
    const ca = f.simple[t.simple]!.factors.adjointCasimir
    v = add(
      v,
      mul(
        ca,
        fieldSum(fields, 'w3', (x) => slotWeight(t, x)),
      ),
    )
    v = add(v, mul(rat(-34, 3), mul(ca, ca)))
  }
  return v
}

/**
 * Exact b_T and B_Tc for the multiplets selected by `active` (default: all).
 * @example gaugeBetaCoefficients(gaugeContentOf(smeft)).oneLoop.map(toString) // ['-7', '-19/6', '41/6']
 * Method: one loop b = −(11/3) C2(G) + (2/3) Σ_Weyl S + (1/3) Σ_complex S + (1/6) Σ_real S; two loops
 *   B_aa = −(34/3) C2(G)² + Σ S (w2 C2 + w3 C2(G)), B_ab = Σ w2 S_a C_b (w2 = 2, 4, 2; w3 = 10/3, 2/3, 1/3),
 *   with U(1) charges entering as C → Q_m Q_n and S → d Q_k Q_l (the covariant coupling-matrix form of mixing).
 * Reference: M. E. Machacek, M. T. Vaughn, Nucl. Phys. B 222 (1983) 83 (general two-loop gauge β);
 *   F. del Aguila, G. D. Coughlan, M. Quirós, Nucl. Phys. B 307 (1988) 633 (one-loop mixing) and
 *   M. Luo, Y. Xiao, Phys. Lett. B 555 (2003) 279 (two loops with several U(1)s). The two-loop mixing
 *   terms here are Machacek–Vaughn's with g² Q² → Qᵀ α Q (the covariant form), derived by us and
 *   checked for invariance under a change of U(1) basis, not copied from that paper.
 */
export function gaugeBetaCoefficients(content: GaugeContent, active: (massGeV: number) => boolean = () => true): GaugeBetaCoefficients {
  const f = contentFactors(content)
  if (f.abelian.length > MAX_ABELIAN_GROUPS) {
    throw new EngineInputError('gaugeBetaCoefficients', `The theory has ${f.abelian.length} U(1) gauge groups; the running follows the kinetic mixing of at most ${MAX_ABELIAN_GROUPS}.`)
  }
  const fields = f.fields.filter((_, i) => active(content.multiplets[i]!.massGeV))
  const slots = plan(content, f)
  const diagonalCount = content.groups.length
  const oneLoopRow = slots.map((p) => oneLoop(p, fields, f))
  const twoLoopRows = slots.map((t) => slots.map((c) => twoLoop(t, c, fields, f)))
  // Mixing starts from none when an off-diagonal row has a term without an off-diagonal coupling.
  const mixes = slots.some((_, i) => i >= diagonalCount && (oneLoopRow[i]!.num !== 0n || twoLoopRows[i]!.some((v, j) => j < diagonalCount && v.num !== 0n)))
  return { slots: slots.map((p) => p.slot), oneLoop: oneLoopRow, twoLoop: twoLoopRows, mixes }
}
