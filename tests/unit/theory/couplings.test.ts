import { describe, expect, it } from 'vitest'
import { TheorySchema, formatTheoryIssues } from '../../../shared/schemas/theory'
import { resolveCouplings } from '../../../server/engine/basis/orderZeroCouplings'
import { EngineInputError } from '../../../server/engine/errors'
import { integrateOut } from '../../../server/engine/scales/integrateOut'

// A heavy real scalar S with a cubic coupling to a light complex scalar H (common practice: the
// renormalizable potential of a singlet extension), the model tree-level matching starts from.
const toy = {
  name: 'singlet',
  frame: 'relativistic',
  groups: [{ name: 'Y', type: 'U1', gauge: true }],
  fields: [
    { name: 'H', lorentz: 'scalar', charges: { Y: '1/2' } },
    { name: 'S', lorentz: 'scalar', real: true, mass: { symbol: 'M', value: { number: '2', unit: 'TeV' } } },
    { name: 'B', lorentz: 'field-strength', gaugeOf: 'Y' },
  ],
  couplings: [
    { class: 'H* S H', symbol: 'kappa', value: { number: '1.5', unit: 'TeV' } },
    { class: 'H^2 H*^2', symbol: 'lambda', value: { number: '1/8' } },
    { class: 'H H*', operator: 'mass  H H*', symbol: 'm2' },
  ],
}

const issues = (input: unknown) => {
  const r = TheorySchema.safeParse(input)
  return r.success ? '' : formatTheoryIssues(input, r.error.issues)
}
const withCouplings = (couplings: unknown[], fields: unknown[] = toy.fields) => ({ ...toy, fields, couplings })

describe('couplings in the theory file', () => {
  it('a theory with couplings and a mass symbol survives parse and JSON round trip unchanged', () => {
    const parsed = TheorySchema.parse(toy)
    expect(parsed).toEqual(toy)
    expect(TheorySchema.parse(JSON.parse(JSON.stringify(parsed)))).toEqual(toy)
  })

  it('the engine resolves each coupling to a kept order-0 operator, in the basis orientation and text', () => {
    const resolved = resolveCouplings(TheorySchema.parse(toy))
    expect(resolved.map((c) => [c.symbol, c.operator])).toEqual([
      ['kappa', '1'],
      ['lambda', '1'],
      ['m2', 'mass H H*'],
    ])
    expect(resolved[0]!.value).toEqual({ number: '1.5', unit: 'TeV' })
  })

  it('a coupling on an operator the basis does not have is refused, naming it and what the class keeps', () => {
    const bad = TheorySchema.parse(
      withCouplings([
        { class: 'H H*', operator: 'mass S S', symbol: 'm2' },
        { class: 'H^3', symbol: 'c3' },
      ]),
    )
    expect(() => resolveCouplings(bad)).toThrow(EngineInputError)
    expect(() => resolveCouplings(bad)).toThrow('Coupling "m2": "mass S S" is not an operator of this class; the class "H H*" keeps mass H H*')
    expect(() => resolveCouplings(bad)).toThrow(/Coupling "c3": the order-0 basis has no class "H\^3" \(its classes are /)
  })

  it('a class keeping two operators needs the operator named', () => {
    const bad = TheorySchema.parse(withCouplings([{ class: 'B_L^2', symbol: 'g' }]))
    expect(() => resolveCouplings(bad)).toThrow('Coupling "g": the class "B_L^2" keeps 2 operators (kinetic B; theta B); say which one with "operator"')
  })

  it('symbols are checked by the schema: reserved names, clashes with fields, repeats, values and units', () => {
    expect(issues(withCouplings([{ class: 'H H*', symbol: 'pi' }]))).toMatch(/Couplings, entry 1, symbol is a reserved name/)
    expect(issues(withCouplings([{ class: 'H H*', symbol: 'S' }]))).toMatch(/"S" is already the name of a field or symmetry/)
    expect(issues(withCouplings([{ class: 'H H*', symbol: 'M' }]))).toMatch(/"M" is already the symbol of the mass of S/)
    expect(
      issues(
        withCouplings([
          { class: 'H H*', symbol: 'a' },
          { class: 'H  H*', symbol: 'b' },
        ]),
      ),
    ).toMatch(/this operator already has a coupling/)
    expect(issues(withCouplings([{ class: 'H H*', symbol: 'a', value: { number: '1/3x' } }]))).toMatch(/a value is an exact rational/)
    const massless: unknown[] = toy.fields.map((f) => (f.name === 'S' ? { ...f, mass: { symbol: 'M', value: { number: '2' } } } : f))
    expect(issues(withCouplings([], massless))).toMatch(/a mass needs a unit/)
  })

  it('integrating out S drops its mass and the couplings of classes containing it, and keeps the rest', () => {
    const { child } = integrateOut(TheorySchema.parse(toy), ['S'], { value: 2, unit: 'TeV' })
    expect(child.couplings!.map((c) => c.symbol)).toEqual(['lambda', 'm2'])
    expect(child.fields.some((f) => f.mass)).toBe(false)
    expect(resolveCouplings(child).map((c) => c.classKey)).toEqual(['H^2 H*^2', 'H H*'])
  })
})
