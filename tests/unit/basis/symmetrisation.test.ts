import { describe, expect, it } from 'vitest'
import { findPreset } from '../../../shared/presets/index'
import type { Theory } from '../../../shared/schemas/theory'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { basisSpecies, parseClassKey } from '../../../server/engine/basis/index'
import { classCandidates } from '../../../server/engine/basis/candidates'
import { directPairRows, pairRows, samplePoints } from '../../../server/engine/basis/evaluation'
import { symmetrisationPlan } from '../../../server/engine/basis/pairOrbits'
import { identicalLegPermutations } from '../../../server/engine/basis/symmetry'
import { PrimeField, workingPrimes } from '../../../server/engine/finite/primeField'

// The planned symmetrisation (each relabelled structure evaluated once per point, one pair
// per orbit) must give exactly the values of the direct sum over permutations: same field,
// same points, every pair. Fermi signs, ε orderings and bracket swaps all enter the plan.
const F = new PrimeField(workingPrimes(1)[0]!)
const smeft = findPreset('smeft')!.theory as Theory
const triplet = parseTheory({
  name: 'triplet',
  frame: 'relativistic',
  groups: [{ name: 'weak', type: 'SU', n: 2, gauge: true }],
  fields: [{ name: 'Xi', lorentz: 'scalar', real: true, reps: { weak: [2] } }],
})
const sextet = parseTheory({ name: 'sextet', frame: 'relativistic', groups: [{ name: 'c', type: 'SU', n: 3, gauge: true }], fields: [{ name: 'S', lorentz: 'scalar', reps: { c: [2, 0] } }] })

function pairsOf(t: Theory, key: string) {
  const cls = parseClassKey(basisSpecies(t), key)
  const { candidates } = classCandidates(t, cls)
  const pairs = candidates.map((c) => ({ lorentz: c.lorentz, gauge: c.gauge }))
  return { cls, pairs, perms: identicalLegPermutations(cls.legs) }
}

function rowsBothWays(t: Theory, key: string) {
  const { cls, pairs, perms } = pairsOf(t, key)
  const points = samplePoints(F, t, cls, 6, 11)
  return { planned: pairRows(F, pairs, points, perms), direct: directPairRows(F, pairs, points, perms), plan: symmetrisationPlan(pairs, perms) }
}

describe('symmetrisation over identical legs, planned once per class', () => {
  // SMEFT classes with identical fermions (Fermi signs), ε of SU(2) and SU(3), adjoints and derivatives.
  const cases: [Theory, string][] = [
    [smeft, 'L^2 H^2'],
    [smeft, 'Q^3 L'],
    [smeft, 'W_L^3'],
    [smeft, 'D^2 H^2 H*^2'],
    [smeft, 'e^2 e*^2'],
    [smeft, 'W_L^2 H H*'],
    [triplet, 'Xi^4'],
    [triplet, 'D^2 Xi^4'],
    [triplet, 'Xi^5'],
    [sextet, 'S^2 S*^2'],
  ]
  it.each(cases.map(([t, k]) => [t.name, k, t] as const))('%s, class %s: the same values as the direct sum', (_n, key, t) => {
    const { planned, direct, plan } = rowsBothWays(t, key)
    expect(plan, 'a plan is made').not.toBeNull()
    expect(planned).toEqual(direct)
  })

  it('six identical SU(2) triplets: 265 trace structures fall into a few orbits', () => {
    const { pairs, perms } = pairsOf(triplet, 'Xi^6')
    const plan = symmetrisationPlan(pairs, perms)
    expect(pairs.length).toBe(265) // derangements of 6 (common practice: δ contractions of traceless matrices)
    // Orbits = ways to split 6 legs into cycles of length ≥ 2, up to relabelling: 6, 4+2, 3+3, 2+2+2,
    // with the two orientations of a 3- or longer cycle separate structures that the relabelling joins.
    expect(plan!.terms.size).toBe(4)
  })
})
