/**
 * Which fermions can be heavy together: a set of Weyl fermions can be integrated out only when
 * every one of them gets a mass from a term that respects every symmetry of the theory (gauge and
 * global). Written as left-handed Weyl fields (a right-handed one as its conjugate), a mass term
 * ψ_a ψ_b pairs a field in representation R with one in the conjugate R̄ (a Dirac mass: L and R
 * with the same charges, or two L with conjugate charges). A field in a real representation
 * can be massive alone (a Majorana mass, symmetric in flavour); in a pseudo-real one only in
 * pairs (the invariant is antisymmetric, so the flavour mass matrix has even rank). So the
 * removed fermions must form a vector-like set: per representation R, as many Weyl copies in R
 * as in R̄, and an even number where R is pseudo-real. Such a set carries no gauge anomaly, so
 * the theory below keeps the anomaly conditions of the theory above (common practice).
 */
import type { Theory, TheoryField, TheoryGroup } from '../../../shared/schemas/theory'
import { conjugateRep, isTrivialRep, repReality } from '../group/representation'
import { type Rational, neg, parseRational, toString as ratText } from '../exact/rational'

export type Reality = 'real' | 'pseudoreal' | 'complex'

interface WeylForm {
  field: TheoryField
  key: string
  conjugateKey: string
  reality: Reality
  copies: number
}

export const isFermion = (f: TheoryField): boolean => f.lorentz === 'left-weyl' || f.lorentz === 'right-weyl'

/** Charge q under a group in the left-handed form (negated for a right-handed field), as text. */
function chargeText(q: Rational, g: TheoryGroup): string {
  if (g.type !== 'Z') return ratText(q)
  const n = BigInt(g.n ?? 1)
  return String(((q.num % n) + n) % n)
}

function keyOf(g: TheoryGroup, f: TheoryField, conjugate: boolean): string {
  if (g.type !== 'U1' && g.type !== 'Z') {
    // SU(n) labels as written (zeros for a singlet); another Lie group's labels, a finite irrep's name
    const rep = f.reps?.[g.name] ?? (g.type === 'SU' ? new Array<number>((g.n ?? 2) - 1).fill(0) : undefined)
    if (rep === undefined) return `${g.name}[trivial]`
    const r = conjugate && !isTrivialRep(g.type, rep) ? conjugateRep(g.type, g.n, rep) : rep
    return typeof r === 'string' ? `${g.name}(${r})` : `${g.name}[${r.join(',')}]`
  }
  const q = parseRational(String(f.charges?.[g.name] ?? '0'))
  return `${g.name}(${chargeText(conjugate ? neg(q) : q, g)})`
}

function realityOf(f: TheoryField, groups: readonly TheoryGroup[]): Reality {
  let pseudo = 0
  for (const g of groups) {
    if (g.type !== 'U1' && g.type !== 'Z') {
      const rep = f.reps?.[g.name]
      const r = isTrivialRep(g.type, rep) ? 'real' : repReality(g.type, g.n, rep!)
      if (r === 'complex') return 'complex'
      if (r === 'pseudoreal') pseudo++
    } else if (keyOf(g, f, false) !== keyOf(g, f, true)) return 'complex'
  }
  return pseudo % 2 === 0 ? 'real' : 'pseudoreal'
}

/** A field's representation under every group (as written, or conjugated), and its reality. */
export function representationOf(f: TheoryField, groups: readonly TheoryGroup[], conjugate = false): { key: string; conjugateKey: string; reality: Reality } {
  return {
    key: groups.map((g) => keyOf(g, f, conjugate)).join(' '),
    conjugateKey: groups.map((g) => keyOf(g, f, !conjugate)).join(' '),
    reality: realityOf(f, groups),
  }
}

/** The field as a left-handed Weyl fermion: its representation key, the conjugate's, its reality. */
function weylForm(f: TheoryField, groups: readonly TheoryGroup[]): WeylForm {
  return { field: f, ...representationOf(f, groups, f.lorentz === 'right-weyl'), copies: f.flavors ?? 1 }
}

export interface MassPartnerCheck {
  /** One sentence per representation whose removed fermions cannot all be massive. */
  problems: string[]
  /** Fields of the theory, not in the set, that complete it where exactly one fits (offered to the user). */
  partners: string[]
}

const sum = (forms: WeylForm[]) => forms.reduce((s, w) => s + w.copies, 0)
const names = (forms: WeylForm[]) => forms.map((w) => w.field.name).join(', ')
const copies = (n: number) => `${n} Weyl ${n === 1 ? 'copy' : 'copies'}`

function describeGroups(groups: readonly TheoryGroup[]): string {
  return groups.length ? groups.map((g) => g.name).join(', ') : 'the Lorentz group alone'
}

