/**
 * Solve a linear system over Q from its images modulo several primes: solve modulo each prime,
 * require the primes to agree on solvability and on the pivot columns, lift the unknowns to
 * rationals (rationalLift.ts) and accept them only when every prime confirms them.
 */
import { EngineConsistencyError } from '../errors'
import type { Rational } from '../exact/rational'
import type { PrimeField } from './primeField'
import { rref, type CancelFlag, type ModMatrix } from './matrix'
import { agreedValue, type AgreementContext } from './agreement'
import { liftRational } from './rationalLift'

/** A x = b modulo one prime: rows are equations (e.g. sample points), columns unknowns. */
export interface ModSystem {
  a: ModMatrix
  b: number[]
}

export type SolveOutcome =
  /** The unknowns asked for (all, or opts.lift), as exact rationals. */
  | { status: 'solved'; coefficients: Rational[] }
  /** b is not in the column span of A (for every prime). */
  | { status: 'outside-span' }
  /** Unknown `index` (of those asked for) is beyond what these primes determine. */
  | { status: 'not-liftable'; index: number; residues: number[] }

interface PrimeSolution {
  pivots: number[]
  /** One solution (free unknowns 0), or null when the system is inconsistent. */
  x: number[] | null
}

function solveModP(F: PrimeField, s: ModSystem, signal?: CancelFlag): PrimeSolution {
  if (s.a.length !== s.b.length) throw new EngineConsistencyError('solveOverQ', `${s.a.length} equations but ${s.b.length} right-hand values`)
  const n = s.a.length === 0 ? 0 : s.a[0]!.length
  const e = rref(
    F,
    s.a.map((row, k) => [...row, s.b[k]!]),
    signal,
  )
  if (e.pivots.includes(n)) return { pivots: e.pivots, x: null }
  const x = new Array<number>(n).fill(0)
  e.pivots.forEach((c, i) => {
    x[c] = e.rows[i]![n]!
  })
  return { pivots: e.pivots, x }
}

/**
 * Solve systems[i] modulo fields[i] and lift the solution to Q. Free unknowns are set to 0,
 * so with dependent columns the answer is the one on the greedy pivot columns.
 * @example solveOverQ([F1, F2], [s1, s2], { fn: 'expressIn' }) // { status: 'solved', coefficients: [7001/3, 1/9000] }
 * Method: Gauss–Jordan modulo each prime, agreement of pivots, CRT and rational
 * reconstruction checked against every prime (common practice of multi-modular linear
 * algebra; von zur Gathen & Gerhard, Modern Computer Algebra, §5.5 and §5.10).
 */
export function solveOverQ(fields: readonly PrimeField[], systems: readonly ModSystem[], ctx: AgreementContext, opts: { lift?: readonly number[]; signal?: CancelFlag } = {}): SolveOutcome {
  if (fields.length !== systems.length) throw new EngineConsistencyError(ctx.fn, `${systems.length} systems for ${fields.length} primes`)
  const sols = fields.map((F, i) => solveModP(F, systems[i]!, opts.signal))
  const inside = agreedValue(
    fields,
    sols.map((s) => s.x !== null),
    ctx,
    'target being in the span',
  )
  if (!inside) return { status: 'outside-span' }
  agreedValue(
    fields,
    sols.map((s) => s.pivots.join(',')),
    ctx,
    'independent columns',
  )
  const wanted = opts.lift ?? sols[0]!.x!.map((_, j) => j)
  const primes = fields.map((F) => F.p)
  const coefficients: Rational[] = []
  for (const [index, j] of wanted.entries()) {
    const residues = sols.map((s) => s.x![j]!)
    const q = liftRational(residues, primes)
    if (!q) return { status: 'not-liftable', index, residues }
    coefficients.push(q)
  }
  return { status: 'solved', coefficients }
}
