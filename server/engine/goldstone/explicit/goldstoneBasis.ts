/**
 * Explicit operator bases of the chiral Lagrangian SU(N)_L × SU(N)_R / SU(N)_V at p², p⁴, p⁶,
 * tally-checked against the Hilbert series (countGoldstone.ts), with exact rewrites.
 *
 * Method (independent of the Hilbert series): candidates are enumerated as trace monomials of the
 * building blocks (candidates.ts); their leading values at random configurations mod p fix the
 * rank of each letter degree and the kept operators (selection.ts); then every kept operator and
 * a choice of alternatives is evaluated exactly on the classical solution of the lowest-order
 * equation of motion (perturbiner.ts, exactValue.ts) at the same configurations, for two primes.
 * Those values are the fingerprints of the board: an alternative is rewritten onto the kept ones
 * by solving the linear system mod each prime and lifting to rationals (both primes must agree),
 * which is exact modulo EOM, IBP, Bianchi and Maurer–Cartan identities and the trace relations
 * of the given N. For "general N" the operators are evaluated at N = max(order, 3) (no trace
 * relation involves so few letters), so the rewrite coefficients hold at that N.
 */
import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../../errors'
import { toString as ratString } from '../../exact/rational'
import { expressIn, type Fingerprint } from '../../board/fingerprints'
import { PrimeField } from '../../finite/primeField'
import { explicitPrimes } from './graded'
import { SeededRandom } from '../../finite/rng'
import { rank as matrixRank, rref } from '../../finite/matrix'
import { countGoldstone } from '../countGoldstone'
import { sourceSwitch, type SourceSwitch } from '../blocks'
import { contactCandidates, cosetCandidates, type Candidate } from './candidates'
import { ExactEvaluator } from './exactValue'
import { randomConfig, type Config, type LegKind } from './kinematics'
import { letterCount, operatorText, type Operator } from './monomial'
import { ClassicalSolution } from './perturbiner'
import { selectBlock, simplify, type BlockResult } from './selection'
import { classContent } from './configs'
import { FreeEvaluator } from './freeValue'

export interface GoldstoneBasisOptions {
  N: number | 'general'
  /** External sources: scalar (s, p) and vector (l_μ, r_μ); a boolean switches both. */
  sources: boolean | SourceSwitch
  maxOrder: number
  minOrder?: number
  /** Set-aside alternatives shown per order (default 40). */
  maxAlternatives?: number
  /** Operator texts to keep first when independent, per order key ("p^4"). */
  keep?: Record<string, string[]>
  onProgress?: (fraction: number, label: string) => void
  signal?: { aborted: boolean }
}

export interface GoldstoneRewriteTerm {
  text: string
  coefficient: string
}

export interface GoldstoneOperator {
  text: string
  latex: string
  /** Hilbert-series class, or "contact" for a source-only operator. */
  classKey: string
  letters: number
  parity: 'even' | 'odd'
  contact: boolean
  fingerprint: Fingerprint
  /** For an alternative: its exact rewrite onto the kept operators. */
  rewrite?: GoldstoneRewriteTerm[]
}

export interface GoldstoneClassTally {
  key: string
  hilbert: number
  rank: number
  tallyOk: boolean
}

export interface GoldstoneOrderBasis {
  order: number
  key: string
  /** Hilbert-series count (all C- and P-even terms). */
  hilbert: number
  rank: number
  tallyOk: boolean
  contact: { hilbert: number; rank: number; kept: number }
  classes: GoldstoneClassTally[]
  kept: GoldstoneOperator[]
  alternatives: GoldstoneOperator[]
  message?: string
}

export interface GoldstoneBasisResult {
  coset: string
  evaluatedAtN: number
  note: string
  byOrder: GoldstoneOrderBasis[]
}

export const MAX_EXPLICIT_ORDER = 6

export const GOLDSTONE_NOTE =
  'modulo equations of motion, integration by parts, Bianchi and Maurer–Cartan identities and the trace relations of N; each operator C- and P-even and Hermitian with a real coefficient'

/**
 * Build the explicit bases of orders minOrder..maxOrder (even).
 * @example goldstoneBasis({ N: 3, sources: true, maxOrder: 4 }).byOrder[1].kept.length // 12
 */
