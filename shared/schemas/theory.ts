import { z } from 'zod'
import './zodMessages'
import { CountingRuleSchema } from './countingRules'
import { describeIssue, type IssueLike } from './describeZodError'
import { HeavyFrameSchema, type HeavyFrame } from './heavyFrame'
import { LORENTZ_KINDS, lorentzKindMessage } from './lorentzKind'
import { irrepReality, weylDimension } from '../physics/suIrrep'
import { GoldstoneFrameSchema, checkGoldstoneFrame, type GoldstoneFrame } from './goldstoneFrame'

/**
 * Theory file of Scalewright (JSON, uploaded by users and built by the editor).
 * Keys are part of the portable file format: extend, never rename.
 *
 * - groups: SU(n) (2 <= n <= 8), U1, or Z (Z_n, 2 <= n <= 64); `gauge` false = global symmetry.
 * - fields: lorentz "scalar" (complex unless real), "left-weyl" fermion (1/2,0), "right-weyl"
 *   fermion (0,1/2), "field-strength" of the gauge group `gaugeOf` (both chiral halves, real,
 *   adjoint; a singlet of every other group). See ./lorentzKind.ts.
 *   reps: Dynkin labels per SU(n) group (absent = singlet); charges: rational strings per U1
 *   ("1/6"), integers mod n per Z group (absent = 0); flavors: 1..6 (default 1).
 *   Complex fields bring their conjugates.
 */
export const NAME_PATTERN = /^[A-Za-z][A-Za-z0-9_]{0,15}$/
export const MAX_FIELDS = 40
export const MAX_GROUPS = 32
export const MAX_FLAVORS = 6
export const MAX_REP_DIMENSION = 1000

const NameSchema = z.string().regex(NAME_PATTERN, {
  message: 'a name is a letter followed by up to 15 letters, digits or "_"',
})
const ChargeSchema = z.union([
  z.string().regex(/^\s*-?\d{1,9}(\s*\/\s*\d{1,9})?\s*$/, { message: 'a charge is a rational written "p/q" or an integer, e.g. "1/6"' }),
  z.number().int().min(-1e9).max(1e9),
])

export const GroupSchema = z.object({
  name: NameSchema,
  type: z.enum(['SU', 'U1', 'Z']),
  n: z.number().int().optional(),
  gauge: z.boolean(),
  description: z.string().max(200).optional(),
})

export const FieldSchema = z.object({
  name: NameSchema,
  lorentz: z.enum(LORENTZ_KINDS, { error: (iss) => lorentzKindMessage(iss.input) }),
  reps: z.record(NameSchema, z.array(z.number().int().min(0).max(12)).max(7)).optional(),
  charges: z.record(NameSchema, ChargeSchema).optional(),
  real: z.boolean().optional(),
  flavors: z.number().int().min(1).max(MAX_FLAVORS).optional(),
  gaugeOf: NameSchema.optional(),
  description: z.string().max(200).optional(),
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
  })
  .superRefine((t, ctx) => checkTheory(t, (path, message) => ctx.addIssue({ code: 'custom', path, message })))

export type Theory = z.infer<typeof TheorySchema>
export type TheoryGroup = z.infer<typeof GroupSchema>
export type TheoryField = z.infer<typeof FieldSchema>

type Report = (path: (string | number)[], message: string) => void

function checkTheory(t: { frame: string; groups: TheoryGroup[]; fields: TheoryField[]; heavy?: HeavyFrame; goldstone?: GoldstoneFrame }, report: Report): void {
  if (t.heavy !== undefined && t.frame !== 'heavy') report(['heavy'], 'a heavy particle needs the heavy-particle frame; choose that frame, or remove the heavy particle')
  checkGoldstoneFrame(t.frame, t.goldstone, report)
  const groups = new Map<string, TheoryGroup>()
  t.groups.forEach((g, i) => {
    if (groups.has(g.name)) report(['groups', i, 'name'], 'is already the name of another symmetry; give each symmetry its own name')
    groups.set(g.name, g)
    const given = g.n === undefined ? '; give n' : `, but n = ${g.n}`
    if (g.type === 'SU' && (g.n === undefined || g.n < 2 || g.n > 8)) report(['groups', i, 'n'], `SU(n) needs n from 2 to 8${given}`)
    if (g.type === 'Z' && (g.n === undefined || g.n < 2 || g.n > 64)) report(['groups', i, 'n'], `Z_n needs n from 2 to 64${given}`)
    if (g.type === 'U1' && g.n !== undefined) report(['groups', i, 'n'], `a U(1) group takes no n; remove n = ${g.n}`)
  })
  const names = new Set<string>()
  const strengths = new Set<string>()
  t.fields.forEach((f, i) => {
    const bad = (key: string | number, message: string, ...more: (string | number)[]) => report(['fields', i, key, ...more], message)
    if (names.has(f.name)) bad('name', 'is already the name of another field; give each field its own name')
    if (f.name === 'D') bad('name', RESERVED_D)
    names.add(f.name)
    checkReps(f, groups, bad)
    checkCharges(f, groups, bad)
    if (f.lorentz === 'field-strength') checkStrength(f, groups, strengths, bad)
    else if (f.gaugeOf !== undefined) bad('gaugeOf', 'only a field strength belongs to a gauge group; remove the gauge group, or make the field a field strength')
    if (f.real && f.lorentz !== 'scalar') bad('real', 'only a scalar can be declared real; make the field complex, or a scalar')
    if (f.real && f.lorentz === 'scalar') checkRealScalar(f, groups, bad)
  })
  if (t.heavy) checkHeavy(t.heavy, groups, names, report)
}

