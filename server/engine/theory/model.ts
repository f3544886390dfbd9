/**
 * The engine's one view of a theory file: its groups and the list of "species" (each field
 * and, for a complex field, its conjugate as a separate species; a field strength as its two
 * chiral halves), with Lorentz irrep, helicity, doubled mass dimension, representations and
 * charges resolved. Counting, bases, counting rules, anomalies and the board all read it.
 *
 * Conventions: species order = theory-file order, each field followed by its conjugate
 * ("H", "H*"; "Q", "Q*"); a field strength G gives "G_L" (Lorentz (1,0)) then "G_R" ((0,1)),
 * each other's conjugates. A left-handed Weyl fermion is (1/2,0), its conjugate (0,1/2); a
 * right-handed one the reverse. On-shell legs are all outgoing: a (j_L, j_R) species has
 * 2j_L angle spinors λ and 2j_R square spinors λ̃, helicity j_R − j_L (so ψ of a left-weyl
 * field has helicity −1/2, G_L −1). Conjugation reverses SU(n) Dynkin labels, maps the labels
 * of another Lie group to −w0 of them and a finite-group irrep to its complex conjugate, and
 * negates U(1) and Z_n charges.
 */
import type { Theory, TheoryField } from '../../../shared/schemas/theory'
import type { LorentzKind } from '../../../shared/schemas/lorentzKind'
import { fieldTex } from '../../../shared/schemas/fieldDisplay'
import { EngineInputError } from '../errors'
import { neg, parseRational, type Rational, ZERO } from '../exact/rational'
import { isFiniteKind, isLieKind, type LieKind } from '../../../shared/schemas/groupKinds'
import type { RootSystem } from '../../../shared/physics/lie/rootSystem'
import { adjointLabels, rootSystemOf } from '../group/lie/simpleGroups'
import { lieConjugate } from '../group/lie/lieIrrep'
import type { FiniteGroupTable } from '../../../shared/physics/finite/tables'
import { finiteConjugate, finiteGroup, irrepIndex } from '../group/finite/finiteGroup'

/** Lorentz irrep of a species: (0,0), (1/2,0), (0,1/2), (1,0), (0,1). */
export type LorentzType = 'S' | 'L' | 'R' | 'FL' | 'FR'

/** SU(n) representations the explicit basis supports; 'other' is counted but not built. */
export type SuKind = 'fund' | 'anti' | 'adj' | 'singlet' | 'other'

export interface Species {
  /** Name in class keys: "H", "H*", "G_L", "G_R", "phi". */
  label: string
  /** Name of the theory-file field it comes from, and that field's index. */
  field: string
  /** The field's TeX as papers print it (its display form, else its name; shared/schemas/fieldDisplay.ts). */
  tex: string
  fieldIndex: number
  /** True for a conjugate (and for the (0,1) half of a field strength). */
  conj: boolean
  /** Label of the conjugate species (itself when self-conjugate) and its index. */
  conjugate: string
  partner: number
  /** The field's Lorentz kind in the theory file. */
  kind: LorentzKind
  lorentz: LorentzType
  /** Spinors of the undifferentiated field: angle (λ) = 2j_L and square (λ̃) = 2j_R. */
  angles: number
  squares: number
  /** Twice the helicity (squares − angles). */
  helicity2: number
  fermion: boolean
  /** Twice the mass dimension: scalar 2, fermion 3, field strength 4. */
  dim2: number
  /** Dynkin labels per SU group name (every SU group; zeros for a singlet). */
  reps: Record<string, number[]>
  /**
   * The same representations as the explicit basis names them: an index up (fund), down
   * (anti), both (adj). A conjugate takes the conjugate kind, also where the irrep is
   * self-conjugate (the SU(2) doublet's conjugate is 'anti').
   */
  suKind: Record<string, SuKind>
  /** Dynkin labels per SO / Sp / exceptional group name (zeros for a singlet). */
  lie: Record<string, number[]>
  /** Irrep index per finite group name (0 = the trivial irrep). */
  finite: Record<string, number>
  /** Charge per U(1) group name, and mod n per Z_n group name (every group; 0 when absent). */
  u1: Record<string, Rational>
  zn: Record<string, number>
  /** Number of flavors used in counts (after an nf override). */
  flavors: number
  /** True when the field declares "flavors" (the variable Nf of flavor polynomials). */
  flavored: boolean
}

export interface TheoryModel {
  name: string
  su: { name: string; n: number; gauge: boolean }[]
  /** SO(n), Sp(n), G2, F4, E6, E7, E8 (SU(n) stays in `su`). */
  lie: { name: string; kind: LieKind; n?: number; gauge: boolean; rs: RootSystem }[]
  finite: { name: string; gauge: boolean; table: FiniteGroupTable }[]
  u1: { name: string; gauge: boolean }[]
  zn: { name: string; n: number; gauge: boolean }[]
  species: Species[]
}

