import { describe, expect, it } from 'vitest'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { checkAnomalies, anomalyConditions } from '../../../server/engine/theory/anomalies'
import { repIndex } from '../../../server/engine/group/representation'
import { toString as ratText } from '../../../server/engine/exact/rational'
import { EngineInputError } from '../../../server/engine/errors'

type G = { name: string; type: string; n?: number; gauge: boolean }
const file = (groups: G[], fields: Record<string, unknown>[]) => ({ name: 't', frame: 'relativistic', groups, fields })

const errorOf = (input: unknown): string => {
  try {
    parseTheory(input)
  } catch (e) {
    expect(e).toBeInstanceOf(EngineInputError)
    return (e as Error).message
  }
  throw new Error('expected a validation error')
}

describe('group kinds in the theory file', () => {
  it('accepts SO(n), Sp(n), the exceptional groups and the finite flavour groups with their representations', () => {
    const t = parseTheory(
      file(
        [
          { name: 'G10', type: 'SO', n: 10, gauge: true },
          { name: 'S', type: 'Sp', n: 4, gauge: false },
          { name: 'E', type: 'E6', gauge: false },
          { name: 'F', type: 'A4', gauge: false },
          { name: 'T', type: 'Tprime', gauge: false },
          { name: 'D', type: 'Delta27', gauge: false },
        ],
        [
          { name: 'psi', lorentz: 'left-weyl', reps: { G10: [0, 0, 0, 0, 1], F: '3', D: '3bar' }, flavors: 3 },
          { name: 'X', lorentz: 'field-strength', gaugeOf: 'G10' },
          { name: 'h', lorentz: 'scalar', reps: { S: [1, 0], E: [1, 0, 0, 0, 0, 0], T: "2''" } },
        ],
      ),
    )
    expect(t.groups.map((g) => g.type)).toEqual(['SO', 'Sp', 'E6', 'A4', 'Tprime', 'Delta27'])
  })

  it('per-kind checks name the group, the kind and the fix', () => {
    const cases: [G[], Record<string, unknown>[], string][] = [
      [[{ name: 'G', type: 'SO', n: 4, gauge: true }], [], 'Symmetry 1 "G", n: SO(n) needs n from 5 to 18, but n = 4'],
      [[{ name: 'G', type: 'Sp', n: 5, gauge: true }], [], 'Symmetry 1 "G", n: Sp(n) needs n from 4 to 16 (even: Sp(n) acts on n = 2k dimensions), but n = 5'],
      [[{ name: 'G', type: 'E6', n: 6, gauge: true }], [], 'Symmetry 1 "G", n: E6 takes no n; remove n = 6'],
      [[{ name: 'G', type: 'A4', gauge: true }], [], 'Symmetry 1 "G", gauge: A4 is a finite group; declare it global (not gauged)'],
      [
        [{ name: 'G', type: 'SO', n: 10, gauge: true }],
        [{ name: 'p', lorentz: 'left-weyl', reps: { G: [1, 0, 0] } }],
        'Field 1 "p", representation under G: SO(10) takes 5 Dynkin labels, but [1,0,0] has 3',
      ],
      [
        [{ name: 'G', type: 'A4', gauge: false }],
        [{ name: 'p', lorentz: 'left-weyl', reps: { G: '4' } }],
        `Field 1 "p", representation under G: A4 takes an irrep name (one of 1, 1', 1'', 3), but got "4"`,
      ],
      [
        [{ name: 'G', type: 'A4', gauge: false }],
        [{ name: 'p', lorentz: 'left-weyl', reps: { G: [1] } }],
        `Field 1 "p", representation under G: A4 takes an irrep name (one of 1, 1', 1'', 3), but got [1]`,
      ],
      [[{ name: 'G', type: 'E6', gauge: false }], [{ name: 'p', lorentz: 'left-weyl', charges: { G: '1' } }], 'Field 1 "p", charge under G: G is E6, which takes Dynkin labels, not a charge'],
      [
        [{ name: 'G', type: 'S4', gauge: false }],
        [{ name: 'X', lorentz: 'field-strength', gaugeOf: 'G' }],
        'Field 1 "X", gauge group of the field strength: G is a global symmetry (not gauged) and has no field strength',
      ],
      [
        [{ name: 'G', type: 'E8', gauge: false }],
        [{ name: 'p', lorentz: 'left-weyl', reps: { G: [1, 0, 0, 0, 0, 0, 0, 0] } }],
        'Field 1 "p", representation under G: representations are limited to dimension 1000, but [1,0,0,0,0,0,0,0] has dimension 3875',
      ],
    ]
    for (const [groups, fields, message] of cases) expect(errorOf(file(groups, fields))).toContain(message)
  })

  it('real scalars: the product of Frobenius–Schur indicators over every kind must be +1 (Slansky, Phys. Rep. 79 (1981) 1, §4; Ishimori et al., Prog. Theor. Phys. Suppl. 183 (2010) 1)', () => {
    const groups: G[] = [
      { name: 'G', type: 'SO', n: 10, gauge: false },
      { name: 'S', type: 'Sp', n: 4, gauge: false },
      { name: 'T', type: 'Tprime', gauge: false },
      { name: 'A', type: 'A4', gauge: false },
    ]
    const real = (reps: Record<string, unknown>) => file(groups, [{ name: 's', lorentz: 'scalar', real: true, reps }])
    expect(() => parseTheory(real({ G: [1, 0, 0, 0, 0], A: '3' }))).not.toThrow()
    expect(() => parseTheory(real({ S: [1, 0], T: '2' }))).not.toThrow() // pseudoreal × pseudoreal
    expect(errorOf(real({ G: [0, 0, 0, 0, 1] }))).toContain('a real scalar must sit in a real representation, but [0,0,0,0,1] is complex')
    expect(errorOf(real({ S: [1, 0] }))).toContain('a real scalar must sit in a real representation, but [1,0] is pseudoreal')
    expect(errorOf(real({ A: "1'" }))).toContain(`a real scalar must sit in a real representation, but "1'" is complex`)
  })
})

