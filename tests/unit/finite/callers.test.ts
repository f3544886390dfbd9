import { describe, expect, it } from 'vitest'
import { coverageRank, expressIn, type Fingerprint } from '../../../server/engine/board/fingerprints'
import { typedFingerprint } from '../../../server/engine/board/typedOperator'
import { buildBasis, type BasisReport } from '../../../server/engine/basis/buildBasis'
import { classBasis } from '../../../server/engine/basis/classBasis'
import { rewriteOperator } from '../../../server/engine/basis/rewrite'
import { QuotientSpace } from '../../../server/engine/heavy/quotient'
import { fourFermionSpace } from '../../../server/engine/heavy/fourSpace'
import { fourCombo } from '../../../server/engine/heavy/fourStructure'
import { combo, expandCombo } from '../../../server/engine/heavy/structure'
import { addScaled, type Element } from '../../../server/engine/heavy/algebra'
import { PrimeSet } from '../../../server/engine/finite/primeSet'
import { EngineConsistencyError, EngineInputError } from '../../../server/engine/errors'
import { div, isZero, neg, rat, toString as ratString, type Rational } from '../../../server/engine/exact/rational'
import { findPreset } from '../../../shared/presets/index'
import { LIFT_CASES, caseName, type LiftCase } from './liftCases'

// The named lift cases (liftCases.ts) through every engine path that lifts coefficients or
// checks agreement between primes, with the two working primes the callers use. A value
// beyond reach must be refused with a message (never a wrong rational); a value that is 0
// modulo one prime, put into a basis operator, must be reported as a disagreement.

const set = PrimeSet.working()

/** "+ 7001/3 X" for a term of an operator text. */
function term(q: Rational, text: string): string {
  return q.num < 0n ? `- ${ratString(neg(q))} ${text}` : `+ ${ratString(q)} ${text}`
}

/** Expect `run` to give `expected` exactly when the case lifts, else a refusal saying why. */
function expectLift(c: LiftCase, run: () => Rational[], expected: Rational[]) {
  if (c.twoPrimes === 'exact') return void expect(run().map(ratString), caseName(c)).toEqual(expected.map(ratString))
  expect(run, caseName(c)).toThrow(EngineInputError)
  expect(run, caseName(c)).toThrow(/is not a fraction with numerator and denominator up to \d+ \(product up to \d+\)/)
}

describe('board fingerprints (synthetic): target 2·A + c·B − C/3', () => {
  const print = (coeffs: Rational[], seed = 0): Fingerprint => ({
    primes: [...set.primes],
    values: set.fields.map((F) => Array.from({ length: 20 }, (_, k) => coeffs.reduce((s, q, j) => F.add(s, F.mul(F.fromRational(q), F.from((k + 3) ** (j + 1) + seed * j))), 0))),
  })
  const [A, B, C] = [
    [rat(1), rat(0), rat(0)],
    [rat(0), rat(1), rat(0)],
    [rat(0), rat(0), rat(1)],
  ].map((v) => print(v))
  for (const c of LIFT_CASES) {
    it(caseName(c), () => {
      expectLift(c, () => expressIn([A!, B!, C!], print([rat(2), c.value, rat(-1, 3)]))!.coefficients, [rat(2), c.value, rat(-1, 3)])
      if (isZero(c.value)) return
      // The case scales a kept operator: B is then c·B, and B itself is (1/c)·(c·B).
      const scaled = print([rat(0), c.value, rat(0)])
      if (c.vanishesModuloAPrime) {
        expect(() => coverageRank([A!, scaled]), caseName(c)).toThrow(EngineConsistencyError)
        expect(() => expressIn([A!, scaled], B!), caseName(c)).toThrow(EngineConsistencyError)
        return
      }
      expect(coverageRank([A!, scaled, C!])).toBe(3)
      expectLift(c, () => expressIn([A!, scaled], B!)!.coefficients, [rat(0), div(rat(1), c.value)])
    })
  }
  it('a not-in-span target is no combination', () => {
    expect(expressIn([A!, B!], C!)).toBeNull()
  })
})

/** A class with two or more kept operators, each a single bracket monomial. */
function plainClass(report: BasisReport, minRank: number) {
  const c = report.byDimension.flatMap((d) => d.classes).find((k) => k.rank >= minRank && k.operators.every((o) => /^[^+\-()]+$/.test(o.text)))
  if (!c) throw new Error('no plain class in the report')
  return c
}

