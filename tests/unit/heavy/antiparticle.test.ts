import { describe, expect, it } from 'vitest'
import { enumerateHeavy, orderSpace, ANTIPARTICLE_CONVENTION, type HeavyInput } from '../../../server/engine/heavy'
import { addScaled, letterElement, multiply, type Element } from '../../../server/engine/heavy/algebra'
import { div, mul, neg, rat, toString, type Rational } from '../../../server/engine/exact/rational'

// The Dirac Lagrangian in the Dirac representation, Ψ = (φ, η), couplings in D (algebra.ts):
//   L = φ†(iD_t − m)φ + η†(iD_t + m)η + φ†(iσ·D)η + η†(iσ·D)φ,   iσ·D = s·D (s = iσ).
// Keep the block with β = ±1 (φ: +1, ψ the particle; η: −1, χ the antiparticle in the
// Bodwin–Braaten–Lepage convention), remove its rest energy e^{−iβmt}: the other block gets
// iD_t + 2βm. Eliminating it (tree level, equivalent to Foldy–Wouthuysen up to a field
// redefinition):  L_kept = iD_t − (s·D)(iD_t + 2μ)^{-1}(s·D),  μ = βm,
//   (iD_t + 2μ)^{-1} = Σ_n (−iD_t)^n / (2μ)^{n+1},
// so 1/m: −(s·D)²/(2μ);  1/m²: +i (s·D)D_t(s·D)/(4μ²). At 1/m² the leading-order EOM
// (iD_t ≈ 0 on both sides) is exact, which the quotient of orderSpace implements.
function sDotD(): Element {
  let out: Element = new Map()
  for (let i = 1; i <= 3; i++) out = addScaled(out, multiply(letterElement('s', i), letterElement('D', i)))
  return out
}
const SD = sDotD()
const T = letterElement('T', 0)

/** Coefficients (in units of 1/m^n, n = 1, 2) of the eliminated block, for μ = β m. */
function reduction(beta: 1 | -1): Array<{ order: number; element: Element; coefficient: Rational }> {
  const mu = rat(beta)
  return [
    { order: 1, element: multiply(SD, SD), coefficient: neg(div(rat(1), mul(rat(2), mu))) },
    // the factor i of i D_t is common to ψ and χ and cancels in their ratio
    { order: 2, element: multiply(multiply(SD, T), SD), coefficient: div(rat(1), mul(rat(4), mul(mu, mu))) },
  ]
}

const qed = (anti: boolean, charged = true): HeavyInput => ({
  heavy: { particle: { name: 'psi', charges: { X: charged ? '1' : '0' } }, ...(anti ? { antiparticle: { name: 'chi' } } : {}), gaugeGroup: 'X', maxOrder: 3 },
  groups: [{ name: 'X', type: 'U1', gauge: true }],
})

describe('one antiparticle convention, derived from the Dirac Lagrangian (Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125 convention for χ; reduction by hand, common practice)', () => {
  const res = enumerateHeavy(qed(true))
  for (const order of [1, 2]) {
    it(`1/m^${order}: on every basis operator, c(χ-copy)/c(ψ-operator) from the reduction equals the stated factor`, () => {
      const space = orderSpace(order, true).space
      const psi = reduction(1).find((r) => r.order === order)!
      const chi = reduction(-1).find((r) => r.order === order)!
      const onBasis = space.rewrite(psi.element)
      const stated = res.orders[order - 1]!.antiparticle.map((a) => a.fixedBy!.factor)
      let checked = 0
      onBasis.forEach((r, b) => {
        if (r.num === 0n) return
        const ratio = div(mul(chi.coefficient, r), mul(psi.coefficient, r))
        expect(toString(ratio)).toBe(String(stated[b]))
        checked++
      })
      expect(checked).toBe(res.orders[order - 1]!.count) // every basis operator is reached (a = 0: c_F = c_D = c_S = 1)
    })
  }
  it('1/m³, free particle: the pole of L = E − p²/(E + 2μ) gives E = p²/2μ − p⁴/8μ³ + …, so D⁴ enters ψ with +1/8 and χ with −1/8 (c_4 = 1; common practice: expansion of √(p² + m²))', () => {
    // E = a p² + b p⁴: E² + 2μE − p² = 0 order by order gives a = 1/(2μ), b = −a²/(2μ)
    const d4 = (beta: 1 | -1): Rational => {
      const mu = rat(beta)
      const a = div(rat(1), mul(rat(2), mu))
      const b = neg(div(mul(a, a), mul(rat(2), mu)))
      return neg(b) // L = −H and p⁴ = D⁴
    }
    expect([toString(d4(1)), toString(d4(-1))]).toEqual(['1/8', '-1/8'])
    const neutral = enumerateHeavy(qed(true, false))
    expect(neutral.orders[2]!.count).toBe(1)
    expect(neutral.orders[2]!.antiparticle[0]!.fixedBy!.factor).toBe(Number(toString(div(d4(-1), d4(1)))))
  })
  it('through 1/m³ the factor is (−1)^n for every P- and T-even operator, and the convention is stated once for the board and exports', () => {
    for (const o of res.orders) for (const a of o.antiparticle) expect(a.fixedBy!.factor).toBe((-1) ** o.order)
    expect(res.antiparticleNote).toBe(ANTIPARTICLE_CONVENTION)
    expect(res.antiparticleNote).toContain("creates the antiparticle and carries the particle's own gauge representation")
    expect(res.fourFermionNote).toContain('χ creates the antiparticle and carries the colour of ψ')
  })
  it('the kinetic reduction is the sum of the published kinetic and Fermi terms with c_k = c_F = 1 (Caswell, Lepage, Phys. Lett. B 167 (1986) 437)', () => {
    const psi = reduction(1)[0]!
    const onBasis = orderSpace(1, true)
      .space.rewrite(psi.element)
      .map((r) => mul(psi.coefficient, r))
    const published = res.orders[0]!.conventional
    // −(s·D)²/2 = D²/2 + σ·B/2: the published rewrites (printed forms on the displayed basis) add up to it
    const total = new Map<string, string>()
    for (const c of published) for (const t of c.rewrite!) total.set(t.id, t.coefficient)
    // displayed basis operators are the real combinations here (Hermitian, no phase): compare directly
    res.orders[0]!.basis.forEach((b, i) => expect(total.get(b.id)).toBe(toString(onBasis[i]!)))
  })
})

describe("names: the antiparticle class and the published cards speak the theory's own field names", () => {
  const r = enumerateHeavy({ heavy: { particle: { name: 'N', charges: { X: '1' } }, antiparticle: { name: 'Nbar' }, gaugeGroup: 'X', maxOrder: 2 }, groups: [{ name: 'X', type: 'U1', gauge: true }] })
  it("χ-copies print the antiparticle field, never the particle's (common practice)", () => {
    for (const o of r.orders)
      for (const a of o.antiparticle) {
        expect(a.latex.startsWith('\\bar{N}^\\dagger')).toBe(true)
        expect(a.latex.endsWith('\\bar{N}')).toBe(true)
        expect(a.terms[0]).toHaveProperty('Nbar', 1)
      }
  })
  it("published cards and the leading operator use the particle's name, not ψ", () => {
    const cards = r.orders.flatMap((o) => o.conventional)
    expect(cards.length).toBe(4)
    for (const c of [...cards, r.leading]) {
      expect(c.latex).not.toContain('\\psi')
      expect(c.latex).toContain('N^\\dagger')
    }
  })
})
