/**
 * The independent operators of one class: candidates evaluated as symmetrised contact
 * amplitudes at random on-shell points over the working primes, exact elimination for the rank,
 * greedy choice of kept operators under the user's priorities. Results hold modulo
 * equations of motion and integration by parts; terms proportional to the equations of
 * motion move into other classes.
 */
import type { PrimeField } from '../finite/primeField'
import { PrimeSet } from '../finite/primeSet'
import type { Theory } from '../../../shared/schemas/theory'
import { parseClassKey, conjugateClass, type OperatorClass } from './classKey'
import { basisSpecies } from './species'
import type { Species } from '../theory/model'
import { classCandidates, type Candidate } from './candidates'
import { pairRows, samplePoints, type SamplePoint } from './evaluation'
import { identicalLegPermutations, type LegPermutation } from './symmetry'
import { formatLorentz } from './inputSyntax'
import { writtenTerms } from './writtenOperator'
import { combinationText } from './combinationText'
import { looksPrinted } from './printedText'
import { EngineConsistencyError } from '../errors'
import type { SuStructure } from './gaugeStructures'
import { conjugateLegMap, conjugateLorentz, conjugateSu } from './conjugation'
import type { LorentzStructure } from './lorentzStructures'
import { classParity } from './parity'
import { parityImage, parityLegMap } from './parityPartners'
import { parityColumns, reduceParityColumn, scaleRows } from './parityColumns'
import type { ClassBasis, Column, PrimeData } from './classBasisTypes'

export type { ClassBasis, Column, PrimeData }

export const BASIS_NOTE = 'modulo equations of motion and integration by parts; terms proportional to the equations of motion move into other classes'

export interface Priorities {
  /** Species labels (e.g. "H", "H*") on which derivatives are preferred. */
  derivativesOn?: string[]
  /** Operators (input syntax, per class key) to keep first when independent. */
  keep?: Record<string, string[]>
  /** Prefer Hermitian combinations where the class is self-conjugate (default true). */
  preferHermitian?: boolean
  /** Prefer P-even / P-odd combinations where parity maps the class to itself (default true). */
  preferParity?: boolean
}

export interface ClassOptions {
  priorities?: Priorities
  signal?: { aborted: boolean }
  /** Extra random rows beyond the number of candidate columns (default 12 + 25 %). */
  margin?: number
  /**
   * Reads an operator to keep that is typed in printed notation (notation/written.ts
   * `notationColumnTerms`); passed in by the callers so this module does not import the notation
   * engine, which builds class bases itself.
   */
  printed?: PrintedReader
}

/** Column terms of a printed operator to keep in a class. */
export type PrintedReader = (theory: Theory, cls: OperatorClass, text: string) => Column['terms']

/** How many redundant candidates per class are kept as alternatives for the board. */
export const MAX_ALTERNATIVES = 4

function hashSeed(s: string): number {
  let h = 2166136261
  for (let i = 0; i < s.length; i++) h = Math.imul(h ^ s.charCodeAt(i), 16777619) >>> 0
  return h
}

function derivativeScore(c: Candidate, legs: Species[], preferred: Set<string>): number {
  return c.lorentz.derivs.reduce((s, d, i) => s + (preferred.has(legs[i]!.label) ? 0 : d), 0)
}

function buildColumns(theory: Theory, particles: Species[], cls: OperatorClass, cands: Candidate[], gauge: SuStructure[][], pr: Priorities | undefined, printed?: PrintedReader): Column[] {
  const pref = new Set(pr?.derivativesOn ?? [])
  const keptTexts = pr?.keep?.[cls.key] ?? []
  const primes = PrimeSet.working()
  const kept: Column[] = keptTexts.map((text) => {
    // A kept text may be a Hermitian or parity combination as an earlier basis wrote it, or printed notation.
    if (looksPrinted(text)) {
      if (!printed) throw new EngineConsistencyError('classBasis', `a printed operator to keep ("${text}") reached a class basis without a reader for printed notation`)
      return { text, source: 'kept', terms: printed(theory, cls, text) }
    }
    const terms = writtenTerms(particles, cls, text, gauge)
    return { text, source: 'kept', terms: terms.map((t) => ({ coeff: primes.image(t.coeff), lorentz: t.lorentz, gauge: t.gauge })) }
  })
  const order = cands.map((c, i) => ({ c, i, s: derivativeScore(c, cls.legs, pref) }))
  order.sort((a, b) => a.s - b.s || a.i - b.i)
  const nG = gauge.length
  const cols: Column[] = order.map(({ c, i }) => ({
    text: formatLorentz(c.lorentz, nG > 1 ? i % nG : null),
    source: 'candidate' as const,
    terms: [{ coeff: primes.image(1), lorentz: c.lorentz, gauge: c.gauge }],
    candidate: c,
  }))
  return [...kept, ...cols]
}

