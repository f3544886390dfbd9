// Known bad inputs of the Goldstone frame's engine (server/engine/goldstone), one or more per
// place that throws an input error; badInputs.ts adds them to the list engineMessages.test.ts runs.
import type { Theory } from '../../../shared/schemas/theory'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { findPreset } from '../../../shared/presets/index'
import { goldstoneTask } from '../../../server/engine/goldstone/task'
import { countGoldstone } from '../../../server/engine/goldstone/countGoldstone'
import { goldstoneBasis } from '../../../server/engine/goldstone/explicit/goldstoneBasis'
import { GradedSpace, explicitPrimes } from '../../../server/engine/goldstone/explicit/graded'
import { checkLabels } from '../../../server/engine/goldstone/explicit/monomial'
import { parseGoldstoneOperator } from '../../../server/engine/goldstone/explicit/parseGoldstone'
import { goldstoneTypedFingerprints } from '../../../server/engine/goldstone/explicit/typedGoldstone'
import { ExactEvaluator } from '../../../server/engine/goldstone/explicit/exactValue'
import { ClassicalSolution } from '../../../server/engine/goldstone/explicit/perturbiner'
import { randomConfig } from '../../../server/engine/goldstone/explicit/kinematics'
import { orthogonalSinglets } from '../../../server/engine/goldstone/orthogonalIntegral'
import { PrimeField, workingPrimes } from '../../../server/engine/finite/primeField'
import { SeededRandom } from '../../../server/engine/finite/rng'
import type { BadInput } from './badInputs'

const umbral = () => parseTheory(findPreset('umbral-pions')!.theory) as Theory
const withBlock = (change: Record<string, unknown>): Theory => {
  const t = umbral()
  return { ...t, goldstone: { ...t.goldstone!, ...change } }
}
const field = () => new PrimeField(explicitPrimes(1)[0]!)
/** det of two letters evaluated for N = 3 (a det needs N letters). */
function shortDet(): number {
  const F = field()
  const ev = new ExactEvaluator(new ClassicalSolution(F, randomConfig(F, new SeededRandom(1), 3, ['pion', 'pion', 'pion', 'pion'])))
  return ev.monomial({
    factors: [
      {
        type: 'det',
        letters: [
          { kind: 'u', d: [], idx: [0] },
          { kind: 'u', d: [], idx: [0] },
        ],
      },
    ],
  })
}

export const goldstoneCases: BadInput[] = [
  { name: 'a Goldstone task of a theory without its block', run: () => goldstoneTask({ ...umbral(), goldstone: undefined }, { kind: 'count' }, {}), says: /needs its "goldstone" block/ },
  {
    name: 'a typed operator in a Goldstone class that is not an order',
    run: () => goldstoneTask(umbral(), { kind: 'fingerprint', classKey: 'u^4', texts: ['⟨u_μ u^μ u_ν u^ν⟩'] }, {}),
    says: /one chiral order, written p\^4/,
  },
  { name: 'a typed Goldstone operator with an open index', run: () => parseGoldstoneOperator('⟨u_μ u_ν⟩'), says: /the index μ appears 1 time/ },
  { name: 'a typed Goldstone operator with an unknown letter', run: () => parseGoldstoneOperator('⟨x_μ x^μ⟩'), says: /a building block \(u, χ\+/ },
  { name: 'an unclosed typed Goldstone trace', run: () => parseGoldstoneOperator('⟨u_μ u^μ'), says: /is not closed/ },
  { name: 'an empty typed Goldstone operator', run: () => parseGoldstoneOperator('  '), says: /the text is empty/ },
  {
    name: 'a typed Goldstone operator of another order',
    run: () => goldstoneTypedFingerprints({ N: 3, sources: { scalar: true, vector: true }, order: 4, evaluatedAtN: 3 }, ['⟨u_μ u^μ⟩']),
    says: /chiral order p\^2, but this class is p\^4/,
  },
  {
    name: 'a typed Goldstone operator at p^6',
    run: () => goldstoneTypedFingerprints({ N: 3, sources: { scalar: true, vector: true }, order: 6, evaluatedAtN: 3 }, ['⟨u_μ u^μ⟩']),
    says: /rewritten up to p\^4/,
  },
  { name: 'an explicit basis of O(N+1)/O(N)', run: () => goldstoneTask(withBlock({ coset: 'orthogonal' }), { kind: 'basis' }, {}), says: /run the counts/ },
  {
    name: 'an explicit basis with the singlet vector source',
    run: () => goldstoneTask(withBlock({ sources: { scalar: true, vector: true, singletVector: true } }), { kind: 'basis' }, {}),
    says: /without the singlet vector source/,
  },
  {
    name: 'a singlet vector source on O(N+1)/O(N)',
    run: () => countGoldstone({ coset: 'orthogonal', N: 3, sources: { scalar: true, vector: true, singletVector: true }, maxOrder: 4 }),
    says: /belongs to the chiral coset/,
  },
  { name: 'an explicit basis with the θ term', run: () => goldstoneTask(withBlock({ theta: true }), { kind: 'basis' }, {}), says: /P-invariant/ },
  { name: 'an explicit Goldstone basis to p^8', run: () => goldstoneBasis({ N: 3, sources: { scalar: true, vector: true }, maxOrder: 8 }), says: /up to p\^6/ },
  { name: 'an explicit Goldstone value with ten legs', run: () => new GradedSpace(field(), 10, 3), says: /between 1 and 9 legs/ },
  { name: 'an explicit Goldstone value mod a large prime', run: () => new GradedSpace(new PrimeField(workingPrimes(1)[0]!), 4, 3), says: /primes below 2\^21/ },
  { name: 'an explicit Goldstone value that would overflow', run: () => new GradedSpace(field(), 9, 8), says: /overflow/ },
  {
    name: 'a Goldstone monomial with an open Lorentz index',
    run: () =>
      checkLabels({
        factors: [
          {
            type: 'trace',
            letters: [
              { kind: 'u', d: [], idx: [0] },
              { kind: 'u', d: [], idx: [1] },
            ],
          },
        ],
      }),
    says: /contracted once/,
  },
  { name: 'a determinant of too few letters', run: shortDet, says: /det needs 3 letters/ },
  { name: 'O(N) singlets for N = 0', run: () => orthogonalSinglets(0, []), says: /positive integer/ },
]