/** The heavy block names declared groups, couples to a continuous gauge group, and its fields are new names. */
function checkHeavy(h: HeavyFrame, groups: Map<string, TheoryGroup>, fieldNames: Set<string>, report: Report): void {
  const g = groups.get(h.gaugeGroup)
  if (!g) report(['heavy', 'gaugeGroup'], `the theory has no symmetry named "${h.gaugeGroup}"; choose one of its gauge groups`)
  else if (!g.gauge) report(['heavy', 'gaugeGroup'], `${h.gaugeGroup} is a global symmetry (not gauged); choose a gauge group`)
  else if (g.type === 'Z') report(['heavy', 'gaugeGroup'], `${h.gaugeGroup} is the discrete group Z_${g.n}; choose a U(1) or SU(n) gauge group`)
  // Reps and charges follow the roster's rules (a Pauli field is a fermion: not a field strength).
  const particle: TheoryField = { name: h.particle.name, lorentz: 'left-weyl', reps: h.particle.reps, charges: h.particle.charges }
  const bad: Bad = (key, message, ...more) => report(['heavy', 'particle', key, ...more], message)
  checkReps(particle, groups, bad)
  checkCharges(particle, groups, bad)
  for (const [key, name] of [['particle', h.particle.name], ['antiparticle', h.antiparticle?.name]] as const) {
    if (name === undefined) continue
    if (fieldNames.has(name)) report(['heavy', key, 'name'], `is already the name of a field of the roster; choose another name than "${name}"`)
    if (name === 'D') report(['heavy', key, 'name'], RESERVED_D)
  }
}

const RESERVED_D = 'cannot be "D", the covariant derivative; choose another name'
const NO_SUCH_GROUP = (name: string) => `the theory has no symmetry named "${name}"; declare it, or remove this entry`

type Bad = (key: string | number, message: string, ...more: (string | number)[]) => void

function checkReps(f: TheoryField, groups: Map<string, TheoryGroup>, bad: Bad): void {
  for (const [gname, labels] of Object.entries(f.reps ?? {})) {
    const g = groups.get(gname)
    if (!g) { bad('reps', NO_SUCH_GROUP(gname), gname); continue }
    if (g.type !== 'SU') { bad('reps', `${gname} is ${g.type === 'U1' ? 'a U(1)' : `Z_${g.n}`} group, which takes a charge, not Dynkin labels`, gname); continue }
    if (!validSU(g.n)) continue // the symmetry's own n is reported there
    if (labels.length !== g.n! - 1) bad('reps', `SU(${g.n}) takes ${g.n! - 1} Dynkin label${g.n === 2 ? '' : 's'}, but [${labels.join(',')}] has ${labels.length}`, gname)
    else if (weylDimension(g.n!, labels) > BigInt(MAX_REP_DIMENSION)) {
      bad('reps', `representations are limited to dimension ${MAX_REP_DIMENSION}, but [${labels.join(',')}] has dimension ${weylDimension(g.n!, labels)}`, gname)
    }
    if (f.lorentz === 'field-strength' && labels.some((a) => a !== 0)) bad('reps', `a field strength takes its representation from its gauge group; remove [${labels.join(',')}]`, gname)
  }
}

function checkCharges(f: TheoryField, groups: Map<string, TheoryGroup>, bad: Bad): void {
  for (const [gname, q] of Object.entries(f.charges ?? {})) {
    const g = groups.get(gname)
    if (!g) { bad('charges', NO_SUCH_GROUP(gname), gname); continue }
    if (g.type === 'SU') { bad('charges', `${gname} is SU(${g.n ?? 'n'}), which takes Dynkin labels, not a charge`, gname); continue }
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
  // Frobenius–Schur indicator of a product representation = product of the factors' indicators
  // (+1 real, −1 pseudoreal, 0 complex): a real (2,2) of SU(2)×SU(2) is real.
  const factors: { gname: string; labels: number[]; reality: string }[] = []
  for (const [gname, labels] of Object.entries(f.reps ?? {})) {
    const g = groups.get(gname)
    if (g?.type !== 'SU' || !validSU(g.n) || labels.length !== (g.n ?? 0) - 1) continue
    factors.push({ gname, labels, reality: irrepReality(g.n ?? 0, labels) })
  }
  const complex = factors.find((x) => x.reality === 'complex')
  const pseudo = factors.filter((x) => x.reality === 'pseudoreal')
  if (complex) bad('reps', `a real scalar must sit in a real representation, but [${complex.labels.join(',')}] is complex`, complex.gname)
  else if (pseudo.length === 1) bad('reps', `a real scalar must sit in a real representation, but [${pseudo[0]!.labels.join(',')}] is pseudoreal`, pseudo[0]!.gname)
  else if (pseudo.length % 2 === 1) {
    const list = pseudo.map((x) => `${x.gname} = [${x.labels.join(',')}]`).join(', ')
    bad('reps', `a real scalar must sit in a real representation, but the product of the reality indicators is −1: ${list} are pseudoreal (an even number of pseudoreal factors is real)`, pseudo[0]!.gname)
  }
}

function validSU(n: number | undefined): boolean {
  return n !== undefined && Number.isInteger(n) && n >= 2 && n <= 8
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