interface Problem {
  text: string
  candidates: WeylForm[]
  deficit: number
}

/** What completes a set short of `deficit` copies: one field that fits exactly, or a choice. */
function fixText(candidates: WeylForm[], deficit: number, none: string): string {
  if (!candidates.length) return none
  if (candidates.length === 1 && candidates[0]!.copies === deficit) return `the theory has ${candidates[0]!.field.name} for that`
  return `choose from ${names(candidates)} so that ${copies(deficit)} more join the set`
}

/** The problem of one complex representation R: removed copies in R and R̄ must balance. */
function complexProblem(inR: WeylForm[], inConj: WeylForm[], others: WeylForm[], groups: readonly TheoryGroup[]): Problem | null {
  const [a, b] = [sum(inR), sum(inConj)]
  if (a === b) return null
  const [more, fewer] = a > b ? [inR, inConj] : [inConj, inR]
  const candidates = others.filter((w) => w.key === more[0]!.conjugateKey)
  const head = fewer.length
    ? `${names(more)} (${copies(Math.max(a, b))}) cannot be heavy with ${names(fewer)} (${copies(Math.min(a, b))})`
    : `${names(more)} cannot be integrated out without a partner`
  const why = `a Weyl fermion gets a mass invariant under ${describeGroups(groups)} only together with a fermion in the conjugate representation (the other half of a Dirac fermion: right-handed with the same charges, or left-handed with the opposite ones)`
  const none = fewer.length
    ? 'the theory has no further fermion in the conjugate representation, so the copies cannot balance'
    : 'the theory has no such partner, so these fields stay massless until a symmetry is broken and cannot be integrated out'
  const fix = fixText(candidates, Math.abs(a - b), none)
  return { text: `${head}: ${why}; ${fix}.`, candidates, deficit: Math.abs(a - b) }
}

/** The problem of one pseudo-real representation: an odd number of copies cannot all be massive. */
function pseudorealProblem(inR: WeylForm[], others: WeylForm[]): Problem | null {
  if (sum(inR) % 2 === 0) return null
  const candidates = others.filter((w) => w.key === inR[0]!.key)
  const fix = fixText(candidates, 1, 'choose an even number of copies')
  return {
    text: `${names(inR)} (${copies(sum(inR))}) sit in a pseudo-real representation, where a mass term pairs the copies two by two (antisymmetric in flavour): an odd number cannot all be heavy; ${fix}.`,
    candidates,
    deficit: 1,
  }
}

/**
 * Whether the named fields can be integrated out together as far as fermion masses go;
 * `partners` are the fields that complete the set where exactly one fits.
 * @example checkMassPartners(dirac, ['eL']) // { problems: ['eL cannot be integrated out without a partner: …; the theory has eR for that.'], partners: ['eR'] }
 */
export function checkMassPartners(theory: Theory, removed: readonly string[]): MassPartnerCheck {
  const chosen = new Set(removed)
  const forms = theory.fields.filter(isFermion).map((f) => weylForm(f, theory.groups))
  const inSet = forms.filter((w) => chosen.has(w.field.name))
  const others = forms.filter((w) => !chosen.has(w.field.name))
  const problems: string[] = []
  const partners: string[] = []
  const seen = new Set<string>()
  for (const w of inSet) {
    if (seen.has(w.key) || w.reality === 'real') continue
    seen.add(w.key).add(w.conjugateKey)
    const inR = inSet.filter((x) => x.key === w.key)
    const problem =
      w.reality === 'pseudoreal'
        ? pseudorealProblem(inR, others)
        : complexProblem(
            inR,
            inSet.filter((x) => x.key === w.conjugateKey),
            others,
            theory.groups,
          )
    if (!problem) continue
    problems.push(problem.text)
    const [only] = problem.candidates
    if (problem.candidates.length === 1 && only!.copies === problem.deficit) partners.push(only!.field.name)
  }
  return { problems, partners }
}

/**
 * For each fermion of the theory, the other fermions that can give it a mass (its conjugate
 * representation; for a pseudo-real one, the same): the form ticks them along with it.
 */
export function partnerMap(theory: Theory): Record<string, string[]> {
  const forms = theory.fields.filter(isFermion).map((f) => weylForm(f, theory.groups))
  const out: Record<string, string[]> = {}
  for (const w of forms) {
    if (w.reality === 'real') continue
    const target = w.reality === 'pseudoreal' ? w.key : w.conjugateKey
    const found = forms.filter((o) => o !== w && o.key === target).map((o) => o.field.name)
    if (found.length) out[w.field.name] = found
  }
  return out
}
