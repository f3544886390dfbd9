import { describe, expect, it } from 'vitest'
import { displayProblem, fieldTex, fieldTexTable } from '../../../shared/schemas/fieldDisplay'
import { TheorySchema, type Theory } from '../../../shared/schemas/theory'
import { describeZodError } from '../../../shared/schemas/describeZodError'
import { classKeyTex } from '../../../server/engine/theory/classKey'
import { buildBasis } from '../../../server/engine/basis/buildBasis'
import { assembleExport } from '../../../server/engine/export/boardExport'
import { toLatex } from '../../../server/engine/export/toLatex'
import { compileLatex } from '../../support/pdflatex'
import { storedRows } from '../../support/basisExport'

// A field keeps its plain name (files, keys, typed input) and may carry a display form, set
// in math mode as papers print it (issue 17, item 3). Notation is common practice.

const scalar = (display?: string): Theory => ({
  name: 'one scalar',
  frame: 'relativistic',
  groups: [],
  fields: [{ name: 'phi', lorentz: 'scalar', real: true, ...(display === undefined ? {} : { display }) }],
})

describe('a display form', () => {
  it.each(['φ', 'χ_L', '\\bar{N}', '\\tilde{\\nu}_R', 'H^\\dagger', 'ψ′', '\\mathcal{O}_{6}', 'e_R'])('%s can be used', (display) => {
    expect(displayProblem(display)).toBeNull()
  })

  it.each([
    ['\\input{x}', 'uses \\input'],
    ['\\input{/etc/passwd}', '"/"'],
    ['\\def\\x{y}', 'uses \\def'],
    ['$x$', '"$"'],
    ['a % comment', '"%"'],
    ['\\bar{N', 'never closed'],
    ['N}', 'never opened'],
    ['x_', 'nothing after it'],
    ['😀', '"😀"'],
    ['  ', 'is empty'],
  ])('%j is refused, saying why (%s)', (display, why) => {
    expect(displayProblem(display)).toContain(why)
  })

  it('is printed in place of the name; a name longer than one letter is upright, never p·h·i in italics', () => {
    expect(fieldTex('phi')).toBe('\\mathrm{phi}')
    expect(fieldTex('H')).toBe('H')
    expect(fieldTex('chi_L')).toBe('{\\mathrm{chi}_{\\mathrm{L}}}')
    expect(fieldTex('phi', 'φ')).toBe('{\\phi}')
    expect(fieldTex('NR', '\\bar{N}_R')).toBe('{\\bar{N}_R}')
    expect(fieldTex('phi', '\\input{x}')).toBe('\\mathrm{phi}') // a refused form never reaches TeX
  })

  it('a theory file with a bad display form is refused, naming the field and the display form', () => {
    const parsed = TheorySchema.safeParse(scalar('\\write18{id}'))
    expect(parsed.success).toBe(false)
    expect(describeZodError(parsed.error!)).toMatch(/display form/)
    expect(describeZodError(parsed.error!)).toContain('uses \\write')
    expect(TheorySchema.safeParse(scalar('φ')).success).toBe(true)
  })

  it('class labels print the display form, the conjugate and the power', () => {
    const table = fieldTexTable({ fields: [{ name: 'phi', display: 'φ' }, { name: 'chi_L', display: 'χ_L' }, { name: 'W' }] })
    expect(classKeyTex('D^2 phi^4', table)).toBe('D^{2}\\,{\\phi}^{4}')
    expect(classKeyTex('chi_L chi_L*', table)).toBe('{\\chi _L}\\,{\\chi _L}^{*}')
    expect(classKeyTex('W_L^3', table)).toBe('W_{L}^{3}')
  })
})

describe('operators print fields as papers do', () => {
  it('φ^6 is a power of the display form, not six copies of the name (real scalar, dimension 6: one operator, common practice)', () => {
    const report = buildBasis(scalar('φ'), { maxDim: 6, nf: 1 })
    const latex = report.byDimension.flatMap((d) => d.classes.flatMap((c) => c.operators.map((o) => o.latex)))
    expect(latex).toContain('{\\phi}^{6}')
    const plain = buildBasis(scalar(), { maxDim: 6, nf: 1 }).byDimension.flatMap((d) => d.classes.flatMap((c) => c.operators.map((o) => o.latex)))
    expect(plain).toContain('\\mathrm{phi}^{6}')
  })

  it('an export whose fields carry display forms compiles with pdflatex', () => {
    const theory: Theory = {
      name: 'display forms',
      frame: 'relativistic',
      groups: [{ name: 'X', type: 'U1', gauge: true }],
      fields: [
        { name: 'chiL', display: 'χ_L', lorentz: 'left-weyl', charges: { X: '1' } },
        { name: 'NR', display: '\\bar{N}', lorentz: 'right-weyl', charges: { X: '1' } },
        { name: 'S', display: '\\tilde{S}′', lorentz: 'scalar', charges: { X: '0' } },
        { name: 'F', display: 'ℱ', lorentz: 'field-strength', gaugeOf: 'X' },
      ].filter((f) => displayProblem(f.display) === null) as Theory['fields'],
    }
    expect(theory.fields.map((f) => f.name)).toEqual(['chiL', 'NR', 'S']) // ℱ is not a letter a display form may hold
    const report = buildBasis(theory, { maxDim: 6, nf: 1 })
    const data = assembleExport({
      theory: { name: theory.name, definition: theory },
      countingRule: 'E/M',
      note: '',
      exportedAt: '2026-12-03T00:00:00.000Z',
      ...storedRows(report),
      tags: [],
      notes: [],
    })
    const tex = toLatex(data, { dirac: true })
    expect(tex).toContain('\\chi _L')
    const compiled = compileLatex(tex)
    expect(compiled.ok, compiled.log.slice(-2000)).toBe(true)
  })
})
