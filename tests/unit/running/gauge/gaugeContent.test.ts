import { describe, expect, it } from 'vitest'
import { gaugeContentOf, runGaugeCouplings, runningSegments, towerGaugeContent } from '../../../../server/engine/running/gauge/index'
import { toString } from '../../../../server/engine/exact/rational'
import { parseTheory } from '../../../../server/engine/theory/parseTheory'
import vexonium from '../../../../shared/presets/heavy-vexonium.json'
import { complexScalar, darkU1, qcd, realScalar, SM, strength, theory, u1, weyl, weylR } from './theories'

describe('gauge content of a theory', () => {
  it('reads kinds, flavours, representations and charges; field strengths are not matter', () => {
    const c = gaugeContentOf(SM)
    expect(c.groups.map((g) => [g.name, g.abelian])).toEqual([
      ['colour', false],
      ['weak', false],
      ['hypercharge', true],
    ])
    expect(c.multiplets.map((m) => [m.name, m.kind, m.flavors])).toEqual([
      ['Q', 'weyl', 3],
      ['u', 'weyl', 3],
      ['d', 'weyl', 3],
      ['L', 'weyl', 3],
      ['e', 'weyl', 3],
      ['H', 'complex-scalar', 1],
    ])
    const q = c.multiplets[0]!
    expect(q.reps).toEqual({ colour: [1, 0], weak: [1] })
    expect(toString(q.charges.hypercharge!)).toBe('1/6')
    expect(c.multiplets.every((m) => m.massGeV === 0)).toBe(true)
  })

  it('a real scalar is its own kind; a heavy-frame theory runs with its roster only (the static particle adds nothing)', () => {
    const t = theory('real', [u1('X')], [realScalar('s'), complexScalar('c', { charges: { X: '1' } })])
    expect(gaugeContentOf(t).multiplets.map((m) => m.kind)).toEqual(['real-scalar', 'complex-scalar'])
    const heavy = gaugeContentOf(parseTheory(vexonium))
    expect(heavy.groups.map((g) => g.name)).toEqual(['Xd'])
    expect(heavy.multiplets).toEqual([])
  })
})

describe('gauge content of a tower', () => {
  const full = darkU1('1', '1')
  const noScalar = theory(
    'no scalar',
    full.groups,
    full.fields.filter((f) => f.name !== 'S'),
  )
  const bare = theory(
    'bare',
    full.groups,
    full.fields.filter((f) => f.name === 'Ad'),
  )

  it("fields integrated out carry the threshold of their step; the lowest theory's fields are light", () => {
    const c = towerGaugeContent([
      { theory: full, thresholdGeV: null },
      { theory: noScalar, thresholdGeV: 1000 },
      { theory: bare, thresholdGeV: 10 },
    ])
    expect(c.multiplets.map((m) => [m.name, m.massGeV, m.theory])).toEqual([
      ['chi', 10, 'no scalar'],
      ['chiR', 10, 'no scalar'],
      ['S', 1000, 'Dark U(1)'],
    ])
    expect(c.chain).toEqual([
      { name: 'Dark U(1)', thresholdGeV: null },
      { name: 'no scalar', thresholdGeV: 1000 },
      { name: 'bare', thresholdGeV: 10 },
    ])
    // b = 0 below 10 GeV, 4/3 (the Dirac fermion) up to 1 TeV, 5/3 above (Machacek & Vaughn 1983, by hand).
    expect(runningSegments(c).map((s) => toString(s.coefficients.oneLoop[0]!))).toEqual(['0', '4/3', '5/3'])
  })

  it('the couplings are continuous at a threshold and change slope there (step-function decoupling; Weinberg, Phys. Lett. B 91 (1980) 51)', () => {
    const c = towerGaugeContent([
      { theory: full, thresholdGeV: null },
      { theory: noScalar, thresholdGeV: 1000 },
    ])
    const r = runGaugeCouplings({ content: c, loops: 1, muFromGeV: 1, muToGeV: 1e6, alpha: { X: 0.01 } })
    const at = r.points.find((p) => p.mu === 1000)!
    expect(at.alphaInverse[0]).toBeCloseTo(100 - ((4 / 3) * Math.log(1000)) / (2 * Math.PI), 10)
    expect(r.end.alphaInverse[0]).toBeCloseTo(at.alphaInverse[0]! - ((5 / 3) * Math.log(1000)) / (2 * Math.PI), 10)
  })

  it('refuses a tower that adds a field going down, changes the gauge groups, or whose thresholds rise going down', () => {
    expect(() =>
      towerGaugeContent([
        { theory: noScalar, thresholdGeV: null },
        { theory: full, thresholdGeV: 10 },
      ]),
    ).toThrow('The field S appears in “Dark U(1)” but not in the theory above it, “no scalar”: a tower only removes fields going down. Add S above or remove it below.')
    const qcdBelow = qcd(['u'])
    expect(() =>
      towerGaugeContent([
        { theory: full, thresholdGeV: null },
        { theory: qcdBelow, thresholdGeV: 10 },
      ]),
    ).toThrow('“QCD with 1 quarks” and the theory above it, “Dark U(1)”, have different gauge groups')
    expect(() =>
      towerGaugeContent([
        { theory: full, thresholdGeV: null },
        { theory: noScalar, thresholdGeV: 10 },
        { theory: bare, thresholdGeV: 100 },
      ]),
    ).toThrow('“bare” is obtained at 100 GeV, not below the threshold of “no scalar” (10 GeV): the thresholds of a tower must fall going down.')
    expect(() =>
      towerGaugeContent([
        { theory: full, thresholdGeV: null },
        { theory: noScalar, thresholdGeV: null },
      ]),
    ).toThrow('The threshold scale of “no scalar” below “Dark U(1)” is missing or not a positive number of GeV.')
    expect(() => towerGaugeContent([])).toThrow('The tower has no theory.')
  })
})

