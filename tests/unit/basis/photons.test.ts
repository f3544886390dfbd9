import { describe, expect, it } from 'vitest'
import { classBasis, rewriteOperator, buildBasis, type AmplitudeTarget } from '../../../server/engine/basis/index'
import { rat, type Rational } from '../../../server/engine/exact/rational'
import { chain, contract, dual, fieldStrength, permutations4, type Tensor } from './minkowski'
import type { PrimeField } from '../../../server/engine/finite/primeField'
import type { SamplePoint } from '../../../server/engine/basis/evaluation'
import { solve } from '../../../server/engine/finite/matrix'
import { reconstructRational } from '../../../server/engine/finite/rationalReconstruction'

const photons = {
  name: 'photons',
  frame: 'relativistic' as const,
  groups: [{ name: 'QED', type: 'U1' as const, gauge: true }],
  fields: [{ name: 'F', lorentz: 'field-strength' as const, gaugeOf: 'QED' }],
}

type Op = (F: PrimeField, t: Tensor[]) => number
/** Operator contact amplitude: all 24 Wick assignments of the four F's to the four legs. */
function target(helicities: (-1 | 1)[], op: Op, label: string): AmplitudeTarget {
  return {
    label,
    evaluate(F: PrimeField, pt: SamplePoint, map: number[]): number {
      if (map.some((m, i) => m !== i)) return 0 // already fully symmetrised below; count once
      const ref: [number, number] = [3, 7]
      const fs = helicities.map((h, leg) => fieldStrength(F, pt.kin, leg, h, ref))
      return permutations4().reduce(
        (s, p) =>
          F.add(
            s,
            op(
              F,
              p.map((i) => fs[i]!),
            ),
          ),
        0,
      )
    },
  }
}
const FF2: Op = (F, t) => F.mul(contract(F, t[0]!, t[1]!), contract(F, t[2]!, t[3]!))
const FFd2: Op = (F, t) => F.mul(contract(F, t[0]!, dual(F, t[1]!)), contract(F, t[2]!, dual(F, t[3]!)))
const CHAIN: Op = (F, t) => chain(F, t)

function coefficient(key: string, hel: (-1 | 1)[], op: Op, label: string): Rational {
  const b = classBasis(photons, key)
  const r = rewriteOperator(b, target(hel, op, label))
  expect(r.coefficients).toHaveLength(1)
  return r.coefficients[0]!.coefficient
}

