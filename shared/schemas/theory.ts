import { z } from 'zod'
import './zodMessages'
import { CountingRuleSchema } from './countingRules'
import { describeIssue, type IssueLike } from './describeZodError'
import { HeavyFrameSchema, type HeavyFrame } from './heavyFrame'
import { LORENTZ_KINDS, lorentzKindMessage } from './lorentzKind'
import { displayProblem } from './fieldDisplay'
import { GoldstoneFrameSchema, checkGoldstoneFrame, type GoldstoneFrame } from './goldstoneFrame'
import { GROUP_KINDS, groupKindLabel, isFiniteKind, isLieKind } from './groupKinds'
import { MAX_REP_DIMENSION, type RepValue, checkRealRepresentation, checkRep, groupNProblem } from './theoryGroups'
import { CouplingSchema, MassSchema, MAX_COUPLINGS, checkCouplingSymbols, type Coupling } from './couplings'

/**
 * Theory file of Scalewright (JSON, uploaded by users and built by the editor).
 * Keys are part of the portable file format: extend, never rename.
 *
 * - groups: SU(n) (2 <= n <= 8), SO(n) (5 <= n <= 18), Sp(n) (n even, 4 <= n <= 16), G2, F4, E6,
 *   E7, E8, U1, Z (Z_n, 2 <= n <= 64), or a finite flavour group S3, A4, S4, Q8, Tprime (T′),
 *   Delta27 (Δ(27)) (groupKinds.ts); `gauge` false = global symmetry.
 * - fields: lorentz "scalar" (complex unless real), "left-weyl" fermion (1/2,0), "right-weyl"
 *   fermion (0,1/2), "field-strength" of the gauge group `gaugeOf` (both chiral halves, real,
 *   adjoint; a singlet of every other group). See ./lorentzKind.ts.
 *   reps: Dynkin labels per Lie group (Bourbaki's numbering), an irrep name per finite group
 *   (absent = singlet); charges: rational strings per U1
 *   ("1/6"), integers mod n per Z group (absent = 0); flavors: 1..6 (default 1).
 *   Complex fields bring their conjugates.
 */
export const NAME_PATTERN = /^[A-Za-z][A-Za-z0-9_]{0,15}$/
export const MAX_FIELDS = 40
export const MAX_GROUPS = 32
export const MAX_FLAVORS = 6
export { MAX_REP_DIMENSION }

const NameSchema = z.string().regex(NAME_PATTERN, {
  message: 'a name is a letter followed by up to 15 letters, digits or "_"',
})
const ChargeSchema = z.union([
  z.string().regex(/^\s*-?\d{1,9}(\s*\/\s*\d{1,9})?\s*$/, { message: 'a charge is a rational written "p/q" or an integer, e.g. "1/6"' }),
  z.number().int().min(-1e9).max(1e9),
])

export const GroupSchema = z.object({
  name: NameSchema,
  type: z.enum(GROUP_KINDS),
  n: z.number().int().optional(),
  gauge: z.boolean(),
  description: z.string().max(200).optional(),
})

export const FieldSchema = z.object({
  name: NameSchema,
  lorentz: z.enum(LORENTZ_KINDS, { error: (iss) => lorentzKindMessage(iss.input) }),
  reps: z.record(NameSchema, z.union([z.array(z.number().int().min(0).max(12)).max(9), z.string().max(8)])).optional(),
  charges: z.record(NameSchema, ChargeSchema).optional(),
  real: z.boolean().optional(),
  flavors: z.number().int().min(1).max(MAX_FLAVORS).optional(),
  gaugeOf: NameSchema.optional(),
  /** The mass symbol (and value) used when the field is integrated out; see ./couplings.ts. */
  mass: MassSchema.optional(),
  description: z.string().max(200).optional(),
  /** How papers print the field (φ, χ_L, \bar{N}); the name stays the plain form. See ./fieldDisplay.ts. */
  display: z.string().max(200).optional(),
})

export const TheorySchema = z
  .object({
    name: z.string().min(1).max(80),
    description: z.string().max(2000).optional(),
    frame: z.enum(['relativistic', 'heavy', 'goldstone']),
    maxOrder: z.number().int().min(0).max(40).optional(),
    groups: z.array(GroupSchema).max(MAX_GROUPS),
    fields: z.array(FieldSchema).max(MAX_FIELDS),
    countingRules: z.array(CountingRuleSchema).optional(),
    heavy: HeavyFrameSchema.optional(),
    goldstone: GoldstoneFrameSchema.optional(),
    /** Symbols (and values) of kept order-0 operators; see ./couplings.ts. */
    couplings: z.array(CouplingSchema).max(MAX_COUPLINGS).optional(),
  })
  .superRefine((t, ctx) => checkTheory(t, (path, message) => ctx.addIssue({ code: 'custom', path, message })))

export type Theory = z.infer<typeof TheorySchema>
export type TheoryGroup = z.infer<typeof GroupSchema>
export type TheoryField = z.infer<typeof FieldSchema>