/**
 * In a self-conjugate class, replace every candidate O by O + h.c. and O − h.c. (each
 * Hermitian up to a phase); the span is unchanged, so the greedy choice returns Hermitian
 * operators. Conjugates are built structurally (conjugation.ts).
 */
function hermitianColumns(cls: OperatorClass, cols: Column[]): Column[] {
  const pi = conjugateLegMap(cls)
  const cacheL = new Map<string, LorentzStructure>()
  const cacheG = new Map<string, SuStructure[]>()
  const share = <T>(cache: Map<string, T>, x: T): T => {
    const k = JSON.stringify(x)
    if (!cache.has(k)) cache.set(k, x)
    return cache.get(k)!
  }
  for (const c of cols)
    for (const t of c.terms) {
      t.lorentz = share(cacheL, t.lorentz)
      t.gauge = share(cacheG, t.gauge)
    }
  return cols.flatMap((c) => {
    if (c.source !== 'candidate') return [c]
    const t = c.terms[0]!
    const bar = {
      lorentz: share(cacheL, conjugateLorentz(t.lorentz, pi)),
      gauge: share(
        cacheG,
        t.gauge.map((s) => conjugateSu(s, pi)),
      ),
    }
    return ([1, -1] as const).map((sg) => ({
      text: combinationText(c.text, 'h.c.', sg),
      hermitianBase: c.text,
      source: 'hermitian' as const,
      candidate: c.candidate,
      conjSign: sg,
      terms: [t, { ...bar, coeff: PrimeSet.working().image(sg) }],
    }))
  })
}

/**
 * The basis of one class given by key, e.g. classBasis(smeft, "H^3 H*^3").
 * @example classBasis(realScalar, "phi^6").rank // 1
 * Method: amplitude–operator correspondence with numerical rank over F_p (Shadmi & Weiss,
 * JHEP 02 (2019) 165; Durieux, Kitahara, Shadmi & Weiss, JHEP 10 (2020) 175);
 * the working primes must agree on the pivots (else EngineConsistencyError; finite/agreement.ts).
 */
