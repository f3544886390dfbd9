/**
 * The group-theory factors of one matter multiplet that enter the gauge β functions, exact:
 * per simple group a its index weight S_a = T_a(R_a) × (dimensions under the other simple
 * groups) × flavours and its Casimir C_a = C2_a(R_a); its charges Q_k under the U(1)s; its
 * number of components d (dimensions × flavours); and its loop weights by kind.
 */
import { mul, rat, ZERO, type Rational } from '../../exact/rational'
import type { GaugeContent, GaugeMultiplet, MatterKind } from './gaugeContent'
import { simpleGroupFactors, type SimpleGroupFactors } from './groupFactors'

export interface FieldFactors {
  name: string
  kind: MatterKind
  /** S_a per simple group (order of `simple`). */
  index: Rational[]
  /** C2 per simple group (0 for a singlet). */
  casimir: Rational[]
  /** Charge per U(1) (order of `abelian`). */
  charge: Rational[]
  /** Components: flavours × Π dim R_a. */
  components: Rational
}

/**
 * Loop weights by kind (Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83, for two-component
 * fermions and real scalars; a complex scalar counts twice): one loop w1 S; two loops
 * S (w2 C + w3 C2(G)).
 */
export const LOOP_WEIGHTS: Record<MatterKind, { w1: Rational; w2: Rational; w3: Rational }> = {
  weyl: { w1: rat(2, 3), w2: rat(2), w3: rat(10, 3) },
  'complex-scalar': { w1: rat(1, 3), w2: rat(4), w3: rat(2, 3) },
  'real-scalar': { w1: rat(1, 6), w2: rat(2), w3: rat(1, 3) },
}

export interface ContentFactors {
  simple: { name: string; factors: SimpleGroupFactors }[]
  abelian: { name: string }[]
  fields: FieldFactors[]
}

const singlet = (f: SimpleGroupFactors) => new Array<number>(f.rank).fill(0)

function fieldFactors(m: GaugeMultiplet, simple: ContentFactors['simple'], abelian: ContentFactors['abelian']): FieldFactors {
  const labels = simple.map((g) => m.reps[g.name] ?? singlet(g.factors))
  const dims = simple.map((g, a) => rat(g.factors.irrepDimension(labels[a]!)))
  const flavors = rat(m.flavors)
  const components = dims.reduce((p, d) => mul(p, d), flavors)
  const index = simple.map((g, a) => {
    const others = dims.reduce((p, d, b) => (b === a ? p : mul(p, d)), flavors)
    return mul(g.factors.index(labels[a]!), others)
  })
  const casimir = simple.map((g, a) => g.factors.casimir(labels[a]!))
  const charge = abelian.map((g) => m.charges[g.name] ?? ZERO)
  return { name: m.name, kind: m.kind, index, casimir, charge, components }
}

/**
 * The factors of every multiplet of a gauge content (all of them, active or not).
 * @example contentFactors(gaugeContentOf(qcdLike)).fields[0].index // [1] (two flavours × T(3) = 1/2)
 * Method: dimensions, indices and Casimirs from simpleGroupFactors; U(1) charges as written.
 * Reference: Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83 (S2(R) of a reducible multiplet).
 */
export function contentFactors(content: GaugeContent): ContentFactors {
  const simple = content.groups.filter((g) => !g.abelian).map((g) => ({ name: g.name, factors: simpleGroupFactors(g.group) }))
  const abelian = content.groups.filter((g) => g.abelian).map((g) => ({ name: g.name }))
  return { simple, abelian, fields: content.multiplets.map((m) => fieldFactors(m, simple, abelian)) }
}