describe('photons only (Euler & Heisenberg, Z. Phys. 98 (1936) 714)', () => {
  it('F^4 classes: one structure each; abelian F^3 vanishes by Bose symmetry (common practice)', () => {
    expect(classBasis(photons, 'F_L^4').rank).toBe(1)
    expect(classBasis(photons, 'F_L^2 F_R^2').rank).toBe(1)
    expect(classBasis(photons, 'F_R^4').rank).toBe(1)
    expect(classBasis(photons, 'F_L^3').rank).toBe(0)
  })
  it('dimension 8: three real parameters, (FF)², (FF̃)², (FF)(FF̃); tally agrees with the Hilbert series', () => {
    const r = buildBasis(photons, { minDim: 8, maxDim: 8 })
    const d8 = r.byDimension.find((d) => d.dimension === 8)!
    expect(d8.operators).toBe(3)
    expect(d8.tallyOk).toBe(true)
    expect(d8.classes.map((c) => c.key).sort()).toEqual(['F_L^2 F_R^2', 'F_L^4'])
  })
  it('F^{μν}F_{νρ}F^{ρσ}F_{σμ} = ½(FF)² + ¼(FF̃)² on shell (common practice), via exact rewrite', () => {
    // In each helicity class the chain, (FF)² and (FF̃)² are multiples of the one kept
    // operator; solve chain = a (FF)² + b (FF̃)² from the two independent classes.
    const rows = [
      ['F_L^4', [-1, -1, -1, -1]],
      ['F_L^2 F_R^2', [-1, -1, 1, 1]],
    ] as const
    const [c1, c2] = rows.map(([key, hel]) => ({
      chain: coefficient(key, [...hel], CHAIN, 'chain'),
      ff: coefficient(key, [...hel], FF2, '(FF)^2'),
      ffd: coefficient(key, [...hel], FFd2, '(FFdual)^2'),
    })) as [{ chain: Rational; ff: Rational; ffd: Rational }, { chain: Rational; ff: Rational; ffd: Rational }]
    // Cramer's rule in exact rationals.
    const m = (a: Rational, b: Rational) => ({ num: a.num * b.num, den: a.den * b.den })
    const sub = (a: Rational, b: Rational) => rat(a.num * b.den - b.num * a.den, a.den * b.den)
    const det = sub(m(c1.ff, c2.ffd), m(c1.ffd, c2.ff))
    const a = sub(m(c1.chain, c2.ffd), m(c1.ffd, c2.chain))
    const b = sub(m(c1.ff, c2.chain), m(c1.chain, c2.ff))
    expect(rat(a.num * det.den, a.den * det.num)).toEqual(rat(1, 2))
    expect(rat(b.num * det.den, b.den * det.num)).toEqual(rat(1, 4))
  })
  it('(FF)(FF̃) is P-odd: imaginary and opposite relative to (FF)² in F_L^4 and F_R^4, absent from F_L^2 F_R^2 (common practice)', () => {
    const mixed: Op = (F, t) => F.mul(contract(F, t[0]!, t[1]!), contract(F, t[2]!, dual(F, t[3]!)))
    // Work modulo the first prime: the coefficient carries a factor i, whose image in F_p
    // is not coherent between primes, so no rational reconstruction here.
    const modP = (key: string, hel: (-1 | 1)[], op: Op): { F: PrimeField; x: number } => {
      const b = classBasis(photons, key)
      const pd = b.primes[0]!
      const t = target(hel, op, 'x')
      const vals = pd.points.map((pt) => t.evaluate(pd.F, pt, [0, 1, 2, 3]))
      return { F: pd.F, x: solve(pd.F, pd.keptRows, vals)[0]! }
    }
    const ratio = (key: string, hel: (-1 | 1)[]) => {
      const a = modP(key, hel, mixed)
      const c = modP(key, hel, FF2)
      return { F: a.F, r: a.F.div(a.x, c.x) }
    }
    const L = ratio('F_L^4', [-1, -1, -1, -1])
    const R = ratio('F_R^4', [1, 1, 1, 1])
    expect(L.r).not.toBe(0)
    expect(L.F.add(L.r, R.r)).toBe(0)
    const sq = reconstructRational(BigInt(L.F.mul(L.r, L.r)), BigInt(L.F.p))
    expect(sq.num < 0n).toBe(true) // ratio² < 0: the ratio is imaginary
    expect(modP('F_L^2 F_R^2', [-1, -1, 1, 1], mixed).x).toBe(0)
  })
  it('rewriting an amplitude with a factor i fails loudly, naming the class', () => {
    const mixed: Op = (F, t) => F.mul(contract(F, t[0]!, t[1]!), contract(F, t[2]!, dual(F, t[3]!)))
    expect(() => rewriteOperator(classBasis(photons, 'F_L^4'), target([-1, -1, -1, -1], mixed, 'mixed'))).toThrow(
      /^In the class F_L\^4, a coefficient of the rewrite is not a fraction with numerator and denominator up to \d+ \(product up to \d+\); an operator with a factor i/,
    )
  })
})

describe('photons: Hermitian choice and CP (common practice)', () => {
  it('F_L^2 F_R^2 keeps ⟨12⟩²[34]² itself (Hermitian) and rewrites it with coefficient 1; CP: two even, one odd', () => {
    const b = classBasis(photons, 'F_L^2 F_R^2')
    expect(b.kept.map((k) => k.text)).toEqual(['<12>^2[34]^2'])
    expect(rewriteOperator(b, '<12>^2[34]^2').coefficients[0]!.coefficient).toEqual(rat(1))
    expect(rewriteOperator(b, '<12>^2[34]^2 + 1/3 <21>^2[43]^2').coefficients[0]!.coefficient).toEqual(rat(4, 3))
    const d8 = buildBasis(photons, { minDim: 8, maxDim: 8 }).byDimension[0]!
    expect(d8.classes.reduce((s, c) => s + c.cpEven!, 0)).toBe(2) // (FF)², (FF̃)²
    expect(d8.classes.reduce((s, c) => s + c.cpOdd!, 0)).toBe(1) // (FF)(FF̃)
  })
})
