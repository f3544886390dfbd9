import { describe, it, expect } from 'vitest'
import { assembleExport } from '../../../server/engine/export/boardExport'
import { toLatex, classKeyLatex } from '../../../server/engine/export/toLatex'
import { toCsv, csvField } from '../../../server/engine/export/toCsv'

// Format checks (common practice: RFC 4180 for CSV; LaTeX must escape its special characters).
const data = assembleExport({
  theory: { name: 'Photons & friends', definition: {} },
  countingRule: 'massRatio',
  note: 'modulo equations of motion and integration by parts',
  exportedAt: '2026-12-02T00:00:00.000Z',
  classes: [
    { order: 4, dimension: 8, key: 'F_L^2 F_R^2', rank: 1, hilbert: 1, tallyOk: true },
    { order: 4, dimension: 8, key: 'F_L^4', rank: 1, hilbert: 1, tallyOk: true },
  ],
  operators: [
    { id: 1, order: 4, classKey: 'F_L^2 F_R^2', column: 'kept', text: '<12>^2[34]^2', latex: 'F_L^2 F_R^2', hermitian: true, realParameters: 1 },
    { id: 2, order: 4, classKey: 'F_L^4', column: 'kept', text: '<12>^2<34>^2', latex: 'F_L^4', hermitian: false, realParameters: 2 },
    { id: 3, order: 4, classKey: 'F_L^4', column: 'set_aside', text: '<13>^2<24>^2', latex: "F_L^4{}'", hermitian: false, realParameters: 2 },
  ],
  tags: [
    { operatorId: 1, kind: 'threshold', label: 'coefficient shifts when T is integrated out' },
    { operatorId: 1, kind: 'loop', label: '' },
  ],
  notes: [{ operatorId: 2, authorName: 'Ilse', body: 'sign, "check"', createdAt: '2026-12-01T10:00:00Z' }],
})

describe('exports', () => {
  it('groups operators into orders and classes with their tags and notes', () => {
    expect(data.orders).toHaveLength(1)
    expect(data.orders[0]!.classes.map((c) => c.operators.length)).toEqual([1, 2])
    expect(data.orders[0]!.classes[0]!.operators[0]!.tags).toHaveLength(2)
  })

  it('LaTeX has one longtable per order with only kept operators, a legend, and escaped text', () => {
    const tex = toLatex(data)
    expect(tex.match(/\\begin\{longtable\}/g)).toHaveLength(1)
    expect(tex).toContain('modulo equations of motion and integration by parts')
    expect(tex).toContain('Photons \\& friends')
    expect(tex).not.toContain("F_L^4{}'")
    expect(tex).toContain('threshold: coefficient shifts when T is integrated out, loop')
  })

  it('class keys become math', () => {
    expect(classKeyLatex('D^2 H^2 H*^2')).toBe('D^{2}\\,H^{2}\\,H^{*2}')
    expect(classKeyLatex('G_L^3')).toBe('G_{L}^{3}')
  })

  it('CSV quotes what needs quoting and has one row per operator', () => {
    const csv = toCsv(data)
    const lines = csv.trimEnd().split('\r\n')
    expect(lines).toHaveLength(4)
    expect(lines[0]).toBe('order,dimension,class,column,operator,latex,hermitian,real_parameters,flavor_components,tags,notes')
    expect(lines[2]).toContain('"Ilse: sign, ""check"""')
    expect(csvField('a,b')).toBe('"a,b"')
    expect(csvField('plain')).toBe('plain')
  })
})