export function goldstoneBasis(o: GoldstoneBasisOptions): GoldstoneBasisResult {
  if (!Number.isInteger(o.maxOrder) || o.maxOrder < 2 || o.maxOrder > MAX_EXPLICIT_ORDER) {
    throw new EngineInputError('goldstoneBasis', `explicit bases are built up to p^${MAX_EXPLICIT_ORDER}; the highest order asked for is p^${o.maxOrder} (the count goes further)`)
  }
  const min = o.minOrder ?? 2
  const orders = [2, 4, 6].filter((d) => d >= min && d <= o.maxOrder)
  const evalN = o.N === 'general' ? Math.max(o.maxOrder, 3) : o.N
  const byOrder = orders.map((d, i) => buildOrder(d, evalN, o, (f, label) => o.onProgress?.((i + f) / orders.length, `p^${d}: ${label}`)))
  o.onProgress?.(1, 'done')
  return { coset: countGoldstone({ coset: 'chiral', N: o.N, sources: o.sources, maxOrder: 2 }).coset, evaluatedAtN: evalN, note: GOLDSTONE_NOTE, byOrder }
}

function prioritized(cands: Candidate[], keep: string[] | undefined): Candidate[] {
  const rank = (c: Candidate) => {
    const k = keep?.indexOf(operatorText(c.op)) ?? -1
    return k >= 0 ? k : (keep?.length ?? 0) + (c.contact ? 0 : 1000)
  }
  return cands
    .map((c, i) => ({ c, i }))
    .sort((a, b) => rank(a.c) - rank(b.c) || compareScores(a.c.score, b.c.score) || a.i - b.i)
    .map((x) => x.c)
}

function compareScores(a: number[], b: number[]): number {
  for (let i = 0; i < Math.max(a.length, b.length); i++) if ((a[i] ?? 0) !== (b[i] ?? 0)) return (a[i] ?? 0) - (b[i] ?? 0)
  return 0
}

function lettersOfClass(key: string): number {
  const c = classContent(key)
  return c.odd + c.chiPlus + c.fPlus
}

/** The candidates of one order, their selection per letter degree, and the configurations that separate them. */
export interface OrderSelection {
  count: ReturnType<typeof countGoldstone>['byOrder'][number]
  blocks: BlockResult[]
  configs: Config[]
  patterns: LegKind[][]
  fields: [PrimeField, PrimeField]
  tidy: (c: Candidate) => Candidate
}

/**
 * Select the kept operators of one order and the configurations that fix its fingerprints. The
 * configurations depend only on (order, N, sources), not on the priorities, so a later call
 * reproduces the points of a stored basis (typed rewrites, typedGoldstone.ts).
 */
export function selectOrder(order: number, N: number, o: GoldstoneBasisOptions, progress: (f: number, label: string) => void): OrderSelection {
  const count = countGoldstone({ coset: 'chiral', N: o.N, sources: o.sources, maxOrder: order, minOrder: order }).byOrder[0]!
  const key = `p^${order}`
  const sources = sourceSwitch(o.sources)
  const cands = prioritized([...contactCandidates(order, o.N, sources), ...cosetCandidates(order, sources)], o.keep?.[key])
  const [p1, p2] = explicitPrimes(2) as [number, number]
  const F = new PrimeField(p1)
  const rng = new SeededRandom(1000 + order)
  const blocks: BlockResult[] = []
  const degrees = [...new Set(cands.map((c) => c.letters))].sort((a, b) => a - b)
  const oddKinds: LegKind[] = ['pion', ...(sources.scalar ? ['p' as const] : []), ...(sources.vector ? ['a' as const] : [])]
  const anySource = sources.scalar || sources.vector
  for (const m of degrees) {
    progress((0.3 * blocks.length) / degrees.length, `leading values, ${m} letters`)
    const classes = count.classes.filter((c) => lettersOfClass(c.key) === m).map((c) => ({ key: c.key, count: c.operators }))
    const target = classes.reduce((s, c) => s + c.count, 0)
    if (order === 2 && !anySource)
      blocks.push(
        wholeBlock(
          cands.filter((c) => c.letters === m),
          m,
          target,
        ),
      )
    else
      blocks.push(
        selectBlock(
          cands.filter((c) => c.letters === m),
          m,
          classes,
          { F, rng, N, oddKinds, signal: o.signal },
        ),
      )
  }
  const tidy = tidier(F, blocks)
  if (o.keep?.[key]?.length) reprioritize(F, blocks, o.keep[key]!, tidy)
  // the configurations that raised a class's rank separate the kept operators exactly (block triangularity)
  const configs = order === 2 && !anySource ? lowOrderConfigs(F, rng, N) : blocks.flatMap((b) => b.pivots.map((k) => b.configs[k]!))
  const patterns = order === 2 && !anySource ? configs.map((c) => c.legs.map((l) => l.kind)) : blocks.flatMap((b) => b.pivots.map((k) => b.patterns[k]!))
  return { count, blocks, configs, patterns, fields: [F, new PrimeField(p2)], tidy }
}

