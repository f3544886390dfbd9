import { describe, expect, it } from 'vitest'
import { CONVENTIONAL_OPERATORS, printedPerReal, type ConventionalOperator } from '../../../server/engine/heavy'
import type { Structure } from '../../../server/engine/heavy/structure'
import { levi } from '../../../server/engine/heavy/algebra'
import { add, mul, neg, parseRational, rat, sub, toString, ZERO, type Rational } from '../../../server/engine/exact/rational'

// Constant fields, linear order in B for the spin terms: every D acts as ip (their commutators
// bring a second field strength). Dictionary of the real algebra (algebra.ts): D → ip,
// ℰ = igE, ℬ = −igB, s = iσ, couplings absorbed (g = 1), units m = 1.
interface Fields {
  p: number[]
  E: number[]
  B: number[]
}
/** Value as (unit part, σ_x, σ_y, σ_z) of an operator's printed form; D_t never appears here. */
type Value = [Rational, Rational, Rational, Rational]

function structureValue(s: Structure, f: Fields): Value {
  const slots = (s.spin ? 1 : 0) + s.letters.filter((l) => l !== 'T').length
  const out: Value = [ZERO, ZERO, ZERO, ZERO]
  const idx = new Array<number>(slots).fill(1)
  for (let n = 0; n < 3 ** slots; n++) {
    let m = n
    for (let j = 0; j < slots; j++) {
      idx[j] = (m % 3) + 1
      m = Math.floor(m / 3)
    }
    let w = 1
    for (const [a, b] of s.pairs) if (idx[a] !== idx[b]) w = 0
    if (s.eps) w *= levi(idx[s.eps[0]]!, idx[s.eps[1]]!, idx[s.eps[2]]!)
    if (w === 0) continue
    let slot = s.spin ? 1 : 0
    for (const l of s.letters) {
      if (l === 'T') throw new Error('no D_t in these operators')
      w *= (l === 'D' ? f.p : l === 'E' ? f.E : f.B)[idx[slot++]! - 1]!
    }
    const k = s.spin ? idx[0]! : 0
    out[k] = add(out[k]!, rat(w))
  }
  // i per D, i per E, −i per B, i per σ: the power of i, then the sign
  const nD = s.letters.filter((l) => l === 'D').length
  const nE = s.letters.filter((l) => l === 'E').length
  const nB = s.letters.filter((l) => l === 'B').length
  const power = (nD + nE + 3 * nB + (s.spin ? 1 : 0)) % 4
  if (power % 2 === 1) throw new Error('odd power of i: not a real structure at this point')
  return power === 2 ? (out.map(neg) as Value) : out
}

/** The printed operator (sign, i, scale as printed; without c and 1/m^n) at constant fields. */
function printedValue(op: ConventionalOperator, f: Fields): Value {
  const total: Value = [ZERO, ZERO, ZERO, ZERO]
  for (const t of op.combo) {
    const v = structureValue(t.s, f)
    for (let k = 0; k < 4; k++) total[k] = add(total[k]!, mul(rat(t.coef), v[k]!))
  }
  const phase = printedPerReal(op)
  // every term is real here, so the printed factor must be real as well
  if (phase.k % 2 === 1) throw new Error(`${op.id}: imaginary printed factor at real field values`)
  const r = phase.k === 2 ? neg(phase.r) : phase.r
  return total.map((x) => mul(x, r)) as Value
}

const op = (id: string): ConventionalOperator => CONVENTIONAL_OPERATORS.find((c) => c.id === id)!
const dot = (a: number[], b: number[]) => a.reduce((s, x, i) => s + x * b[i]!, 0)

/**
 * H_spin from the Lagrangian (H = −L for the static terms) with the relations applied, minus
 * the Thomas–BMT spin Hamiltonian expanded to 1/m³:
 * H = −(1+a)/2 σ·B + p²σ·B/4 + a (σ·p)(p·B)/4 (m = g = 1).
 */
function bmtMismatch(a: Rational, cW1: Rational, f: Fields, ops: Record<string, ConventionalOperator>): Rational[] {
  const cF = add(rat(1), a)
  const coef: Record<string, Rational> = { fermi: cF, W1: cW1, W2: sub(cW1, rat(1)), pp: sub(cF, rat(1)) }
  const h = [ZERO, ZERO, ZERO]
  for (const [id, c] of Object.entries(coef)) {
    const v = printedValue(ops[id]!, f)
    for (let k = 0; k < 3; k++) h[k] = sub(h[k]!, mul(c, v[k + 1]!))
  }
  const p2 = dot(f.p, f.p)
  const pB = dot(f.p, f.B)
  return [0, 1, 2].map((k) => {
    const bmt = add(add(mul(neg(cF), rat(f.B[k]!, 2)), rat(p2 * f.B[k]!, 4)), mul(a, rat(pB * f.p[k]!, 4)))
    return sub(h[k]!, bmt)
  })
}

