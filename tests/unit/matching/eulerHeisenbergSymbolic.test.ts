import { describe, it, expect } from 'vitest'
import nerdamer from 'nerdamer'
import { MATCHING_LIBRARY } from '../../../server/engine/matching/library'
import { toString as ratString } from '../../../server/engine/exact/rational'

// Symbolic cross-check with a general-purpose computer-algebra package (nerdamer): the
// Euler–Heisenberg Lagrangian (W. Heisenberg and H. Euler, Z. Phys. 98 (1936) 714),
// L = (2α²/45m⁴)[(E²−B²)² + 7(E·B)²], equals c1 (F F)² + c2 (F F̃)² with F F = 2(B²−E²) and
// F F̃ = −4 E·B (the library's stated conventions).
const eh = MATCHING_LIBRARY.find((e) => e.id === 'euler-heisenberg')!
const coef = (form: number, term: number) => ratString(eh.forms[form]!.terms[term]!.coefficient.rational)

describe('Euler–Heisenberg in both forms, symbolically', () => {
  it('the published E, B form is what the library states', () => {
    expect(nerdamer(`expand(${coef(0, 0)}*(E2-B2)^2 + ${coef(0, 1)}*EB^2 - (2/45)*((E2-B2)^2 + 7*EB^2))`).toString()).toBe('0')
  })

  it("the library's F F form equals its E, B form identically", () => {
    const eb = `${coef(0, 0)}*(E2-B2)^2 + ${coef(0, 1)}*EB^2`
    const ff = `${coef(1, 0)}*(2*(B2-E2))^2 + ${coef(1, 1)}*(-4*EB)^2`
    expect(nerdamer(`expand(${eb} - (${ff}))`).toString()).toBe('0')
    expect([coef(1, 0), coef(1, 1)]).toEqual(['1/90', '7/360'])
  })
})