function buildOrder(order: number, N: number, o: GoldstoneBasisOptions, progress: (f: number, label: string) => void): GoldstoneOrderBasis {
  const { count, blocks, configs, patterns, fields, tidy } = selectOrder(order, N, o, progress)
  const key = `p^${order}`
  const keptRaw = blocks.flatMap((b) => b.kept)
  const live = blocks.flatMap((b) => b.candidates).filter((c) => !keptRaw.includes(c))
  const altRaw = [...live.filter((c) => c.contact), ...live.filter((c) => !c.contact)].slice(0, o.maxAlternatives ?? 40)
  const kept = keptRaw.map(tidy)
  const alternatives = altRaw.map(tidy)
  const contactAll = live.filter((c) => c.contact && !altRaw.includes(c))
  const everything = [...kept, ...alternatives, ...contactAll]
  const prints = exactFingerprints(
    everything.map((c) => c.op),
    fields,
    configs,
    patterns,
    N,
    order,
    o.signal,
    (f) => progress(0.3 + 0.7 * f, 'exact values'),
    everything,
  )
  const keptPrints = kept.map((c) => prints.get(c)!)
  const exactRank = rankOf(keptPrints)
  const contactPrints = [...kept, ...contactAll].filter((c) => c.contact).map((c) => prints.get(c)!)
  const describe = (c: Candidate): GoldstoneOperator => ({
    text: operatorText(c.op),
    latex: operatorText(c.op, true),
    classKey: c.classKey,
    letters: c.letters,
    parity: c.parity,
    contact: c.contact,
    fingerprint: prints.get(c)!,
  })
  const keptOps = kept.map(describe)
  const altOps = alternatives.map((c) => {
    const combo = expressIn(keptPrints, prints.get(c)!)
    if (!combo) throw new EngineConsistencyError('goldstoneBasis', `${operatorText(c.op)} at ${key} is not a combination of the kept operators`)
    const rewrite = combo.coefficients.map((q, i) => ({ text: keptOps[i]!.text, coefficient: ratString(q) })).filter((t) => t.coefficient !== '0')
    return { ...describe(c), rewrite }
  })
  return tally(order, key, count, blocks, keptOps, altOps, exactRank, rankOf(contactPrints))
}

function tally(
  order: number,
  key: string,
  count: ReturnType<typeof countGoldstone>['byOrder'][number],
  blocks: BlockResult[],
  kept: GoldstoneOperator[],
  alternatives: GoldstoneOperator[],
  exactRank: number,
  contactRank: number,
): GoldstoneOrderBasis {
  const classes = count.classes.map((c) => {
    const rank = blocks.find((b) => b.m === lettersOfClass(c.key))?.classRanks.get(c.key) ?? 0
    return { key: c.key, hilbert: c.operators, rank, tallyOk: rank === c.operators }
  })
  const contact = { hilbert: count.contact, rank: contactRank, kept: kept.filter((k) => k.contact).length }
  const problems: string[] = []
  if (exactRank !== count.operators) problems.push(`the kept operators have exact rank ${exactRank}, the Hilbert series counts ${count.operators}`)
  for (const c of classes) if (!c.tallyOk) problems.push(`class ${c.key}: rank ${c.rank}, Hilbert series ${c.hilbert}`)
  if (contact.rank !== contact.hilbert) problems.push(`contact terms: rank ${contact.rank}, Hilbert series ${contact.hilbert}`)
  const tallyOk = problems.length === 0
  return { order, key, hilbert: count.operators, rank: exactRank, tallyOk, contact, classes, kept, alternatives, ...(tallyOk ? {} : { message: problems.join('; ') }) }
}