const FIELDS: Fields[] = [
  { p: [2, -1, 3], E: [0, 0, 0], B: [1, 4, -2] },
  { p: [-3, 5, 1], E: [0, 0, 0], B: [2, -1, 1] },
]
const MOMENTS = ['0', '1/3', '-2/5', '7']
const ALL = Object.fromEntries(CONVENTIONAL_OPERATORS.map((c) => [c.id, c]))

describe('Lorentz invariance of the printed spin terms: Thomas–BMT precession in a constant magnetic field (Bargmann, Michel, Telegdi, Phys. Rev. Lett. 2 (1959) 435; expansion of Jackson, Classical Electrodynamics, 3rd ed., eq. (11.170), from memory)', () => {
  it("with c_F = 1 + a, c_W2 = c_W1 − 1 and c_p'p = c_F − 1 (Manohar, Phys. Rev. D 56 (1997) 230), the printed terms give exactly the BMT spin Hamiltonian: p²σ·B independent of a", () => {
    for (const f of FIELDS)
      for (const a of MOMENTS)
        for (const cW1 of ['1', '7/5', '-3']) {
          expect(bmtMismatch(parseRational(a), parseRational(cW1), f, ALL).map(toString)).toEqual(['0', '0', '0'])
        }
  })
  it("the opposite printed sign of D^iσ·BD^i (+c_W2) with the same relation makes the p²σ·B coefficient depend on a (the referee's finding)", () => {
    const plus = { ...op('W2'), sign: 1 as const }
    const mismatch = bmtMismatch(parseRational('1/3'), parseRational('7/5'), FIELDS[0]!, { ...ALL, W2: plus })
    expect(mismatch.some((x) => toString(x) !== '0')).toBe(true)
  })
  it('W2 prints with a minus sign in front of its coefficient, as the relation needs', () => {
    expect(op('W2').sign).toBe(-1)
    expect(op('W2').latex.startsWith('-c_{W2}')).toBe(true)
  })
})

describe('the E² terms (Manohar 1997; Hill, Lee, Paz, Solon, Phys. Rev. D 87 (2013) 053017)', () => {
  const f: Fields = { p: [0, 0, 0], E: [3, -1, 2], B: [1, 2, -2] }
  it('c_A1 multiplies the Lorentz scalar B² − E² = ½F_{μν}F^{μν}, with F_{0i} = E_i, F_{ij} = −ε_ijk B_k and metric (+,−,−,−) (common practice)', () => {
    const F = [
      [0, ...f.E],
      [-f.E[0]!, 0, 0, 0],
      [-f.E[1]!, 0, 0, 0],
      [-f.E[2]!, 0, 0, 0],
    ]
    for (let i = 1; i <= 3; i++)
      for (let j = 1; j <= 3; j++) {
        F[i]![j] = -[1, 2, 3].reduce((s, k) => s + levi(i, j, k) * f.B[k - 1]!, 0)
      }
    const eta = [1, -1, -1, -1]
    let ff = 0
    for (let m = 0; m < 4; m++) for (let n = 0; n < 4; n++) ff += F[m]![n]! * F[m]![n]! * eta[m]! * eta[n]!
    // printed (B² − E²)/8 equals F_{μν}F^{μν}/16
    expect(toString(printedValue(op('A1'), f)[0])).toBe(toString(rat(ff, 16)))
  })
  it('c_A2 prints as −c_A2 E²/16m³, the sign convention of the sources', () => {
    expect(toString(printedValue(op('A2'), f)[0])).toBe(toString(rat(-dot(f.E, f.E), 16)))
    expect(op('A2').latex.startsWith('-c_{A2}')).toBe(true)
  })
  it('the Fermi term prints as +c_F σ·B/2m: H = −(1+a) σ·B/2m, the magnetic moment of a g = 2(1+a) particle (common practice)', () => {
    expect(printedValue(op('fermi'), { p: [0, 0, 0], E: [0, 0, 0], B: [1, 2, 3] }).map(toString)).toEqual(['0', '1/2', '1', '3/2'])
  })
})