type Report = (path: (string | number)[], message: string) => void

function checkTheory(t: { frame: string; groups: TheoryGroup[]; fields: TheoryField[]; heavy?: HeavyFrame; goldstone?: GoldstoneFrame; couplings?: Coupling[] }, report: Report): void {
  if (t.heavy !== undefined && t.frame !== 'heavy') report(['heavy'], 'a heavy particle needs the heavy-particle frame; choose that frame, or remove the heavy particle')
  checkGoldstoneFrame(t.frame, t.goldstone, report)
  const groups = new Map<string, TheoryGroup>()
  t.groups.forEach((g, i) => {
    if (groups.has(g.name)) report(['groups', i, 'name'], 'is already the name of another symmetry; give each symmetry its own name')
    groups.set(g.name, g)
    const nProblem = groupNProblem(g)
    if (nProblem) report(['groups', i, 'n'], nProblem)
    if (g.gauge && isFiniteKind(g.type)) report(['groups', i, 'gauge'], `${groupKindLabel(g.type)} is a finite group; declare it global (not gauged)`)
  })
  const names = new Set<string>()
  const strengths = new Set<string>()
  t.fields.forEach((f, i) => {
    const bad = (key: string | number, message: string, ...more: (string | number)[]) => report(['fields', i, key, ...more], message)
    if (names.has(f.name)) bad('name', 'is already the name of another field; give each field its own name')
    if (f.name === 'D') bad('name', RESERVED_D)
    names.add(f.name)
    const displayIssue = f.display === undefined ? null : displayProblem(f.display)
    if (displayIssue) bad('display', displayIssue)
    checkReps(f, groups, bad)
    checkCharges(f, groups, bad)
    if (f.lorentz === 'field-strength') checkStrength(f, groups, strengths, bad)
    else if (f.gaugeOf !== undefined) bad('gaugeOf', 'only a field strength belongs to a gauge group; remove the gauge group, or make the field a field strength')
    if (f.real && f.lorentz !== 'scalar') bad('real', 'only a scalar can be declared real; make the field complex, or a scalar')
    if (f.real && f.lorentz === 'scalar') checkRealScalar(f, groups, bad)
  })
  if (t.heavy) checkHeavy(t.heavy, groups, names, report)
  if (t.couplings?.length && t.frame === 'goldstone') report(['couplings'], 'couplings name order-0 operators of the relativistic or heavy-particle frame; remove them, or change the frame')
  t.fields.forEach((f, i) => {
    if (f.mass && f.lorentz === 'field-strength') report(['fields', i, 'mass'], 'a gauge field strength has no mass of its own here; remove the mass')
  })
  checkCouplingSymbols(t, report)
}

/** The heavy block names declared groups, couples to a continuous gauge group, and its fields are new names. */
function checkHeavy(h: HeavyFrame, groups: Map<string, TheoryGroup>, fieldNames: Set<string>, report: Report): void {
  const g = groups.get(h.gaugeGroup)
  if (!g) report(['heavy', 'gaugeGroup'], `the theory has no symmetry named "${h.gaugeGroup}"; choose one of its gauge groups`)
  else if (!g.gauge) report(['heavy', 'gaugeGroup'], `${h.gaugeGroup} is a global symmetry (not gauged); choose a gauge group`)
  else if (g.type === 'Z') report(['heavy', 'gaugeGroup'], `${h.gaugeGroup} is the discrete group Z_${g.n}; choose a U(1) or SU(n) gauge group`)
  else if (g.type !== 'U1' && g.type !== 'SU') report(['heavy', 'gaugeGroup'], `${h.gaugeGroup} is ${groupKindLabel(g.type, g.n)}; the heavy-particle frame needs a U(1) or SU(n) gauge group`)
  // Reps and charges follow the roster's rules (a Pauli field is a fermion: not a field strength).
  const particle: TheoryField = { name: h.particle.name, lorentz: 'left-weyl', reps: h.particle.reps, charges: h.particle.charges }
  const bad: Bad = (key, message, ...more) => report(['heavy', 'particle', key, ...more], message)
  checkReps(particle, groups, bad)
  checkCharges(particle, groups, bad)
  for (const [key, name] of [
    ['particle', h.particle.name],
    ['antiparticle', h.antiparticle?.name],
  ] as const) {
    if (name === undefined) continue
    if (fieldNames.has(name)) report(['heavy', key, 'name'], `is already the name of a field of the roster; choose another name than "${name}"`)
    if (name === 'D') report(['heavy', key, 'name'], RESERVED_D)
  }
}

const RESERVED_D = 'cannot be "D", the covariant derivative; choose another name'
const NO_SUCH_GROUP = (name: string) => `the theory has no symmetry named "${name}"; declare it, or remove this entry`

type Bad = (key: string | number, message: string, ...more: (string | number)[]) => void

