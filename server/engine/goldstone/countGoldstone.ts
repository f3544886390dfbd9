/**
 * Number of independent operators of a Goldstone-frame (chiral) Lagrangian at each chiral order
 * p², p⁴, …, modulo equations of motion, integration by parts, Bianchi and Maurer–Cartan
 * identities and the trace (Cayley–Hamilton) relations of the given N; split into intrinsic
 * parity, C and P sectors, and with the number of contact terms (sources only, no Goldstone field).
 *
 * Cosets: SU(N)_L × SU(N)_R / SU(N)_V (N ≥ 2, or general N: no trace relations) and
 * O(N+1)/O(N). External sources s, p, l_μ, r_μ (traceless l, r) switched on or off, and for the
 * chiral coset the singlet vector source v_μ^(s) (U(1)_V, through its field strength); with the θ
 * term the theory is not P-invariant, and P-odd operators are counted too.
 * Method: the Hilbert series of the non-linear realization (cosetSeries.ts), summed over the
 * classes that integration by parts keeps apart; the contact terms by the linear Hilbert series
 * of G on the sources (contactSeries.ts). Reference: Graf, Henning, Lu, Melia, Murayama,
 * JHEP 01 (2021) 142; Henning, Lu, Melia, Murayama, JHEP 10 (2017) 199.
 */
import { add, rat, type Rational } from '../exact/rational'
import { EngineCancelledError, EngineInputError } from '../errors'
import { BLOCKS, blockPresent, ORTHOGONAL_BLOCKS, ORTHOGONAL_SOURCE_BLOCKS, sourceSwitch, type Block, type SourceSwitch } from './blocks'
import { contactTopological, contactTraces } from './contactSeries'
import { CosetContext, contentTraces, sectorCounts, type Sectors } from './cosetSeries'
import { OrthogonalFlavor, UnitaryFlavor } from './flavorModels'
import { TOWER_ORDER } from './towers'
import { GENERAL_N } from './unitaryIntegral'

export type CosetKind = 'chiral' | 'orthogonal'

export interface GoldstoneCountOptions {
  coset: CosetKind
  /** Flavors N (SU(N) cosets, N ≥ 2) or the N of O(N+1)/O(N) (N ≥ 1); 'general' = no N-specific relations. */
  N: number | 'general'
  /** External sources: scalar (s, p) and vector (l_μ, r_μ); a boolean switches both. */
  sources: boolean | SourceSwitch
  /** θ term present: P is not a symmetry, P-odd (C-even) operators are counted as well. */
  theta?: boolean
  maxOrder: number
  minOrder?: number
  onProgress?: (fraction: number, label: string) => void
  signal?: { aborted: boolean }
}

export interface GoldstoneClassCount {
  /** e.g. "{u,χ−,f−}^4 χ+": letters that integration by parts and the EOM turn into one another are one class. */
  key: string
  operators: number
  /** Intrinsic parity of the class: 'odd' classes contribute only terms with one ε^{μνρσ}. */
  parity: 'even' | 'odd'
}

export interface GoldstoneOrderCount {
  /** Power of p. */
  order: number
  /** Independent terms of the kept symmetries (C- and P-even, or C-even with θ), both intrinsic parities. */
  operators: number
  byParity: { even: number; odd: number }
  /** Of those, terms of the sources alone (no Goldstone field). */
  contact: number
  /** All four C, P sectors (C-odd sectors are empty for O(N+1)/O(N)). */
  sectors: Sectors
  classes: GoldstoneClassCount[]
}

export interface GoldstoneCountResult {
  coset: string
  byOrder: GoldstoneOrderCount[]
}

/** Highest chiral order accepted (for N = 3 the count to p^12 takes seconds, to p^14 about a minute). */
export const MAX_GOLDSTONE_ORDER = 14

