import { describe, expect, it } from 'vitest'
import { EngineCancelledError } from '../../../server/engine/errors'
import { buildBasis, classBasis, rewriteOperator, BASIS_NOTE } from '../../../server/engine/basis/index'
import { rat } from '../../../server/engine/exact/rational'

const phi = { name: 'real scalar', frame: 'relativistic' as const, groups: [], fields: [{ name: 'phi', lorentz: 'scalar' as const, real: true }] }

describe('one real scalar', () => {
  it('dimension 6: only φ^6 survives (common practice); the tally matches the Hilbert series', () => {
    const r = buildBasis(phi, { maxDim: 6 })
    const d6 = r.byDimension.find((d) => d.dimension === 6)!
    expect(d6.classes.map((c) => c.key)).toEqual(['phi^6'])
    expect(d6.operators).toBe(1)
    expect(d6.tallyOk).toBe(true)
    expect(r.note).toBe(BASIS_NOTE)
    expect(BASIS_NOTE).toContain('modulo equations of motion and integration by parts')
    expect(d6.classes[0]!.operators[0]!.hermitian).toBe(true)
  })
  it('φ² ∂φ·∂φ = −(1/3) φ³ □φ + total derivative vanishes modulo EOM (common practice): rank 0 and rewrite to 0', () => {
    const b = classBasis(phi, 'D^2 phi^4')
    expect(b.rank).toBe(0)
    expect(b.candidates).toBe(6)
    // φ²(∂φ·∂φ): contact amplitude ∝ Σ_{i<j} s_ij = (Σ p)² = 0
    const r = rewriteOperator(b, 's12 + s13 + s14 + s23 + s24 + s34')
    expect(r.vanishes).toBe(true)
    expect(r.text).toBe('0')
    expect(rewriteOperator(b, 's12').vanishes).toBe(true)
  })
  it('D^4 φ^4 has one operator (s²+t²+u²) and D^6 φ^4 one (stu) (common practice); rewrites are exact', () => {
    const b4 = classBasis(phi, 'D^4 phi^4')
    expect(b4.rank).toBe(1)
    // symmetrised s12² equals, with s+t+u = 0, one third of s²+t²+u² — i.e. a fixed rational multiple
    const a = rewriteOperator(b4, 's12^2').coefficients[0]!.coefficient
    const c = rewriteOperator(b4, 's12^2 + s13^2 + s14^2').coefficients[0]!.coefficient
    expect(c).toEqual(rat(a.num * 3n, a.den)) // s13² and s14² symmetrise to the same as s12²
    const st = rewriteOperator(b4, 's12 s13').coefficients[0]!.coefficient
    expect(st).toEqual(rat(-a.num, 2n * a.den)) // st = ((s+t)² − s² − t²)/2 = (u² − s² − t²)/2 → −½ after symmetrisation
    expect(classBasis(phi, 'D^6 phi^4').rank).toBe(1)
    expect(classBasis(phi, 'D^2 phi^6').rank).toBe(0)
  })
  it('bad operator text is rejected with the fragment named', () => {
    const b = classBasis(phi, 'D^2 phi^4')
    expect(() => rewriteOperator(b, '<12>')).toThrow('gives leg 1 (phi) 1 angle and 0 square spinors')
    expect(() => rewriteOperator(b, 's15')).toThrow('The bracket "s15" in "s15" needs two different legs from 1 to 4 (the class has 4 fields)')
    expect(() => rewriteOperator(b, 's12 s34')).toThrow('has 4 derivatives, but the class D^2 phi^4 has 2')
    expect(() => rewriteOperator(b, 's12 ?')).toThrow('Cannot read "?"')
    expect(() => classBasis(phi, 'psi^4')).toThrow('The class "psi^4" names "psi", which is not a field of this theory')
    expect(() => classBasis(phi, 'phi^2')).toThrow('The class "phi^2" has fewer than 3 fields')
  })
  it('input errors for the theory: frame and maxDim', () => {
    expect(() => classBasis({ ...phi, frame: 'heavy' as const }, 'phi^6')).toThrow('Explicit bases from contact amplitudes need the relativistic frame, but this theory uses the heavy frame')
    expect(() => buildBasis(phi, { maxDim: 13 })).toThrow('The maximum dimension of an explicit basis must be a whole number from 5 to 12, not 13')
  })
  it('is cancellable', () => {
    expect(() => buildBasis(phi, { maxDim: 6, signal: { aborted: true } })).toThrow(EngineCancelledError)
  })
})
