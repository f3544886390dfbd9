/**
 * The space of heavy four-fermion contact operators at one order in 1/m, modulo IBP and the
 * heavy-field EOM (both automatic in the contact vertex, see fourVertex.ts), restricted to
 * Hermitian, rotation-scalar, parity-even, time-reversal-even (and by default C-even)
 * operators. Independence is decided by evaluating the contact vertex at random points over
 * the working primes, which must agree on the greedy basis (finite/agreement.ts).
 */
import { EngineCancelledError, EngineInputError } from '../errors'
import { PrimeSet, SeededRandom, rref, type CancelFlag, type PrimeField } from '../finite'
import { conjugateFourCombo, daggerFourCombo, fourCandidates, sigmaCount, simplifyFour, type Colour, type FourCombo } from './fourStructure'
import { evalFourCombo, pointTables, randomFourPoint, type FourPoint, type PointTables } from './fourVertex'

export interface FourCandidate {
  combo: FourCombo
  /** Anti-Hermitian as written: the physical (Hermitian) operator is i times it. */
  antiHermitian: boolean
}

export interface FourSpaceOptions {
  /** SU(N) colour dimension; 1 for an abelian gauge group (singlet colour structure only). */
  colorN?: number
  /** Impose charge conjugation (default true). */
  chargeConjugation?: boolean
  /** Impose time reversal (default true); without it every Hermitian operator counts. */
  timeReversal?: boolean
  /** Evaluate with the incoming and outgoing pairs at rest (total momentum zero). */
  restFrame?: boolean
  seed?: number
  /** Points drawn beyond those needed (for faithfulness checks). */
  extraPoints?: number
  signal?: CancelFlag
}

/**
 * Hermitian, T-even (and optionally C-even) completions of every structure with nDeriv
 * derivatives, merged and de-duplicated. Time reversal (ψ → iσ₂ψ, antiunitary; Peskin &
 * Schroeder §3.6) keeps ∂, flips each σ and conjugates coefficients; so with n σ's the
 * T-even Hermitian operator is O + O† (n even) or i(O − O†) (n odd). C-even: X + C(X).
 * @example symmetricFourCandidates(0, ['singlet']).length // 4
 */
export function symmetricFourCandidates(nDeriv: number, colours: readonly Colour[], sym: { timeReversal?: boolean; chargeConjugation?: boolean } = {}): FourCandidate[] {
  const out: FourCandidate[] = []
  const seen = new Set<string>()
  for (const s of fourCandidates(nDeriv, colours)) {
    const base: FourCombo = [{ coef: 1, s }]
    const dag = daggerFourCombo(base)
    const even = sigmaCount(s) % 2 === 0
    for (const anti of [false, true]) {
      if (sym.timeReversal !== false && anti === even) continue
      let c = simplifyFour([...base, ...dag.map((t) => ({ coef: anti ? -t.coef : t.coef, s: t.s }))])
      if (sym.chargeConjugation !== false) c = simplifyFour([...c, ...conjugateFourCombo(c)])
      if (c.length === 0) continue
      const g = c.reduce((a, t) => gcd(a, t.coef), 0) * Math.sign(c[0]!.coef)
      c = c.map((t) => ({ coef: t.coef / g, s: t.s }))
      const key = JSON.stringify(c)
      if (seen.has(key)) continue
      seen.add(key)
      out.push({ combo: c, antiHermitian: anti })
    }
  }
  return out
}

function gcd(a: number, b: number): number {
  let x = Math.abs(a)
  let y = Math.abs(b)
  while (y) [x, y] = [y, x % y]
  return x
}

interface PrimeData {
  F: PrimeField
  points: FourPoint[]
  tables: PointTables[]
  rows: number[][]
}

/** Span of the candidates' contact vertices, exact over the working primes. */
export class FourSpace {
  readonly basis: number[]
  private readonly data: PrimeData[]
  private readonly set = PrimeSet.working()

  constructor(
    readonly candidates: readonly FourCandidate[],
    readonly opts: FourSpaceOptions = {},
  ) {
    this.data = this.set.fields.map((F, i) => this.sample(F, new SeededRandom((opts.seed ?? 20261202) + 104729 * i)))
    this.basis = this.set.echelon(
      this.data.map((d) => d.rows),
      { fn: 'FourSpace' },
      opts.signal,
    ).pivots
  }

  get dimension(): number {
    return this.basis.length
  }

  /** Vertex of a combination at point j. */
  private value(d: PrimeData, c: FourCombo, j: number): number {
    return evalFourCombo(d.F, c, d.points[j]!, d.tables[j]!)
  }

  private sample(F: PrimeField, rng: SeededRandom): PrimeData {
    const d: PrimeData = { F, points: [], tables: [], rows: [] }
    let want = 8
    let extraDone = false
    for (;;) {
      while (d.points.length < want) {
        if (this.opts.signal?.aborted) throw new EngineCancelledError('four-fermion enumeration')
        const pt = randomFourPoint(F, rng, this.opts.colorN ?? 1, this.opts.restFrame)
        d.points.push(pt)
        d.tables.push(pointTables(F, pt))
        const j = d.points.length - 1
        d.rows.push(this.candidates.map((c) => this.value(d, c.combo, j)))
      }
      const r = rref(F, d.rows, this.opts.signal).rank
      if (r <= d.points.length - 3) {
        if (!extraDone && this.opts.extraPoints) {
          extraDone = true
          want = d.points.length + this.opts.extraPoints
          continue
        }
        return d
      }
      want *= 2
    }
  }

  /**
   * Rank of the given operators (evaluated as written), optionally together
   * with the enumerated basis; the primes must agree.
   */
  rankOf(combos: readonly FourCombo[], withBasis = false): number {
    const matrices = this.data.map((d) => d.points.map((_, j) => [...(withBasis ? this.basis.map((b) => d.rows[j]![b]!) : []), ...combos.map((c) => this.value(d, c, j))]))
    return this.set.rank(matrices, { fn: 'FourSpace.rankOf' }, this.opts.signal)
  }

  /** True when every given operator lies in the span of the enumerated basis. */
  contains(combos: readonly FourCombo[]): boolean {
    return this.rankOf(combos, true) === this.dimension
  }
}

const cache = new Map<string, FourSpace>()

/**
 * The four-fermion space at order 1/m² (no derivative) or 1/m⁴ (two derivatives).
 * @example fourFermionSpace(2, { colorN: 3 }).dimension // 4 (singlet and octet ¹S₀, ³S₁)
 * Method: random-point evaluation of the contact vertex over two primes (Schwartz–Zippel),
 * greedy basis in candidate order. Reference: Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125.
 */
export function fourFermionSpace(order: number, opts: FourSpaceOptions = {}): FourSpace {
  if (order !== 2 && order !== 4) throw new EngineInputError('fourFermionSpace', `Four-fermion contact operators are enumerated at orders 2 and 4 in 1/m, not at order ${order}`)
  const n = opts.colorN ?? 1
  if (!Number.isInteger(n) || n < 1 || n > 8) throw new EngineInputError('fourFermionSpace', `The number of colours must be a whole number from 1 to 8, not ${n}`)
  const key = JSON.stringify([order, n, opts.chargeConjugation ?? true, opts.timeReversal ?? true, !!opts.restFrame, opts.seed ?? 0, opts.extraPoints ?? 0])
  const hit = cache.get(key)
  if (hit) return hit
  const colours: Colour[] = n === 1 ? ['singlet'] : ['singlet', 'octet']
  const space = new FourSpace(symmetricFourCandidates(order - 2, colours, opts), opts)
  cache.set(key, space)
  return space
}