/** (2j_L, 2j_R) and doubled mass dimension of each species irrep. */
const IRREP: Record<LorentzType, { angles: number; squares: number; dim2: number }> = {
  S: { angles: 0, squares: 0, dim2: 2 },
  L: { angles: 1, squares: 0, dim2: 3 },
  R: { angles: 0, squares: 1, dim2: 3 },
  FL: { angles: 2, squares: 0, dim2: 4 },
  FR: { angles: 0, squares: 2, dim2: 4 },
}
const CONJUGATE_TYPE: Record<LorentzType, LorentzType> = { S: 'S', L: 'R', R: 'L', FL: 'FR', FR: 'FL' }
const CONJUGATE_KIND: Record<SuKind, SuKind> = { fund: 'anti', anti: 'fund', adj: 'adj', singlet: 'singlet', other: 'other' }
const MATTER_TYPE: Record<Exclude<LorentzKind, 'field-strength'>, LorentzType> = { scalar: 'S', 'left-weyl': 'L', 'right-weyl': 'R' }

/**
 * Resolve a validated theory into species (any frame: the roster of a heavy-frame theory too;
 * the engines that need frame "relativistic" check it themselves). `nf` (1..6) overrides the
 * flavor number of every field that declares "flavors".
 * @example buildTheoryModel(smeft).species.map(s => s.label).slice(0, 4) // ["Q","Q*","u","u*"]
 */
export function buildTheoryModel(theory: Theory, opts: { nf?: number } = {}): TheoryModel {
  if (opts.nf !== undefined && (!Number.isInteger(opts.nf) || opts.nf < 1 || opts.nf > 6)) {
    throw new EngineInputError('buildTheoryModel', `The number of flavors must be a whole number from 1 to 6, not ${opts.nf}`)
  }
  const model: TheoryModel = { name: theory.name, su: [], lie: [], finite: [], u1: [], zn: [], species: [] }
  for (const g of theory.groups) {
    if (g.type === 'SU') model.su.push({ name: g.name, n: g.n!, gauge: g.gauge })
    else if (isLieKind(g.type)) model.lie.push({ name: g.name, kind: g.type, n: g.n, gauge: g.gauge, rs: rootSystemOf(g.type, g.n) })
    else if (isFiniteKind(g.type)) model.finite.push({ name: g.name, gauge: g.gauge, table: finiteGroup(g.type) })
    else if (g.type === 'U1') model.u1.push({ name: g.name, gauge: g.gauge })
    else model.zn.push({ name: g.name, n: g.n!, gauge: g.gauge })
  }
  theory.fields.forEach((f, fieldIndex) => {
    const strength = f.lorentz === 'field-strength'
    const i = model.species.length
    const selfConjugate = f.lorentz === 'scalar' && f.real === true
    const first: SpeciesParts = {
      label: strength ? `${f.name}_L` : f.name,
      conj: false,
      lorentz: strength ? 'FL' : MATTER_TYPE[f.lorentz as Exclude<LorentzKind, 'field-strength'>],
      ...fieldCharges(model, f),
    }
    const second: SpeciesParts = { label: strength ? `${f.name}_R` : `${f.name}*`, conj: true, lorentz: CONJUGATE_TYPE[first.lorentz], ...conjugateCharges(model, first) }
    const flavors = f.flavors === undefined ? 1 : (opts.nf ?? f.flavors)
    model.species.push(makeSpecies(f, fieldIndex, flavors, first, selfConjugate ? { label: first.label, index: i } : { label: second.label, index: i + 1 }))
    if (!selfConjugate) model.species.push(makeSpecies(f, fieldIndex, flavors, second, { label: first.label, index: i }))
  })
  return model
}

/** What distinguishes a species from its conjugate. */
type SpeciesParts = Pick<Species, 'label' | 'conj' | 'lorentz' | 'reps' | 'suKind' | 'lie' | 'finite' | 'u1' | 'zn'>
type Charges = Pick<Species, 'reps' | 'suKind' | 'lie' | 'finite' | 'u1' | 'zn'>