/** Merged like terms and reduced coefficients, checked against the candidate's leading values. */
function tidier(F: PrimeField, blocks: BlockResult[]): (c: Candidate) => Candidate {
  const evaluators = new Map(blocks.map((b) => [b, b.configs.map((cfg) => new FreeEvaluator(F, cfg))]))
  return (c) => {
    const b = blocks.find((x) => x.columns.has(c))
    return b ? simplify(F, c, b.columns.get(c)!, evaluators.get(b)!) : c
  }
}

/**
 * Keep first the operators a user asked for, matched by their shown (merged) text: the greedy
 * choice is redone on the leading values already computed, in the new priority order.
 */
function reprioritize(F: PrimeField, blocks: BlockResult[], keep: string[], tidy: (c: Candidate) => Candidate): void {
  const wanted = new Map(keep.map((text, i) => [text, i]))
  for (const b of blocks) {
    if (b.columns.size === 0) continue
    const order = b.candidates.map((c, i) => ({ c, k: wanted.get(operatorText(tidy(c).op)) ?? keep.length + i })).sort((x, y) => x.k - y.k)
    const e = rref(
      F,
      b.configs.map((_, r) => order.map(({ c }) => b.columns.get(c)![r]!)),
    )
    b.candidates = order.map(({ c }) => c)
    b.kept = e.pivots.map((col) => order[col]!.c)
  }
}

/** p² without sources: ⟨u·u⟩ is invisible in two-leg values (a kinetic term); it is kept and the exact rank decides. */
function wholeBlock(cands: Candidate[], m: number, target: number): BlockResult {
  return { m, target, rank: target, configs: [], patterns: [], candidates: cands, kept: cands, classRanks: new Map(cands.map((c) => [c.classKey, 1])), columns: new Map(), pivots: [] }
}

function lowOrderConfigs(F: PrimeField, rng: SeededRandom, N: number): Config[] {
  return [0, 1].map(() => randomConfig(F, rng, N, ['pion', 'pion', 'pion', 'pion']))
}

/**
 * Exact values of the operators at the configurations (prime 1) and at fresh ones of the same
 * patterns (prime 2); `letters` is each operator's number of letters (its filtration degree).
 */
export function exactFingerprints<T>(
  ops: readonly Operator[],
  fields: readonly PrimeField[],
  configs: readonly Config[],
  patterns: readonly LegKind[][],
  N: number,
  order: number,
  signal: { aborted: boolean } | undefined,
  progress: (f: number) => void,
  keys: readonly T[],
): Map<T, Fingerprint> {
  const letters = ops.map((op) => Math.min(...op.terms.map((t) => letterCount(t.mono))))
  const values = ops.map(() => fields.map(() => [] as number[]))
  fields.forEach((F, fi) => {
    const rng = new SeededRandom(7000 + order + fi)
    const list = fi === 0 ? configs : patterns.map((k) => randomConfig(F, rng, N, k))
    list.forEach((cfg, k) => {
      if (signal?.aborted) throw new EngineCancelledError('basis')
      progress((fi * list.length + k) / (fields.length * list.length))
      const n = cfg.legs.length
      // as many letters as legs: the exact value is the leading one; more letters than legs: zero
      const needExact = letters.some((m) => m < n)
      const ev = needExact ? new ExactEvaluator(new ClassicalSolution(F, cfg)) : null
      const free = new FreeEvaluator(F, cfg)
      ops.forEach((op, j) => values[j]![fi]!.push(letters[j]! > n ? 0 : letters[j] === n ? free.operator(op) : ev!.operator(op)))
    })
  })
  return new Map(keys.map((c, j) => [c, { primes: fields.map((F) => F.p), values: values[j]! }]))
}

function rankOf(prints: Fingerprint[]): number {
  if (prints.length === 0) return 0
  const ranks = prints[0]!.primes.map((p, i) =>
    matrixRank(
      new PrimeField(p),
      prints[0]!.values[i]!.map((_, k) => prints.map((fp) => fp.values[i]![k]!)),
    ),
  )
  if (new Set(ranks).size !== 1) throw new EngineConsistencyError('goldstoneBasis', `the two primes disagree on a rank (${ranks.join(' vs ')})`)
  return ranks[0]!
}
