/**
 * The engine's view of a theory file: the list of "species" (each field and, for complex
 * fields, its conjugate as a separate species; a field strength as its two chiral halves),
 * with Lorentz type, doubled mass dimension, representations and charges resolved.
 *
 * Conventions: species order = theory-file order, each field followed by its conjugate
 * ("H", "H*"; "Q", "Q*"); a field strength G gives "G_L" (Lorentz (1,0)) then "G_R" ((0,1)).
 * A left-handed Weyl fermion is (1/2,0), its conjugate (0,1/2); a right-handed one the reverse.
 * Conjugation reverses SU(n) Dynkin labels and negates U(1) and Z_n charges.
 */
import type { Theory } from '../../../shared/schemas/theory'
import type { LorentzKind } from '../../../shared/schemas/lorentzKind'
import { EngineInputError } from '../errors'
import { neg, parseRational, type Rational, ZERO } from '../exact/rational'

/** Lorentz type of a species: scalar, (1/2,0), (0,1/2), (1,0), (0,1). */
export type LorentzType = 'S' | 'L' | 'R' | 'FL' | 'FR'

export interface Species {
  /** Name used in class keys: "H", "H*", "G_L", "G_R", "phi". */
  key: string
  fieldIndex: number
  fieldName: string
  conjugate: boolean
  lorentz: LorentzType
  fermion: boolean
  /** Twice the mass dimension: scalar 2, fermion 3, field strength 4. */
  dim2: number
  /** Dynkin labels per SU group (order of TheoryModel.su). */
  su: number[][]
  /** Charge per U(1) group (order of TheoryModel.u1). */
  u1: Rational[]
  /** Charge mod n per Z group (order of TheoryModel.zn), in 0..n-1. */
  zn: number[]
  /** Number of flavors used in counts (after an --nf override). */
  flavors: number
  /** True when the field declares "flavors" (the variable Nf of flavor polynomials). */
  flavored: boolean
  /** Index of the conjugate species (itself when self-conjugate). */
  partner: number
}

export interface TheoryModel {
  name: string
  su: { name: string; n: number; gauge: boolean }[]
  u1: { name: string; gauge: boolean }[]
  zn: { name: string; n: number; gauge: boolean }[]
  species: Species[]
}

const LORENTZ_DIM2: Record<LorentzType, number> = { S: 2, L: 3, R: 3, FL: 4, FR: 4 }

/** The species type of a matter field's Lorentz kind (a field strength splits into FL, FR). */
const FILE_KIND_TYPE: Record<Exclude<LorentzKind, 'field-strength'>, LorentzType> = { 'scalar': 'S', 'left-weyl': 'L', 'right-weyl': 'R' }

/**
 * Resolve a validated theory into species. `nf` (1..6) overrides the flavor number of every
 * field that declares "flavors". Throws EngineInputError for frame "heavy".
 * @example buildTheoryModel(smeft).species.map(s => s.key).slice(0, 4) // ["Q","Q*","u","u*"]
 */
export function buildTheoryModel(theory: Theory, opts: { nf?: number } = {}): TheoryModel {
  if (theory.frame !== 'relativistic') {
    throw new EngineInputError('buildTheoryModel', `Theory "${theory.name}" uses the ${theory.frame} frame, which the Hilbert-series count does not cover; start a basis run instead`)
  }
  if (opts.nf !== undefined && (!Number.isInteger(opts.nf) || opts.nf < 1 || opts.nf > 6)) {
    throw new EngineInputError('buildTheoryModel', `The number of flavors must be a whole number from 1 to 6, not ${opts.nf}`)
  }
  const model: TheoryModel = { name: theory.name, su: [], u1: [], zn: [], species: [] }
  for (const g of theory.groups) {
    if (g.type === 'SU') model.su.push({ name: g.name, n: g.n!, gauge: g.gauge })
    else if (g.type === 'U1') model.u1.push({ name: g.name, gauge: g.gauge })
    else model.zn.push({ name: g.name, n: g.n!, gauge: g.gauge })
  }
  theory.fields.forEach((f, fieldIndex) => {
    const flavored = f.flavors !== undefined
    const flavors = flavored ? (opts.nf ?? f.flavors!) : 1
    const base = { fieldIndex, fieldName: f.name, flavored, flavors }
    if (f.lorentz === 'field-strength') {
      const su = model.su.map((g) => (g.name === f.gaugeOf ? adjoint(g.n) : zeros(g.n - 1)))
      const common = { ...base, fermion: false, dim2: 4, su, u1: model.u1.map(() => ZERO), zn: model.zn.map(() => 0) }
      const i = model.species.length
      model.species.push({ ...common, key: `${f.name}_L`, conjugate: false, lorentz: 'FL', partner: i + 1 })
      model.species.push({ ...common, key: `${f.name}_R`, conjugate: true, lorentz: 'FR', partner: i })
      return
    }
    const su = model.su.map((g) => (f.reps?.[g.name] ?? zeros(g.n - 1)).slice())
    const u1 = model.u1.map((g) => parseRational(String(f.charges?.[g.name] ?? '0')))
    const zn = model.zn.map((g) => mod(Number(f.charges?.[g.name] ?? 0), g.n))
    const lorentz: LorentzType = FILE_KIND_TYPE[f.lorentz]
    const fermion = lorentz !== 'S'
    const i = model.species.length
    const self = f.lorentz === 'scalar' && f.real === true
    model.species.push({ ...base, key: f.name, conjugate: false, lorentz, fermion, dim2: LORENTZ_DIM2[lorentz], su, u1, zn, partner: self ? i : i + 1 })
    if (self) return
    const conjLorentz: LorentzType = lorentz === 'L' ? 'R' : lorentz === 'R' ? 'L' : 'S'
    model.species.push({
      ...base,
      key: `${f.name}*`,
      conjugate: true,
      lorentz: conjLorentz,
      fermion,
      dim2: LORENTZ_DIM2[conjLorentz],
      su: su.map((a) => a.slice().reverse()),
      u1: u1.map(neg),
      zn: zn.map((q, k) => mod(-q, model.zn[k]!.n)),
      partner: i,
    })
  })
  return model
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
