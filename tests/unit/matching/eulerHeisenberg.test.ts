import { describe, expect, it } from 'vitest'
import { MATCHING_LIBRARY, coefficientText, type MatchingForm } from '../../../server/engine/matching/library'
import { fieldInvariants, type FieldInvariants, type Vec3 } from '../../../server/engine/matching/fieldInvariants'
import { add, div, equals, mul, parseRational, rat, sub, toString as ratText, ZERO, type Rational } from '../../../server/engine/exact/rational'

const eh = MATCHING_LIBRARY.find((e) => e.id === 'euler-heisenberg')!
const q = parseRational

/** Deterministic rational samples (linear congruential generator, fixed seed). */
function sampler(seed: number) {
  let s = seed
  const next = () => {
    s = (s * 1103515245 + 12345) % 2147483648
    return s
  }
  return (): Rational => rat((next() % 41) - 20, (next() % 7) + 1)
}

function power(r: Rational, k: number): Rational {
  let out = rat(1)
  for (let i = 0; i < k; i++) out = mul(out, r)
  return out
}

/** Σ coefficient × monomial, in units of α²Q⁴/m⁴ (all terms share them). */
function evaluate(form: MatchingForm, inv: FieldInvariants): Rational {
  let s = ZERO
  for (const t of form.terms) {
    let m = t.coefficient.rational
    for (const [key, k] of Object.entries(t.invariants ?? {})) m = mul(m, power(inv[key as keyof FieldInvariants], k!))
    s = add(s, m)
  }
  return s
}

describe('Euler–Heisenberg (W. Heisenberg, H. Euler, Z. Phys. 98 (1936) 714)', () => {
  it('E, B form: L = (2α²/45m⁴)[(E²−B²)² + 7(E·B)²]', () => {
    const [a, b] = eh.forms[0]!.terms
    expect([ratText(a!.coefficient.rational), ratText(b!.coefficient.rational)]).toEqual(['2/45', '14/45'])
    expect(coefficientText(a!.coefficient)).toBe('2/45 α^2 Q^4 / m^4')
    expect(eh.dimension).toBe(8)
  })

  it('covariant form: c1 = α²/(90m⁴), c2 = 7α²/(360m⁴), i.e. (2/45)/4 and (14/45)/16 (product-owner identities FF = 2(B²−E²), FF̃ = −4E·B)', () => {
    const [f1, f2] = eh.forms[1]!.terms
    expect(ratText(f1!.coefficient.rational)).toBe('1/90')
    expect(ratText(f2!.coefficient.rational)).toBe('7/360')
    expect(equals(f1!.coefficient.rational, div(q('2/45'), q('4')))).toBe(true)
    expect(equals(f2!.coefficient.rational, div(q('14/45'), q('16')))).toBe(true)
  })

  it('F F = 2(B² − E²) and F F̃ = −4 E·B by explicit tensor contraction, ε^{0123} = +1 (J. D. Jackson, Classical Electrodynamics, 3rd ed., §11.9)', () => {
    const next = sampler(7)
    for (let i = 0; i < 40; i++) {
      const E: Vec3 = [next(), next(), next()]
      const B: Vec3 = [next(), next(), next()]
      const inv = fieldInvariants(E, B)
      expect(ratText(inv.FF)).toBe(ratText(mul(q('-2'), inv.E2minusB2)))
      expect(ratText(inv.FFdual)).toBe(ratText(mul(q('-4'), inv.EdotB)))
    }
  })

  it('both forms agree exactly at 200 random rational E, B (Heisenberg–Euler 1936; the covariant form rewritten)', () => {
    const next = sampler(2026)
    for (let i = 0; i < 200; i++) {
      const E: Vec3 = [next(), next(), next()]
      const B: Vec3 = [next(), next(), next()]
      const inv = fieldInvariants(E, B)
      const lhs = evaluate(eh.forms[0]!, inv)
      const rhs = evaluate(eh.forms[1]!, inv)
      expect(ratText(sub(lhs, rhs)), `E=${E.map(ratText)} B=${B.map(ratText)}`).toBe('0')
    }
  })

  it('a single plane wave (E ⊥ B, |E| = |B|) does not self-interact: both invariants vanish (common practice)', () => {
    const inv = fieldInvariants([q('3'), q('0'), q('0')], [q('0'), q('3'), q('0')])
    expect(ratText(evaluate(eh.forms[0]!, inv))).toBe('0')
    expect(ratText(evaluate(eh.forms[1]!, inv))).toBe('0')
  })

  it('a pure electric field gives L_EH = (2/45) E⁴ α²/m⁴ > 0 (Heisenberg–Euler 1936, weak-field limit)', () => {
    const inv = fieldInvariants([q('1'), q('0'), q('0')], [q('0'), q('0'), q('0')])
    expect(ratText(evaluate(eh.forms[1]!, inv))).toBe('2/45')
  })
})