function checkReps(f: TheoryField, groups: Map<string, TheoryGroup>, bad: Bad): void {
  for (const [gname, rep] of Object.entries(f.reps ?? {})) {
    const g = groups.get(gname)
    if (!g) {
      bad('reps', NO_SUCH_GROUP(gname), gname)
      continue
    }
    if (!isLieKind(g.type) && !isFiniteKind(g.type)) {
      bad('reps', `${gname} is ${g.type === 'U1' ? 'a U(1)' : `Z_${g.n}`} group, which takes a charge, not Dynkin labels`, gname)
      continue
    }
    if (groupNProblem(g)) continue // the symmetry's own n is reported there
    const ok = checkRep(g, rep, bad)
    if (ok && f.lorentz === 'field-strength' && (typeof rep === 'string' || rep.some((a) => a !== 0)))
      bad('reps', `a field strength takes its representation from its gauge group; remove ${typeof rep === 'string' ? `"${rep}"` : `[${rep.join(',')}]`}`, gname)
  }
}

function checkCharges(f: TheoryField, groups: Map<string, TheoryGroup>, bad: Bad): void {
  for (const [gname, q] of Object.entries(f.charges ?? {})) {
    const g = groups.get(gname)
    if (!g) {
      bad('charges', NO_SUCH_GROUP(gname), gname)
      continue
    }
    if (g.type !== 'U1' && g.type !== 'Z') {
      bad('charges', `${gname} is ${groupKindLabel(g.type, g.n)}, which takes ${isFiniteKind(g.type) ? 'an irrep name' : 'Dynkin labels'}, not a charge`, gname)
      continue
    }
    if (g.type === 'Z' && !/^\s*-?\d+\s*$/.test(String(q))) bad('charges', `a Z_${g.n ?? 'n'} charge is a whole number (counted mod ${g.n ?? 'n'}), but got ${q}`, gname)
    if (/\/\s*0+\s*$/.test(String(q))) bad('charges', `the charge ${q} has a zero denominator`, gname)
    if (f.lorentz === 'field-strength' && !isZeroCharge(q)) bad('charges', `a field strength carries no charge; remove ${q}`, gname)
  }
}

function checkStrength(f: TheoryField, groups: Map<string, TheoryGroup>, strengths: Set<string>, bad: Bad): void {
  const g = f.gaugeOf === undefined ? undefined : groups.get(f.gaugeOf)
  if (f.gaugeOf === undefined) bad('gaugeOf', 'is required: choose the gauge group whose field strength this is')
  else if (!g) bad('gaugeOf', `the theory has no symmetry named "${f.gaugeOf}"; choose one of its gauge groups`)
  else if (!g.gauge) bad('gaugeOf', `${f.gaugeOf} is a global symmetry (not gauged) and has no field strength`)
  else if (g.type === 'Z') bad('gaugeOf', `${f.gaugeOf} is the discrete group Z_${g.n} and has no field strength`)
  else if (isFiniteKind(g.type)) bad('gaugeOf', `${f.gaugeOf} is the finite group ${groupKindLabel(g.type, g.n)} and has no field strength`)
  else if (strengths.has(f.gaugeOf)) bad('gaugeOf', `${f.gaugeOf} already has a field strength`)
  if (f.gaugeOf !== undefined) strengths.add(f.gaugeOf)
  if (f.flavors !== undefined && f.flavors !== 1) bad('flavors', `a field strength comes in one flavor, not ${f.flavors}`)
}

function checkRealScalar(f: TheoryField, groups: Map<string, TheoryGroup>, bad: Bad): void {
  for (const [gname, q] of Object.entries(f.charges ?? {})) {
    const g = groups.get(gname)
    if (g?.type === 'U1' && !isZeroCharge(q)) bad('charges', `a real scalar must have zero U(1) charges, but this one is ${String(q).trim()}`, gname)
    if (g?.type === 'Z' && g.n !== undefined && /^\s*-?\d+\s*$/.test(String(q)) && (2 * Number(q)) % g.n !== 0) {
      bad('charges', `a real scalar needs a self-conjugate Z_${g.n} charge (2q = 0 mod ${g.n}), but this one is ${q}`, gname)
    }
  }
  const reps: [TheoryGroup, RepValue][] = []
  for (const [gname, rep] of Object.entries(f.reps ?? {})) {
    const g = groups.get(gname)
    if (!g || groupNProblem(g) || !(isLieKind(g.type) || isFiniteKind(g.type))) continue
    if (checkRep(g, rep, () => {})) reps.push([g, rep])
  }
  checkRealRepresentation(reps, bad)
}

function isZeroCharge(q: string | number): boolean {
  return /^\s*-?0+(\s*\/\s*\d+)?\s*$/.test(String(q))
}

/**
 * One readable line per problem of a theory file, naming the place in the file's own words:
 * `Field 3 "phi", charge under Y: a real scalar must have zero U(1) charges, but this one is 1/3`.
 */
export function formatTheoryIssues(input: unknown, issues: readonly IssueLike[]): string {
  return issues.map((iss) => describeIssue(iss, input, 'the theory file')).join('\n')
}