/** Representations and charges of a field as declared (a field strength: adjoint of gaugeOf, no charges). */
function fieldCharges(model: TheoryModel, f: TheoryField): Charges {
  const strength = f.lorentz === 'field-strength'
  const out: Charges = { reps: {}, suKind: {}, lie: {}, finite: {}, u1: {}, zn: {} }
  for (const g of model.su) {
    const labels = strength ? (g.name === f.gaugeOf ? adjoint(g.n) : zeros(g.n - 1)) : labelsOf(f, g.name, g.n - 1)
    out.reps[g.name] = labels
    out.suKind[g.name] = suKindOf(g.n, labels)
  }
  for (const g of model.lie) out.lie[g.name] = strength ? (g.name === f.gaugeOf ? adjointLabels(g.rs) : zeros(g.rs.rank)) : labelsOf(f, g.name, g.rs.rank)
  for (const g of model.finite) out.finite[g.name] = strength ? 0 : irrepOf(f, g.name, g.table)
  for (const g of model.u1) out.u1[g.name] = strength ? ZERO : parseRational(String(f.charges?.[g.name] ?? '0'))
  for (const g of model.zn) out.zn[g.name] = strength ? 0 : mod(Number(f.charges?.[g.name] ?? 0), g.n)
  return out
}

/** Conjugate representations and charges: labels reversed, kinds conjugated, charges negated. */
function conjugateCharges(model: TheoryModel, s: SpeciesParts): Charges {
  const out: Charges = { reps: {}, suKind: {}, lie: {}, finite: {}, u1: {}, zn: {} }
  for (const g of model.su) {
    out.reps[g.name] = s.reps[g.name]!.slice().reverse()
    out.suKind[g.name] = CONJUGATE_KIND[s.suKind[g.name]!]
  }
  for (const g of model.lie) out.lie[g.name] = lieConjugate(g.rs, s.lie[g.name]!)
  for (const g of model.finite) out.finite[g.name] = finiteConjugate(g.table, s.finite[g.name]!)
  for (const g of model.u1) out.u1[g.name] = neg(s.u1[g.name]!)
  for (const g of model.zn) out.zn[g.name] = mod(-s.zn[g.name]!, g.n)
  return out
}

function makeSpecies(f: TheoryField, fieldIndex: number, flavors: number, s: SpeciesParts, partner: { label: string; index: number }): Species {
  const { angles, squares, dim2 } = IRREP[s.lorentz]
  return {
    label: s.label,
    field: f.name,
    tex: fieldTex(f.name, f.display),
    fieldIndex,
    conj: s.conj,
    conjugate: partner.label,
    partner: partner.index,
    kind: f.lorentz,
    lorentz: s.lorentz,
    angles,
    squares,
    helicity2: squares - angles,
    fermion: s.lorentz === 'L' || s.lorentz === 'R',
    dim2,
    reps: s.reps,
    suKind: s.suKind,
    lie: s.lie,
    finite: s.finite,
    u1: s.u1,
    zn: s.zn,
    flavors,
    flavored: f.flavors !== undefined,
  }
}

/**
 * The explicit basis's name of an SU(n) irrep: fundamental [1,0,…], antifundamental […,0,1],
 * adjoint ([2] for SU(2), [1,0,…,0,1] otherwise), singlet, or 'other'.
 * @example suKindOf(3, [0, 1]) // 'anti'
 */
export function suKindOf(n: number, labels: readonly number[]): SuKind {
  const key = labels.join(',')
  if (labels.every((a) => a === 0)) return 'singlet'
  if (key === adjoint(n).join(',')) return 'adj'
  if (key === [1, ...zeros(n - 2)].join(',')) return 'fund'
  if (key === [...zeros(n - 2), 1].join(',')) return 'anti'
  return 'other'
}

/** Dynkin labels of a field under a Lie group (zeros when absent). */
function labelsOf(f: TheoryField, group: string, rank: number): number[] {
  const rep = f.reps?.[group]
  if (rep === undefined) return zeros(rank)
  if (typeof rep === 'string') throw new EngineInputError('buildTheoryModel', `field ${f.name}: ${group} takes Dynkin labels, not the irrep name "${rep}"`)
  return rep.slice()
}

/** Irrep index of a field under a finite group (0, the trivial irrep, when absent). */
function irrepOf(f: TheoryField, group: string, table: FiniteGroupTable): number {
  const rep = f.reps?.[group]
  if (rep === undefined) return 0
  if (typeof rep !== 'string') throw new EngineInputError('buildTheoryModel', `field ${f.name}: ${group} = ${table.label} takes an irrep name, not Dynkin labels [${rep.join(',')}]`)
  return irrepIndex(table, rep)
}

function zeros(k: number): number[] {
  return new Array<number>(k).fill(0)
}

/** Dynkin labels of the adjoint of SU(n): [2] for SU(2), [1,0,...,0,1] otherwise. */
export function adjoint(n: number): number[] {
  if (n === 2) return [2]
  const a = zeros(n - 1)
  a[0] = 1
  a[n - 2] = 1
  return a
}

function mod(a: number, n: number): number {
  return ((a % n) + n) % n
}
