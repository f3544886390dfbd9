/**
 * An operator as a stored basis writes it: input syntax (inputSyntax.ts), or a Hermitian or
 * parity combination of one, "(X) ± h.c." and "(X) ± P", nested as the basis builds them
 * (classBasis.ts, parityColumns.ts). Reading these back lets a new run keep what an earlier
 * basis kept, and lets a user type a combination the board shows.
 */
import { EngineInputError } from '../errors'
import { mul as ratMul, rat, type Rational } from '../exact/rational'
import type { Species } from '../theory/model'
import type { OperatorClass } from './classKey'
import type { LorentzStructure } from './lorentzStructures'
import type { SuStructure } from './gaugeStructures'
import { parseOperatorText } from './inputSyntax'
import { conjugateLegMap, conjugateLorentz, conjugateSu } from './conjugation'
import { parityLegMap } from './parityPartners'
import { parityLorentz, paritySu } from './parity'
import { mentionsCombination, readCombination } from './combinationText'

export interface WrittenTerm {
  coeff: Rational
  lorentz: LorentzStructure
  gauge: SuStructure[]
}

/**
 * The terms of a written operator of class `cls` (gauge: the class's gauge contractions).
 * @example writtenTerms(particles, cls, "(<12>[34]) + h.c.", gauge).length // 2
 * Throws EngineInputError when the text is not input syntax, or names h.c. (P) in a class
 * that is not its own conjugate (parity image).
 */
export function writtenTerms(particles: Species[], cls: OperatorClass, text: string, gauge: SuStructure[][]): WrittenTerm[] {
  const t = text.trim()
  const c = readCombination(t)
  if (c?.kind === 'P') {
    const pi = parityLegMap(particles, cls)
    const inner = writtenTerms(particles, cls, c.inner, gauge)
    return [
      ...inner,
      ...inner.map((x) => {
        const image = parityLorentz(x.lorentz, pi)
        return { coeff: ratMul(x.coeff, rat(c.sign * image.sign)), lorentz: image.lorentz, gauge: x.gauge.map((s) => paritySu(s, pi)) }
      }),
    ]
  }
  if (c?.kind === 'h.c.') {
    const pi = conjugateLegMap(cls)
    const inner = writtenTerms(particles, cls, c.inner, gauge)
    return [
      ...inner,
      ...inner.map((x) => ({
        coeff: c.sign === 1 ? x.coeff : ratMul(x.coeff, rat(-1)),
        lorentz: conjugateLorentz(x.lorentz, pi),
        gauge: x.gauge.map((s) => conjugateSu(s, pi)),
      })),
    ]
  }
  if (mentionsCombination(t)) throw new EngineInputError('writtenTerms', `Cannot read "${t}": write a combination as "(X) + h.c." or "(X) - P", with X in the input syntax`)
  return parseOperatorText(cls, t, gauge.length).map((x) => ({ coeff: x.coeff, lorentz: x.lorentz, gauge: gauge[x.gaugeIndex]! }))
}
