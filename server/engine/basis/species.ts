/**
 * The legs of the on-shell basis: the species of the theory model (theory/model.ts), for a
 * relativistic theory. SU(N) representations: fundamental (a vector with one upper index),
 * antifundamental, adjoint (a traceless matrix X^i_j), singlet, or any other irrep as a
 * traceless tensor of Young shapes [α; β] (kind 'other'; tensorShape.ts). A real field needs
 * α = β (real fields in a product of pseudoreal representations, such as a real bidoublet,
 * are counted but not written out). Helicities in the all-outgoing convention of the model.
 */
import { EngineInputError } from '../errors'
import type { Theory } from '../../../shared/schemas/theory'
import { groupKindLabel } from '../../../shared/schemas/groupKinds'
import { buildTheoryModel, type Species } from '../theory/model'
import { type TensorShape, SINGLET_SHAPE, conjugateShape, irrepShape, isSelfConjugateShape } from './tensorShape'

/**
 * All species of a theory, each field followed by its conjugate when that differs.
 * @example basisSpecies(realScalarTheory).map(p => p.label) // ["phi"]
 * Throws EngineInputError for another frame or a representation the basis does not build.
 * Reference: Elvang & Huang, Scattering Amplitudes (CUP 2015), §2 (helicity bookkeeping).
 */
export function basisSpecies(t: Theory): Species[] {
  if (t.frame !== 'relativistic') throw new EngineInputError('basisSpecies', `Explicit bases from contact amplitudes need the relativistic frame, but this theory uses the ${t.frame} frame`)
  const model = buildTheoryModel(t)
  const other = [...model.lie, ...model.finite][0]
  if (other) {
    const g = t.groups.find((x) => x.name === other.name)!
    throw new EngineInputError(
      'basisSpecies',
      `group ${g.name} = ${groupKindLabel(g.type, g.n)}: explicit bases are written for SU(n), U(1) and Z_n groups; this group is counted (Hilbert series) but not written out`,
    )
  }
  for (const s of model.species) {
    for (const g of model.su) {
      if (s.suKind[g.name] === 'singlet' || s.kind !== 'scalar' || s.partner !== model.species.indexOf(s)) continue
      if (isSelfConjugateShape(speciesShape(s, g.name, g.n))) continue
      throw new EngineInputError(
        'basisSpecies',
        `field ${s.field}: a real field in ${g.name} = SU(${g.n}) [${s.reps[g.name]!.join(',')}] is not written as a tensor with equal upper and lower index shapes (a product of pseudoreal representations, e.g. a real bidoublet); it is counted but its explicit basis is not written out — declare it complex to write one`,
      )
    }
  }
  return model.species
}

/**
 * Tensor form of a species' SU(N) representation (tensorShape.ts); a conjugate takes the
 * conjugate shape of its field's, so a field and its conjugate always match box for box.
 * @example speciesShape(sextet, 'colour', 3) // { upper: [2], lower: [] }
 */
export function speciesShape(s: Species, group: string, n: number): TensorShape {
  const labels = s.reps[group]
  if (!labels || labels.every((a) => a === 0)) return SINGLET_SHAPE
  return s.conj ? conjugateShape(irrepShape(n, labels.slice().reverse())) : irrepShape(n, labels)
}
