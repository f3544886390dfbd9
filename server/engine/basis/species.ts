/**
 * The legs of the on-shell basis: the species of the theory model (theory/model.ts), for a
 * relativistic theory whose SU(N) representations the basis can build (fundamental,
 * antifundamental, adjoint, singlet). Helicities in the all-outgoing convention of the model.
 */
import { EngineInputError } from '../errors'
import type { Theory } from '../../../shared/schemas/theory'
import { groupKindLabel } from '../../../shared/schemas/groupKinds'
import { buildTheoryModel, type Species } from '../theory/model'

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
    throw new EngineInputError('basisSpecies', `group ${g.name} = ${groupKindLabel(g.type, g.n)}: explicit bases are written for SU(n), U(1) and Z_n groups; this group is counted (Hilbert series) but not written out`)
  }
  for (const s of model.species) {
    for (const g of model.su) {
      if (s.suKind[g.name] !== 'other') continue
      throw new EngineInputError('basisSpecies', `Field ${s.field} sits in the representation [${s.reps[g.name]!.join(',')}] of ${g.name} = SU(${g.n}); explicit bases support the fundamental, antifundamental, adjoint and singlet only (counts support any)`)
    }
  }
  return model.species
}
