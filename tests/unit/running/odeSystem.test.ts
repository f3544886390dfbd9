import { describe, expect, it } from 'vitest'
import { integrateOdeSystem } from '../../../server/engine/running/odeSystem'
import { integrateOde } from '../../../server/engine/running/odeStepper'
import { qcdBeta } from '../../../server/engine/running/qcdBeta'
import { EngineCancelledError, EngineConsistencyError } from '../../../server/engine/errors'
import { expectClose } from '../scales/expectClose'

describe('integrateOdeSystem against exact solutions', () => {
  it('harmonic oscillator y1′ = y2, y2′ = −y1 over ten periods (common practice)', () => {
    const r = integrateOdeSystem(
      (y, o) => {
        o[0] = y[1]!
        o[1] = -y[0]!
      },
      Float64Array.of(0, 1),
      0,
      20 * Math.PI + 1,
    )
    expectClose('sin', 1, r.y[0]!, Math.sin(1), 1e-9)
    expectClose('cos', 1, r.y[1]!, Math.cos(1), 1e-9)
  })

  it('runs backwards as well: y′ = −y² from y(1) = 1/2 to t = −0.5 gives 1/(1 + t) = 2 (common practice)', () => {
    const r = integrateOdeSystem(
      (y, o) => {
        o[0] = -y[0]! * y[0]!
      },
      Float64Array.of(0.5),
      1,
      -0.5,
    )
    expectClose('1/(1+t)', -0.5, r.y[0]!, 2, 1e-12)
    expect(r.stopped).toBeUndefined()
  })

  it('agrees with the scalar stepper on the four-loop QCD flow (the stepper of runAlphaS; same method)', () => {
    const beta = qcdBeta(5)
    const flow = (alpha: number) => {
      const a = alpha / (4 * Math.PI)
      return -alpha * a * (beta[0]! + a * (beta[1]! + a * (beta[2]! + a * beta[3]!)))
    }
    const scalar = integrateOde(flow, 0.118, 2 * Math.log(91.188), 2 * Math.log(5))
    const vector = integrateOdeSystem(
      (y, o) => {
        o[0] = flow(y[0]!)
      },
      Float64Array.of(0.118),
      2 * Math.log(91.188),
      2 * Math.log(5),
    )
    expectClose('α_s(5 GeV)', 5, vector.y[0]!, scalar, 1e-12)
  })
})

describe('integrateOdeSystem margins, cancel and failures', () => {
  it('stops where a margin crosses zero: y′ = y², y(0) = 1 is 1/(1 − t), and y = 10 at t = 0.9 exactly (common practice)', () => {
    const r = integrateOdeSystem(
      (y, o) => {
        o[0] = y[0]! * y[0]!
        o[1] = 1
      },
      Float64Array.of(1, 0),
      0,
      2,
      { margins: (y) => [5, 10 - y[0]!] },
    )
    expect(r.stopped?.index).toBe(1)
    expectClose('t where y = 10', 0.9, r.stopped!.t, 0.9, 1e-9)
    expectClose('y there', 0.9, r.y[0]!, 10, 1e-6)
  })

  it('reports a margin that fails at the start at once', () => {
    const r = integrateOdeSystem(
      (_y, o) => {
        o[0] = 1
      },
      Float64Array.of(-1),
      0,
      1,
      { margins: (y) => [y[0]!] },
    )
    expect(r.stopped).toEqual({ index: 0, t: 0 })
  })

  it('every accepted step is reported, the last one at t1', () => {
    const ts: number[] = []
    integrateOdeSystem(
      (_y, o) => {
        o[0] = 1
      },
      Float64Array.of(0),
      0,
      1,
      { onStep: (t) => ts.push(t), maxStep: 0.25 },
    )
    expect(ts.length).toBe(4)
    expect(ts[3]).toBe(1)
  })

  it('a cancelled signal stops with EngineCancelledError; a solution that blows up without margins is a consistency error', () => {
    expect(() =>
      integrateOdeSystem(
        (_y, o) => {
          o[0] = 1
        },
        Float64Array.of(0),
        0,
        1,
        { signal: { aborted: true } },
      ),
    ).toThrow(EngineCancelledError)
    expect(() =>
      integrateOdeSystem(
        (y, o) => {
          o[0] = y[0]! * y[0]!
        },
        Float64Array.of(1),
        0,
        2,
      ),
    ).toThrow(EngineConsistencyError)
  })
})
