/**
 * The fingerprint of an operator a user types (in the input syntax of basis/inputSyntax.ts, or
 * printed as in papers, notation/)
 * at the same sample points as the stored operators of its class, so that the board can
 * rewrite it onto whatever the group currently keeps.
 */
import type { Theory } from '../../../shared/schemas/theory'
import { classBasis, type Priorities } from '../basis/classBasis'
import { writtenTerms } from '../basis/writtenOperator'
import { basisSpecies } from '../basis/species'
import { combinationValues } from '../basis/evaluation'
import type { Fingerprint } from './fingerprints'
import { looksPrinted, notationValues } from '../notation/written'
import { notationColumnTerms } from '../notation/written'

/**
 * The fingerprints of several operators of one class (typed ones, or kept operators by their
 * stored texts), computing the class's sample points once.
 * @example typedFingerprints(photons, "F_L^2 F_R^2", ["<12>^2[34]^2", "2 <12>^2[34]^2"]).length // 2
 * Method: the class's sample points are fixed by its key (seeded), so recomputing the class
 * basis reproduces them; the typed amplitude is symmetrised over identical legs like every
 * candidate (amplitude–operator correspondence; Shadmi & Weiss, JHEP 02 (2019) 165).
 * `priorities` must be the run's own: they fix how many sample points the class uses.
 */
export function typedFingerprints(theory: Theory, classKey: string, texts: readonly string[], priorities?: Priorities): (Fingerprint & { timesI?: boolean })[] {
  const b = classBasis(theory, classKey, { priorities, printed: notationColumnTerms })
  const particles = basisSpecies(theory)
  return texts.map((text) => {
    if (looksPrinted(text)) {
      // Printed notation (notation/): its amplitude at the same points; a factor i is reported apart.
      const { values, timesI } = notationValues(theory, b, text)
      return { primes: b.primes.map((pd) => pd.F.p), values, ...(timesI ? { timesI } : {}) }
    }
    // Input syntax, or a Hermitian / parity combination as the board writes it.
    const terms = writtenTerms(particles, b.class, text, b.gaugeStructures)
    return {
      primes: b.primes.map((pd) => pd.F.p),
      values: b.primes.map((pd) =>
        combinationValues(
          pd.F,
          terms.map((t) => ({
            lorentz: t.lorentz,
            gauge: t.gauge,
            coeff: pd.F.fromRational(t.coeff),
          })),
          pd.points,
          b.perms,
        ),
      ),
    }
  })
}

/** One typed operator's fingerprint (see typedFingerprints). @example typedFingerprint(photons, "F_L^2 F_R^2", "<12>^2[34]^2").values.length // 2 primes */
export function typedFingerprint(theory: Theory, classKey: string, text: string, priorities?: Priorities): Fingerprint {
  return typedFingerprints(theory, classKey, [text], priorities)[0]!
}
