import { describe, expect, it } from 'vitest'
import { goldstoneBasis } from '../../../server/engine/goldstone/explicit/goldstoneBasis'
import { goldstoneTypedFingerprints } from '../../../server/engine/goldstone/explicit/typedGoldstone'
import { parseGoldstoneOperator } from '../../../server/engine/goldstone/explicit/parseGoldstone'
import { operatorText } from '../../../server/engine/goldstone/explicit/monomial'
import { expressIn } from '../../../server/engine/board/fingerprints'
import { toString as ratText } from '../../../server/engine/exact/rational'

const sources = { scalar: true, vector: true }
const stored = goldstoneBasis({ N: 3, sources, maxOrder: 4 }).byOrder.find((o) => o.order === 4)!
const typed = (texts: string[]) => goldstoneTypedFingerprints({ N: 3, sources, order: 4, evaluatedAtN: 3 }, texts)

function rewrite(text: string) {
  const prints = typed([...stored.kept.map((k) => k.text), text])
  const combo = expressIn(prints.slice(0, -1), prints[prints.length - 1]!)
  if (!combo) return null
  return Object.fromEntries(combo.coefficients.map((c, i) => [stored.kept[i]!.text, ratText(c)]).filter(([, c]) => c !== '0'))
}

describe('typed rewrites in the Goldstone frame (N = 3, p⁴)', () => {
  it("the board's texts read back to the same operators", () => {
    for (const op of [...stored.kept, ...stored.alternatives]) expect(operatorText(parseGoldstoneOperator(op.text))).toBe(op.text)
  })

  it('the kept operators typed again land on their stored fingerprints (the points are reproduced)', () => {
    expect(typed(stored.kept.map((k) => k.text))).toEqual(stored.kept.map((k) => k.fingerprint))
  })

  it('⟨u·u⟩² = 2⟨u_μ u_ν u^μ u^ν⟩ + 4⟨u_μ u^μ u_ν u^ν⟩ − 2⟨u_μ u_ν⟩⟨u^μ u^ν⟩: the Cayley–Hamilton relation of traceless 3×3 matrices, ⟨ABAB⟩ = −2⟨A²B²⟩ + ½⟨A²⟩⟨B²⟩ + ⟨AB⟩² (Gasser & Leutwyler, Nucl. Phys. B 250 (1985) 465)', () => {
    expect(rewrite('<u_μ u^μ><u_ν u^ν>')).toEqual({ '⟨u_μ u_ν u^μ u^ν⟩': '2', '⟨u_μ u^μ u_ν u^ν⟩': '4', '⟨u_μ u_ν⟩⟨u^μ u^ν⟩': '-2' })
  })

  it('a set-aside operator typed in gets the rewrite stored with it', () => {
    const alt = stored.alternatives.find((a) => !a.contact)!
    const expected = Object.fromEntries(alt.rewrite!.map((t) => [t.text, t.coefficient]))
    expect(rewrite(alt.text)).toEqual(expected)
  })

  it('a sum is linear: ⟨u·u⟩² − 2⟨u_μ u_ν u^μ u^ν⟩ leaves the other two terms (common practice)', () => {
    expect(rewrite('⟨u_μ u^μ⟩⟨u_ν u^ν⟩ − 2 ⟨u_μ u_ν u^μ u^ν⟩')).toEqual({ '⟨u_μ u^μ u_ν u^ν⟩': '4', '⟨u_μ u_ν⟩⟨u^μ u^ν⟩': '-2' })
  })

  it('refuses, in words, a text it cannot read, a wrong order, and p⁶', () => {
    expect(() => typed(['⟨u_μ u_ν⟩'])).toThrow('the index μ appears 1 time in one term')
    expect(() => typed(['⟨u_μ u^μ⟩'])).toThrow('has a term of chiral order p^2, but this class is p^4')
    expect(() => typed(['⟨x⟩'])).toThrow('a building block (u, χ+, χ−, f+, f−, χ, χ†, F_L, F_R) expected')
    expect(() => goldstoneTypedFingerprints({ N: 3, sources, order: 6, evaluatedAtN: 3 }, ['⟨u_μ u^μ⟩'])).toThrow('typed operators are rewritten up to p^4 in the Goldstone frame')
  })
})
