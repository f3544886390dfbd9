/**
 * The space of bilinear operators ψ† O ψ at one order in 1/m (dim O = order + 1), modulo
 * the heavy field's leading-order EOM and integration by parts, restricted to rotation
 * scalars, Hermitian after completion, and — when imposed — parity even and time-reversal
 * even. Several gauge factors (one SU(N) and any number of U(1)s, coupled or only present as
 * external field strengths) are described by a GaugeSetup (symbol.ts).
 */
import { EngineInputError, EngineCancelledError } from '../errors'
import type { CancelFlag } from '../finite'
import { elementSignature, type Element } from './algebra'
import { candidateStructures, relationStructures, tracedCombos } from './candidates'
import { QuotientSpace } from './quotient'
import { daggerCombo, expandCombo, expandStructure, fieldLetterOf, isParityEven, simplifyCombo, thetaCombo, type Combo, type Letter } from './structure'
import { singleFactor, type GaugeSetup } from './symbol'

export interface SymmetricCandidate {
  combo: Combo
  /** Anti-Hermitian in the real algebra (the physical operator carries a factor i). */
  antiHermitian: boolean
  /** Odd under parity / time reversal (only when that symmetry is not imposed). */
  parityOdd?: boolean
  timeOdd?: boolean
  element: Element
}

/** What one order's space is computed for. */
export interface SpaceConfig {
  setup: GaugeSetup
  parity: boolean
  timeReversal: boolean
}

export interface OrderSpace {
  order: number
  config: SpaceConfig
  candidates: SymmetricCandidate[]
  space: QuotientSpace
}

const cache = new Map<string, OrderSpace>()

/** Forget the memoised spaces (benchmarks time cold computations). */
export function clearOrderSpaces(): void {
  cache.clear()
}

function gcd(a: number, b: number): number {
  let x = Math.abs(a)
  let y = Math.abs(b)
  while (y) [x, y] = [y, x % y]
  return x
}

/** Field-strength letters of every factor, and those of the coupled SU(N) factor (for traces). */
function fieldLetters(setup: GaugeSetup): { all: Letter[]; traced: Letter[] } {
  const all = setup.factors.flatMap((_, g) => [fieldLetterOf('E', g), fieldLetterOf('B', g)])
  const su = setup.factors.findIndex((f) => f.kind === 'su' && f.coupled)
  return { all, traced: su >= 0 && setup.colorN > 1 ? [fieldLetterOf('E', su), fieldLetterOf('B', su)] : [] }
}

/**
 * Hermitian completions of each candidate, Θ = T∘†-even (or both Θ-parities when T is not
 * imposed), de-duplicated. Θ-even and †-definite ⇔ the physical operator (times i if
 * anti-Hermitian) is Hermitian and time-reversal even; Θ-odd ⇔ Hermitian and T-odd.
 */
export function symmetricCandidates(order: number, signal?: CancelFlag, config: SpaceConfig = defaultConfig(1), extraSeeds: readonly Combo[] = []): SymmetricCandidate[] {
  const seen = new Set<string>()
  const out: SymmetricCandidate[] = []
  const { all, traced } = fieldLetters(config.setup)
  const anyParity = !config.parity
  const seeds: Combo[] = [...tracedCombos(order + 1, traced, anyParity), ...candidateStructures(order + 1, all, anyParity).map((s): Combo => [{ coef: 1, s }]), ...extraSeeds]
  for (const base of seeds) {
    if (signal?.aborted) throw new EngineCancelledError('heavy enumeration')
    for (const theta of config.timeReversal ? [1] : [1, -1]) {
      const sym = simplifyCombo([...base, ...thetaCombo(base).map((t) => ({ coef: theta * t.coef, s: t.s }))])
      if (sym.length === 0) continue
      for (const anti of [false, true]) {
        const raw = simplifyCombo([...sym, ...daggerCombo(sym).map((t) => ({ coef: anti ? -t.coef : t.coef, s: t.s }))])
        if (raw.length === 0) continue
        const g = raw.reduce((acc, t) => gcd(acc, t.coef), 0)
        const c = raw.map((t) => ({ coef: t.coef / g, s: t.s }))
        const element = expandCombo(c, config.setup)
        if (element.size === 0) continue
        const sig = elementSignature(element)
        if (seen.has(sig)) continue
        seen.add(sig)
        const parityOdd = !isParityEven(c[0]!.s)
        out.push({ combo: c, antiHermitian: anti, element, ...(parityOdd ? { parityOdd } : {}), ...(theta < 0 ? { timeOdd: true } : {}) })
      }
    }
  }
  return out
}

/** One coupled factor (U(1) or SU(colorN)), or none for a neutral particle; P and T imposed. */
export function defaultConfig(colorN: number, charged = true): SpaceConfig {
  return { setup: charged ? singleFactor(colorN) : { colorN: 1, factors: [] }, parity: true, timeReversal: true }
}

/**
 * Build (or fetch from the memo) the quotient space at one order for a configuration.
 * @example orderSpaceFor(1, defaultConfig(1)).space.dimension // 2 (kinetic D² and σ·B)
 * Method: candidates and relations mapped to their gauge-field symbols over two primes
 * (see symbol.ts, quotient.ts); greedy basis in candidate order.
 * Reference: Manohar, Phys. Rev. D 56 (1997) 230 (operator basis of the heavy-fermion theory).
 */
export function orderSpaceFor(order: number, config: SpaceConfig, signal?: CancelFlag): OrderSpace {
  if (!Number.isInteger(order) || order < 1 || order > 4) {
    throw new EngineInputError('orderSpace', `The power of 1/m must be a whole number from 1 to 4, not ${order}`)
  }
  const key = `${order}:${JSON.stringify(config)}`
  const hit = cache.get(key)
  if (hit) return hit
  const candidates = symmetricCandidates(order, signal, config)
  const relations = relationStructures(order + 1, !config.parity)
    .map((s) => expandStructure(s))
    .filter((e) => e.size > 0)
  const space = new QuotientSpace(
    candidates.map((c) => c.element),
    relations,
    {
      sectors: config.setup.factors.length > 0 ? [0, 1, 2] : [0],
      signal,
      setup: config.setup,
    },
  )
  const res: OrderSpace = { order, config, candidates, space }
  cache.set(key, res)
  return res
}

/**
 * The space for one coupled gauge factor (U(1), or SU(colorN) with the heavy field in the
 * fundamental), P and T imposed.
 * @example orderSpace(1, true).space.dimension // 2 (kinetic D² and σ·B)
 */
export function orderSpace(order: number, charged: boolean, signal?: CancelFlag, colorN = 1): OrderSpace {
  return orderSpaceFor(order, defaultConfig(colorN, charged), signal)
}