function checkOptions(o: GoldstoneCountOptions): void {
  const fn = 'countGoldstone'
  if (!Number.isInteger(o.maxOrder) || o.maxOrder < 2 || o.maxOrder > MAX_GOLDSTONE_ORDER) {
    throw new EngineInputError(fn, `the highest chiral order must be an even power of p from 2 to ${MAX_GOLDSTONE_ORDER}, got ${o.maxOrder}`)
  }
  const min = o.minOrder ?? 2
  if (!Number.isInteger(min) || min < 2 || min > o.maxOrder) throw new EngineInputError(fn, `the lowest chiral order must be from 2 to ${o.maxOrder}, got ${min}`)
  if (o.coset !== 'chiral' && typeof o.sources === 'object' && o.sources.singletVector) {
    throw new EngineInputError(fn, 'the singlet vector source belongs to the chiral coset SU(N)×SU(N)/SU(N); for O(N+1)/O(N) switch it off')
  }
  const lowest = o.coset === 'chiral' ? 2 : 1
  if (o.N !== 'general' && (!Number.isInteger(o.N) || o.N < lowest || o.N > 12)) {
    throw new EngineInputError(fn, `N must be an integer from ${lowest} to 12 or "general" for ${cosetName(o.coset, 'N')}, got ${o.N}`)
  }
}

/** Printable name of the coset. @example cosetName('chiral', 3) // "SU(3)×SU(3)/SU(3)" */
export function cosetName(coset: CosetKind, N: number | 'general' | 'N'): string {
  const n = N === 'general' ? 'N' : String(N)
  if (coset === 'chiral') return `SU(${n})×SU(${n})/SU(${n})`
  return N === 'general' || N === 'N' ? 'O(N+1)/O(N)' : `O(${Number(N) + 1})/O(${n})`
}

/**
 * Count the operators of orders minOrder..maxOrder (even orders; odd orders have none).
 * @example countGoldstone({ coset: 'chiral', N: 3, sources: true, maxOrder: 6 }).byOrder.map(o => o.operators) // [2, 12, 117]
 */
export function countGoldstone(options: GoldstoneCountOptions): GoldstoneCountResult {
  checkOptions(options)
  const { coset, maxOrder: K } = options
  const sources = sourceSwitch(options.sources)
  const blocks = (coset === 'chiral' ? BLOCKS : ORTHOGONAL_BLOCKS).filter((b) => blockPresent(b, sources))
  const flavorN = options.N === 'general' ? (coset === 'chiral' ? GENERAL_N : K + 1) : options.N
  const flavor = coset === 'chiral' ? new UnitaryFlavor(flavorN) : new OrthogonalFlavor(flavorN)
  const ctx = new CosetContext(flavor, K, options.signal)
  const classes = cosetClasses(ctx, blocks, options)
  const contact = sources.scalar || sources.vector || sources.singletVector ? contactCounts(options, sources, flavorN) : []
  const pick = (s: Sectors) => s.cEvenPEven + (options.theta ? s.cEvenPOdd : 0)
  const byOrder: GoldstoneOrderCount[] = []
  for (let d = Math.max(2, options.minOrder ?? 2); d <= K; d++) {
    if (d % 2 === 1) continue
    const entry: GoldstoneOrderCount = { order: d, operators: 0, byParity: { even: 0, odd: 0 }, contact: 0, sectors: emptySectors(), classes: [] }
    for (const c of classes) {
      const s = c.sectors[d]!
      addSectors(entry.sectors, s)
      const n = pick(s)
      if (n === 0) continue
      entry.classes.push({ key: c.key, operators: n, parity: c.parity })
      entry.operators += n
      entry.byParity[c.parity] += n
    }
    for (const s of contact) entry.contact += pick(s[d]!)
    byOrder.push(entry)
  }
  options.onProgress?.(1, 'done')
  return { coset: cosetName(coset, options.N), byOrder }
}

function emptySectors(): Sectors {
  return { cEvenPEven: 0, cEvenPOdd: 0, cOddPEven: 0, cOddPOdd: 0 }
}

function addSectors(a: Sectors, b: Sectors): void {
  a.cEvenPEven += b.cEvenPEven
  a.cEvenPOdd += b.cEvenPOdd
  a.cOddPEven += b.cOddPEven
  a.cOddPOdd += b.cOddPOdd
}