describe('a real basis: SMEFT dimension 6 (typed operators on the board, rewrites, kept priorities)', () => {
  const theory = findPreset('smeft')!.theory
  const report = buildBasis(theory, { minDim: 6, maxDim: 6, nf: 1 })
  const cls = plainClass(report, 2)
  const [x, y] = cls.operators.map((o) => o.text) as [string, string]
  const stored = cls.operators.map((o) => o.fingerprint!)
  const basis = classBasis(theory, cls.key)

  for (const c of LIFT_CASES) {
    it(caseName(c), () => {
      const text = `${term(rat(-1, 3), x)} ${term(c.value, y)}`
      const expected = [rat(-1, 3), c.value, ...stored.slice(2).map(() => rat(0))]
      // The board: a typed operator fingerprinted afresh against the stored kept fingerprints.
      expectLift(c, () => expressIn(stored, typedFingerprint(theory, cls.key, text))!.coefficients, expected)
      // The engine's own rewrite.
      expectLift(c, () => rewriteOperator(basis, text).coefficients.map((k) => k.coefficient), expected)
      if (isZero(c.value)) return
      // Kept first by priority with the case as its coefficient: y = (1/c)·(c·y).
      const keep = () => classBasis(theory, cls.key, { priorities: { keep: { [cls.key]: [term(c.value, y)] } } })
      if (c.vanishesModuloAPrime) return void expect(keep, caseName(c)).toThrow(EngineConsistencyError)
      expectLift(
        c,
        () =>
          rewriteOperator(keep(), y)
            .coefficients.slice(0, 1)
            .map((k) => k.coefficient),
        [div(rat(1), c.value)],
      )
    })
  }
  it('a kept operator is not a combination of the others', () => {
    expect(expressIn(stored.slice(0, 1), stored[1]!)).toBeNull()
  })
})

describe('a class mapped to itself by parity (parity columns and traces agree)', () => {
  const theory = findPreset('real-scalar')!.theory
  const report = buildBasis(theory, { minDim: 8, maxDim: 8 })
  const cls = report.byDimension[0]!.classes.find((k) => k.operators.every((o) => /^[^+\-()]+$/.test(o.text)) && (k.alternatives ?? []).some((a) => / P$/.test(a.text)))!
  const x = cls.operators[0]!.text
  const basis = classBasis(theory, cls.key)
  for (const c of LIFT_CASES) {
    it(caseName(c), () => {
      expectLift(c, () => rewriteOperator(basis, term(c.value, x)).coefficients.map((k) => k.coefficient), [c.value])
    })
  }
})

/** As expectLift, for a caller that adds a third prime when two do not reach. */
function expectLiftWidening(c: LiftCase, run: () => Rational[], expected: Rational[]) {
  if (c.threePrimes === 'exact') return void expect(run().map(ratString), caseName(c)).toEqual(expected.map(ratString))
  expect(run, caseName(c)).toThrow(/is not a fraction with numerator and denominator up to 388735423912 /)
}

describe('heavy frame: quotient space (candidates X and d·Y, target 2X + n·Y for a case n/d; widens to three primes)', () => {
  const el = (text: string): Element => expandCombo(combo([[1, text]]))
  const X = el('D_i D_i')
  const Y = el('s_k B_k')
  const scaled = (e: Element, f: bigint): Element => addScaled(new Map(), e, Number(f))
  for (const c of LIFT_CASES) {
    it(caseName(c), () => {
      const space = () => new QuotientSpace([X, scaled(Y, c.value.den)], [], { sectors: [0, 1] })
      const target = addScaled(scaled(X, 2n), scaled(Y, c.value.num))
      expectLiftWidening(c, () => space().rewrite(target), [rat(2), c.value])
      if (c.vanishesModuloAPrime) expect(() => new QuotientSpace([X, scaled(Y, c.value.num)], [], { sectors: [0, 1] })).toThrow(EngineConsistencyError)
    })
  }
  it('a not-in-span target is refused', () => {
    expect(() => new QuotientSpace([X], [], { sectors: [0, 1] }).rewrite(Y)).toThrow(
      new EngineInputError('QuotientSpace.rewrite', 'This operator is not a combination of the enumerated operators (modulo equations of motion and integration by parts)'),
    )
  })
})

describe('heavy frame: four-fermion ranks (numerator of each case as an integer coefficient)', () => {
  const space = fourFermionSpace(2)
  for (const c of LIFT_CASES) {
    it(caseName(c), () => {
      const op = () => space.rankOf([fourCombo([[Number(c.value.num), '']])])
      if (c.vanishesModuloAPrime) expect(op).toThrow(EngineConsistencyError)
      else expect(op()).toBe(isZero(c.value) ? 0 : 1)
    })
  }
})
