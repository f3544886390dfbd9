import { describe, expect, it } from 'vitest'
import { gaugeContentOf, runGaugeCouplings } from '../../../../server/engine/running/gauge/index'
import { expectClose } from '../../scales/expectClose'
import { complexScalar, darkU1, strength, su, theory, u1, weyl, weylR } from './theories'

const TWO_PI = 2 * Math.PI

/** X = α⁻¹ matrix of two U(1)s from the reported α⁻¹ and ε (X_kl = ε √(X_kk X_ll)). */
function matrix(alphaInverse: number[], epsilon: number[], k = 0, l = 1): number[][] {
  const off = epsilon[0]! * Math.sqrt(alphaInverse[k]! * alphaInverse[l]!)
  return [
    [alphaInverse[k]!, off],
    [off, alphaInverse[l]!],
  ]
}

describe('two U(1)s that mix', () => {
  // b_XX = (2/3)(1 + 1) = 4/3, b_YY = (2/3)·4 + (1/3)·1 = 3, b_XY = (2/3)·1·2 = 4/3 (by hand, Machacek & Vaughn 1983 with Q_X Q_Y).
  const content = gaugeContentOf(theory('two U(1)s', [u1('X'), u1('Y')], [weyl('m', { charges: { X: '1', Y: '2' } }), complexScalar('s', { charges: { Y: '1' } }), weyl('n', { charges: { X: '1' } })]))

  it('one loop: the inverse coupling matrix runs linearly, X(μ) = X(μ0) − b ln(μ/μ0)/2π, off-diagonal entry included (del Aguila, Coughlan, Quirós, Nucl. Phys. B 307 (1988) 633; from memory)', () => {
    const r = runGaugeCouplings({ content, loops: 1, muFromGeV: 1, muToGeV: 1e8, alpha: { X: 0.02, Y: 0.03 }, mixing: [{ groups: ['X', 'Y'], epsilon: 0.1 }] })
    const x0 = [
      [50, 0.1 / Math.sqrt(0.02 * 0.03)],
      [0.1 / Math.sqrt(0.02 * 0.03), 100 / 3],
    ]
    const b = [
      [4 / 3, 4 / 3],
      [4 / 3, 3],
    ]
    const L = Math.log(1e8)
    const got = matrix(r.end.alphaInverse, r.end.epsilon)
    for (const [k, l] of [
      [0, 0],
      [0, 1],
      [1, 1],
    ] as const)
      expectClose(`X_${k}${l}`, 1e8, got[k]![l]!, x0[k]![l]! - (b[k]![l]! * L) / TWO_PI, 1e-9)
    expect(r.pairs).toEqual([['X', 'Y']])
  })

  it('mixing appears from none: ε(μ) = −(b_XY L/2π)/√(X_XX X_YY) at one loop', () => {
    const r = runGaugeCouplings({ content, loops: 1, muFromGeV: 1, muToGeV: 1e-3, alpha: { X: 0.02, Y: 0.03 } })
    const L = Math.log(1e-3)
    const xx = 50 - ((4 / 3) * L) / TWO_PI
    const yy = 100 / 3 - (3 * L) / TWO_PI
    expectClose('ε generated', 1e-3, r.end.epsilon[0]!, (-(4 / 3) * L) / TWO_PI / Math.sqrt(xx * yy), 1e-12)
  })
})