describe("inputs of the running, refused in a physicist's words", () => {
  const content = gaugeContentOf(
    theory(
      'two U(1)s and colour',
      [{ name: 'C', type: 'SU', n: 3, gauge: true }, u1('X'), u1('Y')],
      [weyl('q', { reps: { C: [1, 0] }, charges: { X: '1', Y: '1' } }), weylR('qR', { reps: { C: [1, 0] }, charges: { X: '1' } }), strength('Gmu', 'C')],
    ),
  )
  const ok = { content, loops: 2 as const, muFromGeV: 100, muToGeV: 1000, alpha: { C: 0.1, X: 0.01, Y: 0.01 } as Record<string, number> }
  const cases: [string, Partial<typeof ok> & { mixing?: { groups: [string, string]; epsilon: number }[] }, string][] = [
    ['missing group', { alpha: { C: 0.1, X: 0.01 } }, 'Give α_Y at 100 GeV: every gauge coupling of the theory needs a starting value.'],
    ['unknown group', { alpha: { ...ok.alpha, Z: 0.1 } }, 'Z is not a running gauge group of this theory (those are C, X, Y).'],
    ['too strong', { alpha: { ...ok.alpha, C: 13 } }, 'α_C = 13 is not a perturbative coupling: it must be positive and below 4π.'],
    ['negative', { alpha: { ...ok.alpha, X: -0.01 } }, 'α_X = -0.01 is not a perturbative coupling'],
    ['scale', { muFromGeV: 0 }, 'The scale of the inputs must be a number of GeV between 1e-9 and 1e+30, not 0.'],
    ['loops', { loops: 3 as unknown as 2 }, 'The running is at one or two loops, not 3.'],
    ['mixing a simple group', { mixing: [{ groups: ['C', 'X'], epsilon: 0.1 }] }, 'Kinetic mixing is between two U(1) gauge groups of the theory, and C is not one (the U(1)s are X, Y).'],
    ['mixing itself', { mixing: [{ groups: ['X', 'X'], epsilon: 0.1 }] }, 'Kinetic mixing needs two different U(1) groups, not X with itself.'],
    ['mixing too large', { mixing: [{ groups: ['X', 'Y'], epsilon: 1 }] }, 'The kinetic mixing ε between X and Y must lie strictly between −1 and 1, not 1.'],
  ]
  for (const [name, change, message] of cases) {
    it(name, () => {
      expect(() => runGaugeCouplings({ ...ok, ...change })).toThrow(message)
    })
  }

  it('accepts the valid input and returns every accepted step', () => {
    const r = runGaugeCouplings({ ...ok, mixing: [{ groups: ['Y', 'X'], epsilon: -0.2 }] })
    expect(r.points[0]!.mu).toBe(100)
    expect(r.end.mu).toBe(1000)
    expect(r.points[0]!.epsilon[0]).toBeCloseTo(-0.2, 14)
  })
})
