/**
 * Tree-level matching of a heavy real scalar, order 0 only (this version): the change of each
 * light four-scalar quartic coupling when S is integrated out.
 *
 * Method: on-shell matching. At tree level the light four-point contact coefficients equal the
 * heavy-exchange part of the four-point amplitude expanded in 1/M (light exchanges are the
 * same on both sides). Amplitudes are invariant under field redefinitions, so the result holds
 * modulo equations of motion and integration by parts. With iM the sum of Feynman diagrams and
 * a vertex from L ⊃ +c·O equal to i·c·A_O (A_O the operator's symmetrised contact amplitude, as
 * the board's fingerprints hold it: the product of n! over repeated fields for a scalar
 * constant), one S exchange gives M = −V₁V₂/(P² − M²) = V₁V₂/M² + O(P²/M⁴). The order-0 part
 * is written as a typed operator (divided by the same n! product, so that its symmetrisation is
 * M) and solved in the child's kept basis at the class's sample points, separately for each
 * coupling monomial, so every coefficient is exact: rational × couplings / M².
 * Convention: L contains +c·O with O exactly as printed; L ⊃ −½M²S²; tree level only.
 * Reference for the method: on-shell EFT matching, e.g. Shadmi & Weiss, JHEP 02 (2019) 165
 * (amplitude–operator correspondence); the propagator i/(P² − M²) is common practice.
 */
import type { Theory } from '../../../shared/schemas/theory'
import { EngineConsistencyError, EngineInputError } from '../errors'
import { resolveCouplings, type ResolvedCoupling } from '../basis/orderZeroCouplings'
import { orderZero } from '../basis/orderZero'
import { basisSpecies } from '../basis/species'
import { parseClassKey } from '../basis/classKey'
import { typedFingerprint } from '../board/typedOperator'
import { expressIn, type Fingerprint } from '../board/fingerprints'
import { readClassKey } from '../theory/classKey'
import { toString as ratText, rat, type Rational } from '../exact/rational'
import type { Species } from '../theory/model'
import { childTheory } from '../scales/integrateOut'
import { isTrivialRep } from '../group/representation'

/** One cubic coupling c·S·a·b with its light legs (species labels) and the factor A_O/c. */
interface Vertex {
  symbol: string
  light: string[]
  factor: number
}

export interface OrderZeroShift {
  classKey: string
  operator: string
  latex: string
  /** nerdamer-parsable: the change of the coefficient (not the new total). */
  coefficient: string
}

export interface ScalarMatchResult {
  /** The light theory below the heavy field's mass (its couplings kept, those of S dropped). */
  child: Theory
  shifts: OrderZeroShift[]
  assumptions: string
  /** What this version does not compute, in words (never silently omitted). */
  notComputed: string[]
}

const NOT_COMPUTED = [
  'classes with derivatives (mass dimension 6 and above, from the P²/M² terms of the S propagator): not computed at tree level by this version',
  'classes with more than four legs (e.g. six scalars from two S exchanges, or from S³ and S² couplings): not computed at tree level by this version',
]

export const SCALAR_MATCH_ASSUMPTIONS =
  'Tree level only. L contains +c·O with O exactly as printed, and −½M²S² for the heavy real scalar S. ' +
  'Coefficients are changes of the order-0 couplings, not new totals. Operators without a coupling symbol are taken as absent. ' +
  'This version computes order 0 (the quartic shifts) from one S exchange between cubic couplings S·a·b of light scalars that are singlets of every SU(n) (U(1) and Z_n charges allowed); other couplings and higher dimensions are listed as not computed.'

const factorial = (n: number): number => (n <= 1 ? 1 : n * factorial(n - 1))

function heavyScalar(theory: Theory, name: string) {
  const f = theory.fields.find((x) => x.name === name)
  if (!f) throw new EngineInputError('matchHeavyScalar', `Theory "${theory.name}" has no field "${name}"; choose a field of its roster`)
  const charged = theory.groups.some((g) => g.type !== 'U1' && g.type !== 'Z' && !isTrivialRep(g.type, f.reps?.[g.name]))
  if (f.lorentz !== 'scalar' || !f.real || charged) throw new EngineInputError('matchHeavyScalar', `"${name}" is not a real scalar singlet; this version matches a heavy real singlet scalar only`)
  if (!f.mass) throw new EngineInputError('matchHeavyScalar', `"${name}" has no mass symbol; give it one in the theory (fields → mass → symbol, e.g. "M")`)
  return f.mass.symbol
}

