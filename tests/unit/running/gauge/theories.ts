// Theory files of the gauge-running tests, built from small helpers so that the roster
// syntax lives in one place.
import type { Theory, TheoryField, TheoryGroup } from '../../../../shared/schemas/theory'
import { parseTheory } from '../../../../server/engine/theory/parseTheory'
import smeft from '../../../../shared/presets/smeft.json'

type Extra = Pick<TheoryField, 'reps' | 'charges' | 'flavors'>
export const weyl = (name: string, extra: Extra = {}): TheoryField => ({ name, lorentz: 'left-weyl', ...extra })
export const weylR = (name: string, extra: Extra = {}): TheoryField => ({ name, lorentz: 'right-weyl', ...extra })
export const complexScalar = (name: string, extra: Extra = {}): TheoryField => ({ name, lorentz: 'scalar', ...extra })
export const realScalar = (name: string, extra: Extra = {}): TheoryField => ({ name, lorentz: 'scalar', real: true, ...extra })
export const strength = (name: string, group: string): TheoryField => ({ name, lorentz: 'field-strength', gaugeOf: group })
export const su = (name: string, n: number): TheoryGroup => ({ name, type: 'SU', n, gauge: true })
export const u1 = (name: string): TheoryGroup => ({ name, type: 'U1', gauge: true })

export function theory(name: string, groups: TheoryGroup[], fields: TheoryField[]): Theory {
  return parseTheory({ name, frame: 'relativistic', groups, fields })
}

export const SM = parseTheory(smeft)

/** SU(3) with the named Dirac quarks (a left- and a right-handed Weyl triplet each). */
export function qcd(quarks: readonly string[], name = `QCD with ${quarks.length} quarks`): Theory {
  const fields = quarks.flatMap((q) => [weyl(q, { reps: { colour: [1, 0] } }), weylR(`${q}R`, { reps: { colour: [1, 0] } })])
  return theory(name, [su('colour', 3)], [...fields, strength('G', 'colour')])
}

/** A dark U(1) X with one complex scalar of charge qs and one Dirac fermion of charge qf. */
export function darkU1(qs: string, qf: string): Theory {
  return theory('Dark U(1)', [u1('X')], [complexScalar('S', { charges: { X: qs } }), weyl('chi', { charges: { X: qf } }), weylR('chiR', { charges: { X: qf } }), strength('Ad', 'X')])
}