/** Every content (letter numbers per block) with lowest order ≤ K, the empty one excluded. */
export function enumerateContents(blocks: readonly Block[], K: number): number[][] {
  const out: number[][] = []
  const rec = (i: number, counts: number[], w: number): void => {
    if (i === blocks.length) {
      if (counts.some((c) => c > 0)) out.push(counts.slice())
      return
    }
    const o = TOWER_ORDER[blocks[i]!.tower]
    for (let n = 0; w + n * o <= K; n++) {
      counts.push(n)
      rec(i + 1, counts, w + n * o)
      counts.pop()
    }
  }
  rec(0, [], 0)
  return out
}

interface ClassSeries {
  key: string
  parity: 'even' | 'odd'
  sectors: Sectors[]
}

/**
 * Sum the contents into the classes integration by parts keeps apart: in the free limit
 * ∂_μ u_ν = (symmetric part) − ½ f_−μν (Maurer–Cartan: ∇_μu_ν − ∇_νu_μ = −f_−μν) and
 * ∂·u = (i/2) χ̂_−, so u, χ_− and f_− letters (the intrinsically odd ones) are one kind, while
 * χ_+ and f_+ stay themselves.
 */
function cosetClasses(ctx: CosetContext, blocks: readonly Block[], o: GoldstoneCountOptions): ClassSeries[] {
  const contents = enumerateContents(blocks, ctx.K)
  const sums = new Map<string, { parity: 'even' | 'odd'; traces: Rational[][] }>()
  contents.forEach((counts, i) => {
    if (o.signal?.aborted) throw new EngineCancelledError('operator count')
    if (i % 16 === 0) o.onProgress?.((0.9 * i) / contents.length, `class ${i + 1} of ${contents.length}`)
    const key = classKey(blocks, counts)
    const odd = blocks.reduce((n, b, j) => n + (b.parity === -1 ? counts[j]! : 0), 0)
    const entry = sums.get(key) ?? { parity: odd % 2 === 0 ? ('even' as const) : ('odd' as const), traces: zeroTraces(ctx.K) }
    const t = contentTraces(ctx, blocks, counts).traces
    t.forEach((row, ti) =>
      row.forEach((x, d) => {
        entry.traces[ti]![d] = add(entry.traces[ti]![d]!, x)
      }),
    )
    sums.set(key, entry)
  })
  return [...sums].map(([key, e]) => ({
    key,
    parity: e.parity,
    sectors: e.traces[0]!.map((_, d) =>
      sectorCounts(
        e.traces.map((t) => t[d]!),
        `class ${key} at p^${d}`,
        deltaH(ctx, blocks, key, d),
      ),
    ),
  }))
}

function zeroTraces(K: number): Rational[][] {
  return [0, 1, 2, 3].map(() => Array.from({ length: K + 1 }, () => rat(0)))
}

/**
 * The corrections ΔH to ∫(1/P)Z, both at p⁴ (Henning, Lu, Melia, Murayama, JHEP 10 (2017) 199,
 * sect. 4: ΔH comes from currents whose divergence vanishes identically):
 * - ε^{μνρσ}⟨f_+μν f_+ρσ⟩ equals −ε⟨f_−f_−⟩ up to Chern–Simons total derivatives, and ε⟨f_−f_−⟩
 *   is a total derivative by Maurer–Cartan; the series still counts it (C-even, P-odd), once per
 *   singlet of Sym²(f_+).
 * - without sources the topological current ε^{μνρσ}⟨u_ν u_ρ u_σ⟩ is identically conserved (its
 *   divergence needs an antisymmetric ∂_μ u_ν, i.e. f_−μν = 0), so the series subtracts one total
 *   derivative too many in the class u³ (C-odd, P-even; SU(N) cosets only: O(N) has no such
 *   invariant ε_abc).
 */
function deltaH(ctx: CosetContext, blocks: readonly Block[], key: string, d: number): Partial<Sectors> {
  if (d !== 4) return {}
  const fPlus = blocks.find((b) => b.name === 'f+')
  if (key === 'v^2') return { cEvenPOdd: -1 } // ε^{μνρσ} v_μν v_ρσ: the abelian Chern–Simons density, a total derivative
  if (key === 'f+^2' && fPlus) {
    const kind = fPlus.flavor
    const sym2 =
      (ctx.flavor.singlets(
        [
          { kind, cycle: 1 },
          { kind, cycle: 1 },
        ],
        false,
      ) +
        ctx.flavor.singlets([{ kind, cycle: 2 }], false)) /
      2
    return { cEvenPOdd: -sym2 }
  }
  const content = classShape(key)
  const noMaurerCartanSource = !blocks.some((b) => b.name === 'f-')
  if (content.odd === 3 && content.even === 0 && noMaurerCartanSource && blocks[0]!.flavor === 'sl') return { cOddPEven: 1 }
  return {}
}

