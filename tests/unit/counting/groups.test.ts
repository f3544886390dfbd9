/**
 * Counting with SO(N), Sp(2N), the exceptional groups and the finite flavour groups.
 */
import { describe, expect, it } from 'vitest'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { countOperators } from '../../../server/engine/counting/countOperators'
import { finiteGroup } from '../../../server/engine/group/finite/finiteGroup'
import { matrixGroupInvariants, FINITE_MATRIX_GROUPS } from '../../support/finiteMatrixGroups'

type Groups = { name: string; type: string; n?: number; gauge: boolean }[]
const theory = (groups: Groups, fields: Record<string, unknown>[]) => parseTheory({ name: 'test', frame: 'relativistic', groups, fields })
const totals = (t: ReturnType<typeof theory>, maxDim: number) => countOperators(t, { maxDim }).byDimension.map((d) => d.operators)
const classesAt = (t: ReturnType<typeof theory>, dim: number) => countOperators(t, { maxDim: dim, minDim: dim }).byDimension[0]!.classes

describe('isomorphic groups count alike (two root systems, two weight engines; Slansky, Phys. Rep. 79 (1981) 1, Table 2: B2 = C2, D3 = A3)', () => {
  it('SO(5) with a real vector, a Weyl spinor and its field strength = Sp(4) with the real 5, the 4 and its field strength, to dimension 8', () => {
    const so5 = theory(
      [{ name: 'G', type: 'SO', n: 5, gauge: true }],
      [
        { name: 'phi', lorentz: 'scalar', real: true, reps: { G: [1, 0] } },
        { name: 'psi', lorentz: 'left-weyl', reps: { G: [0, 1] } },
        { name: 'X', lorentz: 'field-strength', gaugeOf: 'G' },
      ],
    )
    const sp4 = theory(
      [{ name: 'G', type: 'Sp', n: 4, gauge: true }],
      [
        { name: 'phi', lorentz: 'scalar', real: true, reps: { G: [0, 1] } },
        { name: 'psi', lorentz: 'left-weyl', reps: { G: [1, 0] } },
        { name: 'X', lorentz: 'field-strength', gaugeOf: 'G' },
      ],
    )
    expect(totals(so5, 8)).toEqual(totals(sp4, 8))
    expect(totals(so5, 8)).toEqual([2, 14, 16, 91])
  })

  it('SO(6) with a complex spinor 4 and a real vector 6 = SU(4) with the 4 and the real 6 (Kostka weights against Freudenthal weights)', () => {
    const so6 = theory(
      [{ name: 'G', type: 'SO', n: 6, gauge: true }],
      [
        { name: 'H', lorentz: 'scalar', reps: { G: [0, 0, 1] } },
        { name: 'phi', lorentz: 'scalar', real: true, reps: { G: [1, 0, 0] } },
        { name: 'X', lorentz: 'field-strength', gaugeOf: 'G' },
      ],
    )
    const su4 = theory(
      [{ name: 'G', type: 'SU', n: 4, gauge: true }],
      [
        { name: 'H', lorentz: 'scalar', reps: { G: [1, 0, 0] } },
        { name: 'phi', lorentz: 'scalar', real: true, reps: { G: [0, 1, 0] } },
        { name: 'X', lorentz: 'field-strength', gaugeOf: 'G' },
      ],
    )
    expect(totals(so6, 8)).toEqual(totals(su4, 8))
  })
})

describe('exceptional groups: field contents without derivatives count the invariants LiE finds (Debian package lie, sym_tensor)', () => {
  it('E6, a complex scalar 27: H^6 → 1 (Sym^6 27 ∋ 1), H^3 H*^3 → 3 (Sym^3 27 = 1 + 650 + 3003), no H^4 H*^2 (Sym^4 27 and Sym^2 27 share no irrep)', () => {
    const c = classesAt(theory([{ name: 'E', type: 'E6', gauge: false }], [{ name: 'H', lorentz: 'scalar', reps: { E: [1, 0, 0, 0, 0, 0] } }]), 6)
    expect(c['H^6']).toBe(1)
    expect(c['H*^6']).toBe(1)
    expect(c['H^3 H*^3']).toBe(3)
    expect(c['H^4 H*^2']).toBeUndefined()
  })

  it('E7, a complex scalar 56: H^5 H* → 1, H^4 H*^2 → 1, H^3 H*^3 → 3, no H^6 (LiE: sym_tensor(k,[0,0,0,0,0,0,1],E7) for k = 2..6)', () => {
    const c = classesAt(theory([{ name: 'E', type: 'E7', gauge: false }], [{ name: 'H', lorentz: 'scalar', reps: { E: [0, 0, 0, 0, 0, 0, 1] } }]), 6)
    expect(c['H^5 H*']).toBe(1)
    expect(c['H^4 H*^2']).toBe(1)
    expect(c['H^3 H*^3']).toBe(3)
    expect(c['H^2 H*^4']).toBe(1)
    expect(c['H^6']).toBeUndefined()
  })

  it('G2, a real 7: no φ^5 (Sym^5 7 = 7 + 77 + 182), one φ^6 (LiE: sym_tensor(k,[1,0],G2))', () => {
    const c = totals(theory([{ name: 'G', type: 'G2', gauge: false }], [{ name: 'phi', lorentz: 'scalar', real: true, reps: { G: [1, 0] } }]), 6)
    expect(c).toEqual([0, 1 + 1]) // φ^6 and D^2 φ^4
  })
})

describe('finite flavour groups: the conjugacy-class sum replaces the Haar integral', () => {
  it('A4, a real triplet: φ^5 → 1, φ^6 → 4, φ^7 → 2, φ^8 → 5, the Molien series (1 + t^6)/((1 − t^2)(1 − t^3)(1 − t^4)) of the tetrahedral rotation group (Meyer, Can. J. Math. 6 (1954) 135; from memory) and the explicit 12 matrices', () => {
    const t = theory([{ name: 'F', type: 'A4', gauge: false }], [{ name: 'phi', lorentz: 'scalar', real: true, reps: { F: '3' } }])
    const r = countOperators(t, { maxDim: 8 }).byDimension
    expect(r.map((d) => d.classes[`phi^${d.dimension}`])).toEqual([1, 4, 2, 5])
    for (const k of [5, 6, 7, 8]) expect(matrixGroupInvariants('A4', k, 0)).toBe(r[k - 5]!.classes[`phi^${k}`])
  })

  for (const kind of Object.keys(FINITE_MATRIX_GROUPS) as (keyof typeof FINITE_MATRIX_GROUPS)[]) {
    it(`${finiteGroup(kind).label}: every derivative-free class of a complex scalar in its faithful irrep equals the Molien average over the explicit matrices`, () => {
      const { irrep } = FINITE_MATRIX_GROUPS[kind]
      const t = theory([{ name: 'F', type: kind, gauge: false }], [{ name: 'H', lorentz: 'scalar', reps: { F: irrep } }])
      const byDim = countOperators(t, { maxDim: 7 }).byDimension
      for (let a = 0; a <= 7; a++) {
        for (let b = 0; a + b <= 7; b++) {
          if (a + b < 5) continue
          const key = [a ? (a === 1 ? 'H' : `H^${a}`) : '', b ? (b === 1 ? 'H*' : `H*^${b}`) : ''].filter(Boolean).join(' ')
          const ours = byDim[a + b - 5]!.classes[key] ?? 0
          expect(ours, `${kind} ${irrep}: ${key}`).toBe(matrixGroupInvariants(kind, a, b))
        }
      }
    })
  }
})