/** Cubic couplings with exactly one S and two light scalars; a coupling mixing S with a light field is refused. */
function verticesOf(couplings: ResolvedCoupling[], heavy: string, species: Map<string, Species>, skipped: string[]): Vertex[] {
  const out: Vertex[] = []
  for (const c of couplings) {
    const { derivatives, blocks } = readClassKey(c.classKey)
    const s = blocks.find((b) => b.label === heavy)?.power ?? 0
    const legs = blocks.reduce((n, b) => n + b.power, 0)
    if (s === 0 || s === legs) continue
    if (legs === 2) throw new EngineInputError('matchHeavyScalar', `Coupling "${c.symbol}" mixes ${heavy} with a light field; diagonalise the masses first (this version needs no mass mixing)`)
    const light = blocks.filter((b) => b.label !== heavy).flatMap((b) => Array<string>(b.power).fill(b.label))
    // SU(n)-charged light legs need the exchange's gauge contraction written out: not in this version.
    const charged = light.some((l) => Object.values(species.get(l)?.reps ?? {}).some((labels) => labels.some((a) => a !== 0)))
    if (legs !== 3 || s !== 1 || derivatives > 0 || charged || light.some((l) => species.get(l)?.lorentz !== 'S')) {
      skipped.push(`the operators generated through coupling "${c.symbol}" (${c.classKey}): not computed at tree level by this version`)
      continue
    }
    out.push({ symbol: c.symbol, light, factor: blocks.reduce((p, b) => p * factorial(b.power), 1) })
  }
  return out
}

const sameMultiset = (a: string[], b: string[]) => [...a].sort().join(' ') === [...b].sort().join(' ')

/** Σ over the three pairings of the class's legs that put v1's legs at one vertex and v2's at the other. */
function pairingWeight(legs: string[], v1: Vertex, v2: Vertex): number {
  const pairings: [number[], number[]][] = [
    [
      [0, 1],
      [2, 3],
    ],
    [
      [0, 2],
      [1, 3],
    ],
    [
      [0, 3],
      [1, 2],
    ],
  ]
  let count = 0
  for (const [a, b] of pairings) {
    const la = a.map((i) => legs[i]!)
    const lb = b.map((i) => legs[i]!)
    if ((sameMultiset(la, v1.light) && sameMultiset(lb, v2.light)) || (sameMultiset(la, v2.light) && sameMultiset(lb, v1.light))) count++
  }
  return count * v1.factor * v2.factor
}

function monomial(v1: Vertex, v2: Vertex, mass: string): string {
  return v1 === v2 ? `${v1.symbol}^2/${mass}^2` : `${v1.symbol}*${v2.symbol}/${mass}^2`
}

function termText(r: Rational, mono: string): string {
  const t = ratText(r)
  return t === '1' ? mono : `(${t})*${mono}`
}

/**
 * The order-0 shifts of the light quartic couplings when the heavy real scalar `heavy` is
 * integrated out at tree level, in the child's kept order-0 basis.
 * @example matchHeavyScalar(singlet, 'S') // shifts: [{ classKey: 'phi^4', operator: '1', coefficient: 'kappa^2/M^2' }]
 */
export function matchHeavyScalar(theory: Theory, heavy: string): ScalarMatchResult {
  const mass = heavyScalar(theory, heavy)
  const value = theory.fields.find((f) => f.name === heavy)!.mass!.value
  const child = childTheory(theory, new Set([heavy]), value ? `${mass} = ${value.number.trim()} ${value.unit ?? ''}`.trim() : mass)
  const particles = basisSpecies(child)
  const species = new Map(particles.map((p) => [p.label, p]))
  const notComputed = [...NOT_COMPUTED]
  const vertices = verticesOf(resolveCouplings(theory), heavy, species, notComputed)
  const quartics = orderZero(child).classes.filter((c) => c.role === 'quartic')
  const shifts: OrderZeroShift[] = []
  for (const cls of quartics) {
    const legs = parseClassKey(particles, cls.key, 1).legs.map((l) => l.label)
    const symmetry = [...new Set(legs)].reduce((p, l) => p * factorial(legs.filter((x) => x === l).length), 1)
    const kept = cls.operators.map((o) => o.fingerprint as Fingerprint)
    const terms: string[][] = cls.operators.map(() => [])
    vertices.forEach((v1, i) =>
      vertices.slice(i).forEach((v2) => {
        const weight = pairingWeight(legs, v1, v2)
        if (weight === 0) return
        const target = typedFingerprint(child, cls.key, ratText(rat(BigInt(weight), BigInt(symmetry))))
        const solved = expressIn(kept, target)
        if (!solved) throw new EngineConsistencyError('matchHeavyScalar', `the exchange amplitude of class ${cls.key} is outside the span of its kept operators`)
        solved.coefficients.forEach((r, k) => {
          if (r.num !== 0n) terms[k]!.push(termText(r, monomial(v1, v2, mass)))
        })
      }),
    )
    cls.operators.forEach((op, k) => {
      if (terms[k]!.length) shifts.push({ classKey: cls.key, operator: op.text, latex: op.latex, coefficient: terms[k]!.join(' + ') })
    })
  }
  return { child, shifts, assumptions: SCALAR_MATCH_ASSUMPTIONS, notComputed }
}