/** Numbers of intrinsically odd and even letters of a class key. */
function classShape(key: string): { odd: number; even: number } {
  let odd = 0
  let even = 0
  for (const part of key.split(' ').filter(Boolean)) {
    const [name, power] = part.split('^') as [string, string | undefined]
    if (name === 'χ+' || name === 'f+' || name === 'v') even += Number(power ?? 1)
    else odd += Number(power ?? 1)
  }
  return { odd, even }
}

/** Class key: the intrinsically odd letters together ("{u,χ−,f−}^2", or "u^2" without sources), then χ+ and f+. */
function classKey(blocks: readonly Block[], counts: readonly number[]): string {
  const power = (s: string, n: number) => (n === 1 ? s : `${s}^${n}`)
  const odd = blocks.reduce((n, b, j) => n + (b.parity === -1 ? counts[j]! : 0), 0)
  const oddNames = blocks.filter((b) => b.parity === -1).map((b) => b.symbol)
  const parts: string[] = []
  if (odd > 0) parts.push(power(oddNames.length === 1 ? oddNames[0]! : `{${oddNames.join(',')}}`, odd))
  blocks.forEach((b, j) => {
    if (b.parity === 1 && counts[j]! > 0) parts.push(power(b.symbol, counts[j]!))
  })
  return parts.join(' ')
}

/** Sector counts of the contact terms per order, one entry per orbit of contents. */
function contactCounts(o: GoldstoneCountOptions, sources: SourceSwitch, N: number): Sectors[][] {
  const K = o.maxOrder
  const out: Sectors[][] = []
  if (o.coset === 'orthogonal') {
    const ctx = new CosetContext(new OrthogonalFlavor(N + 1), K, o.signal)
    for (const counts of enumerateContents(ORTHOGONAL_SOURCE_BLOCKS, K)) {
      if (counts.some((n, i) => n > 0 && !blockPresent(ORTHOGONAL_SOURCE_BLOCKS[i]!, sources))) continue
      const t = contentTraces(ctx, ORTHOGONAL_SOURCE_BLOCKS, counts).traces
      const topological = (d: number) => (d === 4 && counts[0] === 0 && counts[1] === 2 ? { cEvenPOdd: -1 } : {})
      out.push(
        t[0]!.map((_, d) =>
          sectorCounts(
            t.map((r) => r[d]!),
            `contact terms χ^${counts[0]} F^${counts[1]} at p^${d}`,
            topological(d),
          ),
        ),
      )
    }
    return out
  }
  const ctx = new CosetContext(new UnitaryFlavor(N), K, o.signal)
  const maxScalar = sources.scalar ? K : 0
  const maxVector = sources.vector ? K : 0
  const maxSinglet = sources.singletVector ? K : 0
  for (let a = 0; 2 * a <= maxScalar; a++) {
    for (let b = 0; b <= a && 2 * (a + b) <= K; b++) {
      for (let c = 0; 2 * (a + b + c) <= K && 2 * c <= maxVector; c++) {
        for (let e = 0; e <= c && 2 * (a + b + c + e) <= K; e++) {
          for (let v = 0; 2 * (a + b + c + e + v) <= K && 2 * v <= maxSinglet; v++) {
            if (a + b + c + e + v === 0) continue
            const content = [a, b, c, e, v] as const
            const t = contactTraces(ctx, N, content)
            out.push(
              t[0]!.map((_, d) =>
                sectorCounts(
                  t.map((r) => r[d]!),
                  `contact terms (${content.join(',')}) at p^${d}`,
                  contactTopological(content, d),
                ),
              ),
            )
          }
        }
      }
    }
  }
  return out
}