describe('anomalies with the new gauge groups', () => {
  it('Dynkin indices: T = 1 for the 10 of SO(10), 2 for its 16, 3 for the 27 of E6, 1/2 for the 4 of Sp(4) (Slansky, Phys. Rep. 79 (1981) 1, Table 30: l = 2T)', () => {
    expect(ratText(repIndex('SO', 10, [1, 0, 0, 0, 0]))).toBe('1')
    expect(ratText(repIndex('SO', 10, [0, 0, 0, 0, 1]))).toBe('2')
    expect(ratText(repIndex('E6', undefined, [1, 0, 0, 0, 0, 0]))).toBe('3')
    expect(ratText(repIndex('Sp', 4, [1, 0]))).toBe('1/2')
    expect(ratText(repIndex('SO', 5, [0, 1]))).toBe('1/2')
  })

  it('SO(10) with three 16s and E6 with three 27s are anomaly free: no cubic Casimir (Georgi, AIP Conf. Proc. 23 (1975) 575; Gürsey, Ramond, Sikivie, Phys. Lett. B 60 (1976) 177)', () => {
    const so10 = parseTheory(file([{ name: 'G', type: 'SO', n: 10, gauge: true }], [{ name: 'psi', lorentz: 'left-weyl', reps: { G: [0, 0, 0, 0, 1] }, flavors: 3 }]))
    expect(checkAnomalies(so10)).toEqual([])
    const e6 = parseTheory(file([{ name: 'E', type: 'E6', gauge: true }], [{ name: 'psi', lorentz: 'left-weyl', reps: { E: [1, 0, 0, 0, 0, 0] }, flavors: 3 }]))
    expect(checkAnomalies(e6)).toEqual([])
  })

  it('SO(6) = SU(4): one spinor alone has the cubic anomaly of one SU(4) fundamental; Sp(4) and SO(5) with one 4 have the Witten anomaly (Witten, Phys. Lett. B 117 (1982) 324)', () => {
    const so6 = parseTheory(file([{ name: 'G', type: 'SO', n: 6, gauge: true }], [{ name: 'psi', lorentz: 'left-weyl', reps: { G: [0, 0, 1] } }]))
    expect(checkAnomalies(so6)).toEqual([{ name: 'G^3', sum: '-1', ok: false }])
    const sp4 = parseTheory(file([{ name: 'G', type: 'Sp', n: 4, gauge: true }], [{ name: 'psi', lorentz: 'left-weyl', reps: { G: [1, 0] } }]))
    expect(checkAnomalies(sp4)).toEqual([{ name: 'G Witten', sum: '1', ok: false }])
    const so5 = parseTheory(file([{ name: 'G', type: 'SO', n: 5, gauge: true }], [{ name: 'psi', lorentz: 'left-weyl', reps: { G: [0, 1] }, flavors: 2 }]))
    expect(anomalyConditions(so5)).toEqual([{ name: 'G Witten', sum: '2', ok: true }])
  })

  it('a fermion in the 3 of a global SU(3) counts three times in the gauge U(1)^3 and gravitational conditions (arithmetic)', () => {
    const t = parseTheory(
      file(
        [
          { name: 'F', type: 'SU', n: 3, gauge: false },
          { name: 'Y', type: 'U1', gauge: true },
        ],
        [{ name: 'psi', lorentz: 'left-weyl', reps: { F: [1, 0] }, charges: { Y: '1' } }],
      ),
    )
    expect(checkAnomalies(t)).toEqual([
      { name: 'Y^3', sum: '3', ok: false },
      { name: 'gravity^2 Y', sum: '3', ok: false },
    ])
  })
})
