/**
 * Adaptive fourth-order Runge–Kutta integration of one scalar ODE dy/dt = f(y) (autonomous),
 * with step-doubling error control. Used for renormalization-group running.
 */
import { EngineCancelledError, EngineConsistencyError } from '../errors'

export interface CancelSignal {
  readonly aborted: boolean
}

export interface OdeOptions {
  /** Absolute tolerance per step on y (default 1e-13). */
  tolerance?: number
  /** Largest step in t (default 0.05). */
  maxStep?: number
  signal?: CancelSignal
  /** Called after every accepted step with (t, y). */
  onStep?: (t: number, y: number) => void
  /** Throws OdeRangeError when y leaves (0, yMax) (default: no bound). */
  yMax?: number
}

/** The solution left (0, yMax) at t: the caller says what that means for its equation. */
export class OdeRangeError extends EngineConsistencyError {
  constructor(
    readonly t: number,
    readonly y: number,
  ) {
    super('integrateOde', `solution left its range (y = ${y} at t = ${t})`)
  }
}

function rk4Step(f: (y: number) => number, y: number, h: number): number {
  const k1 = f(y)
  const k2 = f(y + 0.5 * h * k1)
  const k3 = f(y + 0.5 * h * k2)
  const k4 = f(y + h * k3)
  return y + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4)
}

/**
 * y(t1) for dy/dt = f(y), y(t0) = y0, in either direction of t.
 * @example integrateOde(y => -y * y, 1, 0, 1) // 0.5 (exact solution 1/(1 + t))
 * Method: classical RK4; each step compared with two half steps, accepted when the
 * difference is below the tolerance, the half-step result improved by Richardson (1/15).
 * Reference: W. H. Press et al., Numerical Recipes, 3rd ed. (2007), §17.2 (step doubling).
 */
export function integrateOde(f: (y: number) => number, y0: number, t0: number, t1: number, opts: OdeOptions = {}): number {
  const tol = opts.tolerance ?? 1e-13
  const maxStep = opts.maxStep ?? 0.05
  const dir = t1 >= t0 ? 1 : -1
  let t = t0
  let y = y0
  let h = Math.min(maxStep, Math.abs(t1 - t0)) * dir
  for (let guard = 0; dir * (t1 - t) > 1e-15 * Math.max(1, Math.abs(t1)); guard++) {
    if (guard > 1_000_000) throw new EngineConsistencyError('integrateOde', `too many steps between t = ${t0} and ${t1}`)
    if (opts.signal?.aborted) throw new EngineCancelledError('running')
    if (dir * (t + h - t1) > 0) h = t1 - t
    const full = rk4Step(f, y, h)
    const half = rk4Step(f, rk4Step(f, y, h / 2), h / 2)
    const err = Math.abs(half - full)
    if (err > tol && Math.abs(h) > 1e-9) {
      h /= 2
      continue
    }
    y = half + (half - full) / 15
    t += h
    if (!Number.isFinite(y) || (opts.yMax !== undefined && (y <= 0 || y >= opts.yMax))) {
      throw new OdeRangeError(t, y)
    }
    opts.onStep?.(t, y)
    const grow = err < tol / 32 ? 2 : 1
    h = dir * Math.min(maxStep, Math.abs(h) * grow)
  }
  return y
}
