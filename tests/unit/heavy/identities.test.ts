import { describe, expect, it } from 'vitest'
import { combo, expandCombo, orderSpace, rewriteHeavy, CONVENTIONAL_OPERATORS } from '../../../server/engine/heavy'
import { thetaCombo, daggerCombo, isParityEven, parseStructure } from '../../../server/engine/heavy/structure'
import { addScaled, elementSignature } from '../../../server/engine/heavy/algebra'
import { div, rat, toString } from '../../../server/engine/exact/rational'
import { EngineConsistencyError } from '../../../server/engine/errors'

const el = (terms: Array<[number, string]>) => expandCombo(combo(terms))

describe('identities modulo the heavy-field EOM iD_tψ = 0 and IBP', () => {
  it('ψ†D_tD_tψ vanishes; ψ†D²ψ does not (common practice: EOM removes D_t on ψ and, by parts, on ψ†)', () => {
    const s = orderSpace(1, true).space
    expect(s.isNull(el([[1, 'T T']]))).toBe(true)
    expect(s.isNull(el([[1, 'D_i D_i']]))).toBe(false)
  })
  it('{D_i, E_i} vanishes and D_i D_t D_i equals ½[D·E] exactly (Manohar, Phys. Rev. D 56 (1997) 230, use of the EOM)', () => {
    const s = orderSpace(2, true).space
    expect(
      s.isNull(
        el([
          [1, 'D_i E_i'],
          [1, 'E_i D_i'],
        ]),
      ),
    ).toBe(true)
    expect(
      s.isNull(
        el([
          [1, 'D_i E_i'],
          [-1, 'E_i D_i'],
        ]),
      ),
    ).toBe(false)
    const r = rewriteHeavy(combo([[1, 'D_i T D_i']]), 2)
    const darwin = rewriteHeavy(CONVENTIONAL_OPERATORS.find((c) => c.id === 'darwin')!.combo, 2)
    // D_iD_tD_i ≡ ½ [D_i, E_i] (hand derivation, common practice)
    expect(r.map((x) => toString(x.coef))).toEqual(darwin.map((x) => toString(div(x.coef, rat(2)))))
  })
  it('σ·(D×E + E×D) = σ·(∇×E) = −σ·∂_tB vanishes by Faraday and IBP+EOM (common practice)', () => {
    const s = orderSpace(2, true).space
    expect(
      s.isNull(
        el([
          [1, 's_k eps_kij D_i E_j'],
          [1, 's_k eps_kij E_i D_j'],
        ]),
      ),
    ).toBe(true)
  })
  it('E² ≡ −D_iD_tD_tD_i and σ·(E×E) = 0 for an abelian field (common practice)', () => {
    const s = orderSpace(3, true).space
    expect(s.isNull(addScaled(el([[1, 'E_k E_k']]), el([[1, 'D_i T T D_i']])))).toBe(true)
    expect(s.isNull(el([[1, 's_k eps_kij E_i E_j']]))).toBe(true)
    expect(s.isNull(el([[1, 'E_k E_k']]))).toBe(false)
  })
  it('an operator outside the sector cannot be rewritten', () => {
    expect(() => rewriteHeavy(combo([[1, 'D_i D_i D_j D_j']]), 2)).toThrow('This operator is not a combination of the enumerated operators')
  })
})

describe('symmetries of the published operators (Manohar 1997: Hermitian, P- and T-even)', () => {
  for (const c of CONVENTIONAL_OPERATORS) {
    it(`${c.id} is parity even, Θ = T∘† even and of definite hermiticity`, () => {
      expect(c.combo.every((t) => isParityEven(t.s))).toBe(true)
      const e = expandCombo(c.combo)
      expect(elementSignature(expandCombo(thetaCombo(c.combo)))).toBe(elementSignature(e))
      const d = expandCombo(daggerCombo(c.combo))
      expect(addScaled(d, e, -1).size === 0 || addScaled(d, e, 1).size === 0).toBe(true)
    })
  }
  it('a T-odd structure is Θ-odd: σ·(D×E) + σ·(E×D) (common practice)', () => {
    const o = combo([
      [1, 's_k eps_kij D_i E_j'],
      [1, 's_k eps_kij E_i D_j'],
    ])
    expect(addScaled(expandCombo(thetaCombo(o)), expandCombo(o)).size).toBe(0)
  })
})

describe('structure parser and order limits', () => {
  it('rejects unknown tokens and uncontracted indices', () => {
    expect(() => parseStructure('D_i Q_i')).toThrow(EngineConsistencyError) // catalog text of the engine, never typed by a user
    expect(() => parseStructure('D_i Q_i')).toThrow('unknown token "Q_i" in "D_i Q_i"')
    expect(() => parseStructure('D_i D_j')).toThrow('index i,j is not contracted')
  })
  it('orders outside 1..4 are rejected', () => {
    expect(() => orderSpace(5, true)).toThrow('The power of 1/m must be a whole number from 1 to 4, not 5')
  })
})
