import { describe, expect, it } from 'vitest'
import { PrimeField } from '../../../server/engine/finite/primeField'
import { classBasis, rewriteOperator } from '../../../server/engine/basis/index'
import { notationTarget } from '../../../server/engine/notation/index'
import { notationColumnTerms } from '../../../server/engine/notation/written'
import { typedFingerprints } from '../../../server/engine/board/typedOperator'
import { diracWave, gammaEntry, vectorMetric } from '../../../server/engine/notation/spinors'
import smeftJson from '../basis/fixtures/smeft.json'
import type { Theory } from '../../../shared/schemas/theory'

const smeft = smeftJson as Theory
const F = new PrimeField(1000003)
const fr = (x: number): number => F.div(F.from(x * 2), F.from(2))
const rewrite = (key: string, text: string) => {
  const b = classBasis(smeft, key)
  const t = notationTarget(smeft, b.class, text)
  return { timesI: t.timesI, text: rewriteOperator(b, t).text }
}

describe('the Feynman-rule building blocks over F_p (Dreiner, Haber, Martin, Phys. Rept. 494 (2010) 1)', () => {
  const V = [3, 7, 11, 5]
  const slash = (d: number, e: number): number => {
    let s = 0
    for (let v = 0; v < 4; v++) for (let w = 0; w < 4; w++) s = F.add(s, F.mul(F.mul(fr(vectorMetric(v, w)), V[v]!), F.from(gammaEntry(w, d, e))))
    return s
  }
  it('Clifford algebra: (V·γ)² = V² for a vector in bispinor components', () => {
    let v2 = 0
    for (let v = 0; v < 4; v++) for (let w = 0; w < 4; w++) v2 = F.add(v2, F.mul(fr(vectorMetric(v, w)), F.mul(V[v]!, V[w]!)))
    expect(v2).toBe(F.from(3 * 5 - 7 * 11)) // det V_{aȧ}
    for (let d = 0; d < 4; d++)
      for (let e = 0; e < 4; e++) {
        let s = 0
        for (let m = 0; m < 4; m++) s = F.add(s, F.mul(slash(d, m), slash(m, e)))
        expect(s, `${d}${e}`).toBe(d === e ? v2 : 0)
      }
  })
  it('the four wave-functions solve the massless Dirac equation p̸u = 0, ū p̸ = 0', () => {
    const lam: [number, number] = [4, 9]
    const lamt: [number, number] = [2, 13]
    const p = [0, 1, 2, 3].map((v) => F.mul(lam[v >> 1]!, lamt[v & 1]!))
    const pslash = (d: number, e: number): number => {
      let s = 0
      for (let v = 0; v < 4; v++) for (let w = 0; w < 4; w++) s = F.add(s, F.mul(F.mul(fr(vectorMetric(v, w)), p[v]!), F.from(gammaEntry(w, d, e))))
      return s
    }
    for (const angle of [true, false]) {
      const col = diracWave(F, angle ? lam : lamt, angle, false)
      const row = diracWave(F, angle ? lam : lamt, angle, true)
      for (let d = 0; d < 4; d++) {
        let a = 0
        let b = 0
        for (let e = 0; e < 4; e++) {
          a = F.add(a, F.mul(pslash(d, e), col[e]!))
          b = F.add(b, F.mul(row[e]!, pslash(e, d)))
        }
        expect([a, b]).toEqual([0, 0])
      }
    }
  })
})

describe('printed operators land on the kept operators of their class', () => {
  it('the Weinberg operator (Weinberg, PRL 43 (1979) 1566) typed in either SU(2) contraction is the one operator of L^2 H^2', () => {
    const a = rewrite('L^2 H^2', '\\varepsilon_{jk}\\varepsilon_{mn}(L^j)^T C L^m H^k H^n')
    const b = rewrite('L^2 H^2', '\\varepsilon_{jn}\\varepsilon_{mk}(L^j)^T C L^m H^k H^n')
    expect(a.text).not.toBe('0')
    expect(b.text).toBe(a.text) // Schouten: the difference is ε_{jm}ε_{kn}(L^j C L^m)…, zero for one flavour
    expect(rewrite('L^2 H^2', '\\varepsilon_{jm}\\varepsilon_{kn}(L^j)^T C L^m H^k H^n').text).toBe('0')
  })
  it('a dual field strength is i times the field strength on the left-handed half (common practice)', () => {
    const plain = rewrite('W_L^2 H H*', 'H^\\dagger H W^I_{\\mu\\nu}W^{I\\mu\\nu}')
    const dual = rewrite('W_L^2 H H*', 'H^\\dagger H \\tilde W^I_{\\mu\\nu}W^{I\\mu\\nu}')
    expect(plain.timesI).toBe(false)
    expect(dual.timesI).toBe(true)
    expect(dual.text).toBe(plain.text.startsWith('-') ? plain.text.slice(1) : `-${plain.text}`)
  })
  it('refuses an operator outside the class, an index left free, and a sum mixing i and 1', () => {
    expect(() => rewrite('W_L^2 H H*', '(H^\\dagger H)^3')).toThrow(/no part in the class W_L\^2 H H\*/)
    expect(() => rewrite('W_L^2 H H*', 'H^\\dagger H W^I_{\\mu\\nu}W^{I\\mu\\rho}')).toThrow(/index (nu|rho) appears once/)
    expect(() => rewrite('W_L^2 H H*', 'H^\\dagger H W^I_{\\mu\\nu}W^{I\\mu\\nu} + H^\\dagger H \\tilde W^I_{\\mu\\nu}W^{I\\mu\\nu}')).toThrow(/with and without a factor i/)
  })
  it("the board's typed fingerprint of a printed operator equals that of its bracket form", () => {
    const kept = classBasis(smeft, 'H^3 H*^3').kept[0]!.text // (H†H)^3 = 1·kept (rewrite above)
    const [printed, bracket] = typedFingerprints(smeft, 'H^3 H*^3', ['(H^\\dagger H)^3', kept])
    expect(printed!.values).toEqual(bracket!.values)
  })
  it('a printed operator can be kept first: the class keeps it by its printed text', () => {
    const keep = '(H^\\dagger H)\\Box(H^\\dagger H)'
    const b = classBasis(smeft, 'D^2 H^2 H*^2', { priorities: { keep: { 'D^2 H^2 H*^2': [keep] } }, printed: notationColumnTerms })
    expect(b.rank).toBe(2)
    expect(b.kept[0]!.text).toBe(keep)
  })
})
