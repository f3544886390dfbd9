import { describe, expect, it } from 'vitest'
import { parseNotation } from '../../../server/engine/notation/parse'
import type { FieldItem, Item } from '../../../server/engine/notation/ast'

const SM = { fields: ['G', 'W', 'B', 'Q', 'u', 'd', 'L', 'e', 'H'], aliases: { phi: 'H', varphi: 'H' } }
const fields = (items: Item[]): FieldItem[] => items.flatMap((it) => (it.kind === 'field' ? [it] : it.kind === 'group' ? fields(it.items) : []))
const shape = (text: string): string[][] =>
  parseNotation(text, SM).terms.map((t) => fields(t.items).map((f) => `${f.name}${f.conj ? '†' : ''}${f.tilde ? '~' : ''}${f.derivs.length ? `D${f.derivs.length}` : ''}`))

describe('reading operators as printed (common practice notation, e.g. Grzadkowski et al., JHEP 10 (2010) 085)', () => {
  it('reads daggers, bars and tildes written in LaTeX, Unicode and plain text alike', () => {
    const expected = [['H†', 'H', 'L†', 'e', 'H']]
    expect(shape('(\\varphi^\\dagger\\varphi)(\\bar l e\\varphi)')).toEqual(expected)
    expect(shape('(φ† φ)(l̄ e φ)')).toEqual(expected)
    expect(shape('(H^+ H)(Lbar e H)')).toEqual(expected)
    expect(shape('(H* H)(\\overline{L} e H)')).toEqual(expected)
    expect(shape('\\tilde{\\varphi}^\\dagger \\tilde W^I_{\\mu\\nu}')).toEqual([['H†~', 'W~']])
  })
  it('expands powers, □ by the product rule, two-sided derivatives and h.c.', () => {
    expect(shape('(H^\\dagger H)^3')).toEqual([['H†', 'H', 'H†', 'H', 'H†', 'H']])
    expect(shape('(H^\\dagger H)\\Box(H^\\dagger H)').length).toBe(3) // □H† H + 2 DH†·DH + H† □H
    expect(shape('H^\\dagger i\\overleftrightarrow{D}_\\mu H')).toEqual([
      ['H†', 'HD1'],
      ['H†D1', 'H'],
    ])
    expect(parseNotation('H^\\dagger i\\overleftrightarrow{D}_\\mu H', SM).terms.map((t) => [t.coeff.num, t.iPower])).toEqual([
      [1n, 1],
      [-1n, 1],
    ])
    const hc = parseNotation('(\\bar L e H) + h.c.', SM).terms
    expect(hc.map((t) => fields(t.items).map((f) => `${f.name}${f.conj ? '†' : ''}`))).toEqual([
      ['L†', 'e', 'H'],
      ['H†', 'e†', 'L'],
    ])
  })
  it('reads rational coefficients and sums', () => {
    const t = parseNotation('\\frac{1}{2} H^\\dagger H B_{\\mu\\nu}B^{\\mu\\nu} - 3/4 H^\\dagger H \\tilde B_{\\mu\\nu}B^{\\mu\\nu}', SM).terms
    expect(t.map((x) => `${x.coeff.num}/${x.coeff.den}`)).toEqual(['1/2', '-3/4'])
  })
  it('points at the offending token with a message for a physicist', () => {
    expect(() => parseNotation('H^\\dagger X H', SM)).toThrow(/position 11 .*"X" is not a field of this theory \(its fields are G, W, B, Q, u, d, L, e, H\)/)
    expect(() => parseNotation('(H^\\dagger H', SM)).toThrow(/position 13.*expected "\)" to close the bracket opened at position 1/)
    expect(() => parseNotation('H^\\dagger H +', SM)).toThrow(/has no field/)
    expect(() => parseNotation('D_\\mu', SM)).toThrow(/derivative must be followed by the field/)
    expect(() => parseNotation('H^\\dagger H @', SM)).toThrow(/character "@" at position 13/)
    expect(() => parseNotation('\\gamma H', SM)).toThrow(/γ needs one Lorentz index/)
    expect(() => parseNotation('', SM)).toThrow(/empty/)
  })
})