export function classBasis(theory: Theory, classKey: string | OperatorClass, opts: ClassOptions = {}): ClassBasis {
  const particles = basisSpecies(theory)
  const cls = typeof classKey === 'string' ? parseClassKey(particles, classKey) : classKey
  const { candidates, gauge } = classCandidates(theory, cls)
  const perms = identicalLegPermutations(cls.legs)
  const base = candidates.length === 0 && !opts.priorities?.keep?.[cls.key]?.length ? [] : buildColumns(theory, particles, cls, candidates, gauge, opts.priorities, opts.printed)
  const selfConjugate = conjugateClass(particles, cls).key === cls.key
  const hermCols = selfConjugate && opts.priorities?.preferHermitian !== false ? hermitianColumns(cls, base) : base
  const selfParity = opts.priorities?.preferParity !== false && parityImage(particles, cls).image?.key === cls.key
  const columns = selfParity ? parityColumns(hermCols, parityLegMap(particles, cls), gauge.length <= 1) : hermCols
  // The Hermitian columns span the same space as `base`, so base.length rows bound the rank.
  const nRows = base.length + (opts.margin ?? 12 + Math.ceil(base.length / 4))
  const set = PrimeSet.working()
  const samples = set.fields.map((F, pi) => {
    const points = samplePoints(F, theory, cls, nRows, hashSeed(`${cls.key}#${pi}`))
    return { F, points, matrix: columnMatrix(F, pi, columns, points, perms, opts.signal) }
  })
  const ctx = { fn: 'classBasis', about: `class ${cls.key}` }
  const { pivots } = set.echelon(
    samples.map((s) => s.matrix),
    ctx,
    opts.signal,
  )
  const zeros = samples.map(({ matrix }) => columns.map((_, j) => matrix.every((row) => row[j] === 0)))
  set.agree(
    zeros.map((z) => z.map(Number).join('')),
    ctx,
    'vanishing columns',
  )
  const results = samples.map((s) => ({ ...s, keptRows: s.matrix.map((row) => pivots.map((c) => row[c]!)) }))
  const zero = zeros[0]!
  const conj = conjugateClass(particles, cls)
  const reduced = pivots.map((c) => (columns[c]!.paritySign ? reduceParityColumn(columns, c, zero) : markSelfHermitian(columns, c, zero)))
  const kept = reduced.map((r) => r.column)
  const primes = results.map(({ F, points, keptRows }) => ({
    F,
    points,
    keptRows: scaleRows(
      F,
      keptRows,
      reduced.map((r) => r.halvings),
    ),
  }))
  const self = conj.key === cls.key
  return {
    key: cls.key,
    class: cls,
    conjugateKey: conj.key,
    selfConjugate: self,
    dimension: cls.dim2 / 2,
    candidates: candidates.length,
    rank: pivots.length,
    kept,
    gaugeStructures: gauge,
    perms,
    primes,
    alternatives: alternativesOf(columns, results, pivots, zero),
    parity: classParity(particles, { cls, selfConjugate: self, rank: pivots.length, kept, primes, perms }),
    note: BASIS_NOTE,
  }
}

/** The first redundant, non-vanishing candidates (one sign of each O ± h.c. pair). */
function alternativesOf(columns: Column[], results: { matrix: number[][] }[], pivots: number[], zero: boolean[]) {
  const pivotSet = new Set(pivots)
  const seen = new Set<unknown>()
  const out: { column: Column; rows: number[][] }[] = []
  for (let j = 0; j < columns.length && out.length < MAX_ALTERNATIVES; j++) {
    const col = columns[j]!
    if (pivotSet.has(j) || zero[j] || col.source === 'kept' || seen.has(col.candidate)) continue
    seen.add(col.candidate)
    out.push({ column: col, rows: results.map((r) => r.matrix.map((row) => row[j]!)) })
  }
  return out
}

/** A chosen O ± h.c. whose partner O ∓ h.c. vanishes equals 2·O: keep O itself. */
function markSelfHermitian(columns: Column[], j: number, zero: boolean[]): { column: Column; halvings: number } {
  const c = columns[j]!
  if (c.source !== 'hermitian') return { column: c, halvings: 0 }
  const partner = c.conjSign === 1 ? j + 1 : j - 1
  if (zero[partner] !== true) return { column: { ...c, selfHermitian: false }, halvings: 0 }
  return { column: { ...c, selfHermitian: true, terms: [c.terms[0]!], text: c.hermitianBase! }, halvings: 1 }
}

function columnMatrix(F: PrimeField, pi: number, columns: Column[], points: SamplePoint[], perms: LegPermutation[], signal?: { aborted: boolean }): number[][] {
  const pairIndex = new Map<LorentzStructure, Map<SuStructure[], number>>()
  const pairs: { lorentz: LorentzStructure; gauge: SuStructure[] }[] = []
  const refs = columns.map((c) =>
    c.terms.map((t) => {
      let inner = pairIndex.get(t.lorentz)
      if (!inner) pairIndex.set(t.lorentz, (inner = new Map()))
      let k = inner.get(t.gauge)
      if (k === undefined) {
        k = pairs.length
        inner.set(t.gauge, k)
        pairs.push({ lorentz: t.lorentz, gauge: t.gauge })
      }
      return { k, coeff: t.coeff[pi]! }
    }),
  )
  const table = pairRows(F, pairs, points, perms, signal)
  return table.map((row) => refs.map((terms) => terms.reduce((s, { k, coeff }) => F.add(s, F.mul(coeff, row[k]!)), 0)))
}