describe('reparametrisation covariance at two loops', () => {
  // Charges Q' = L Q with L = [[1, 1], [0, 1]] (X' = X + Y, Y' = Y) describe the same physics when
  // X' = L X Lᵀ (the coupling matrix transforms inversely to the charges): the flows must agree.
  const fields = (cx: (x: number, y: number) => string, cy: (x: number, y: number) => string) => [
    weyl('a', { reps: { W: [1] }, charges: { X: cx(1, 2), Y: cy(1, 2) } }),
    weylR('b', { charges: { X: cx(-1, 3), Y: cy(-1, 3) }, flavors: 2 }),
    complexScalar('h', { reps: { W: [1] }, charges: { X: cx(0, 1), Y: cy(0, 1) } }),
    strength('Wmu', 'W'),
  ]
  const original = gaugeContentOf(
    theory(
      'original',
      [su('W', 2), u1('X'), u1('Y')],
      fields(
        (x) => String(x),
        (_x, y) => String(y),
      ),
    ),
  )
  const rotated = gaugeContentOf(
    theory(
      'rotated',
      [su('W', 2), u1('X'), u1('Y')],
      fields(
        (x, y) => String(x + y),
        (_x, y) => String(y),
      ),
    ),
  )

  it('X′(μ) = L X(μ) Lᵀ and α_W is unchanged, 1 TeV → 10⁹ GeV (common practice: a change of basis of the U(1)s changes no physics; this checks our two-loop mixing terms)', () => {
    const x = [
      [40, 5],
      [5, 60],
    ]
    const xr = [
      [x[0]![0]! + 2 * x[0]![1]! + x[1]![1]!, x[0]![1]! + x[1]![1]!],
      [x[0]![1]! + x[1]![1]!, x[1]![1]!],
    ]
    const input = (m: number[][]) => ({
      alpha: { W: 1 / 30, X: 1 / m[0]![0]!, Y: 1 / m[1]![1]! },
      mixing: [{ groups: ['X', 'Y'] as [string, string], epsilon: m[0]![1]! / Math.sqrt(m[0]![0]! * m[1]![1]!) }],
    })
    const a = runGaugeCouplings({ content: original, loops: 2, muFromGeV: 1e3, muToGeV: 1e9, ...input(x) })
    const b = runGaugeCouplings({ content: rotated, loops: 2, muFromGeV: 1e3, muToGeV: 1e9, ...input(xr) })
    expect([a.stop, b.stop]).toEqual([undefined, undefined])
    const m = matrix(a.end.alphaInverse, a.end.epsilon, 1, 2)
    const mr = matrix(b.end.alphaInverse, b.end.epsilon, 1, 2)
    expectClose('X′_XX', 1e9, mr[0]![0]!, m[0]![0]! + 2 * m[0]![1]! + m[1]![1]!, 1e-9)
    expectClose('X′_XY', 1e9, mr[0]![1]!, m[0]![1]! + m[1]![1]!, 1e-9)
    expectClose('X′_YY', 1e9, mr[1]![1]!, m[1]![1]!, 1e-9)
    expectClose('α_W⁻¹', 1e9, b.end.alphaInverse[0]!, a.end.alphaInverse[0]!, 1e-9)
    // And the two-loop terms matter here: a one-loop run differs by far more than the tolerance.
    const one = runGaugeCouplings({ content: original, loops: 1, muFromGeV: 1e3, muToGeV: 1e9, ...input(x) })
    expect(Math.abs(one.end.alphaInverse[1]! - a.end.alphaInverse[1]!)).toBeGreaterThan(1e-3)
  })
})

describe('a dark U(1) beside QCD without shared fields', () => {
  it('runs exactly as each theory alone (no term links them)', () => {
    const both = gaugeContentOf(
      theory(
        'both',
        [su('colour', 3), u1('X')],
        [
          weyl('q', { reps: { colour: [1, 0] }, flavors: 4 }),
          weylR('qR', { reps: { colour: [1, 0] }, flavors: 4 }),
          complexScalar('S', { charges: { X: '2' } }),
          weyl('chi', { charges: { X: '1/3' } }),
          weylR('chiR', { charges: { X: '1/3' } }),
        ],
      ),
    )
    const r = runGaugeCouplings({ content: both, loops: 2, muFromGeV: 10, muToGeV: 1e6, alpha: { colour: 0.15, X: 0.02 } })
    const dark = runGaugeCouplings({ content: gaugeContentOf(darkU1('2', '1/3')), loops: 2, muFromGeV: 10, muToGeV: 1e6, alpha: { X: 0.02 } })
    expectClose('α_X⁻¹', 1e6, r.end.alphaInverse[1]!, dark.end.alphaInverse[0]!, 1e-11)
  })
})
