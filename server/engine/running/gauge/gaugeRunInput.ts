/**
 * Inputs of the running of a theory's gauge couplings — α of every running group and the
 * kinetic mixing of pairs of U(1)s at one scale — checked and turned into the start state, and
 * the readable form (α⁻¹ per group, ε per pair) of any state.
 */
import { EngineInputError } from '../../errors'
import type { CancelSignal } from '../odeStepper'
import type { GaugeContent } from './gaugeContent'
import { inverseSpd, type SlotLayout } from './gaugeFlow'
import type { GaugeCouplingValues } from '../../../../shared/types/gaugeRunning'

export type { GaugeCouplingValues }

export interface KineticMixingInput {
  groups: [string, string]
  epsilon: number
}

export interface GaugeRunInput {
  content: GaugeContent
  loops: 1 | 2
  /** The scale of the inputs and the scale wanted, GeV. */
  muFromGeV: number
  muToGeV: number
  /** α = g²/4π at muFrom, for every running gauge group by name. */
  alpha: Record<string, number>
  /** ε at muFrom per pair of U(1)s (L ⊃ −(ε/2) F_k F_l); absent pairs start unmixed. */
  mixing?: KineticMixingInput[]
  /** Scales (GeV) the running passes exactly, so that the points there are exact (table rows). */
  marks?: readonly number[]
  signal?: CancelSignal
  onProgress?: (fraction: number, label: string) => void
}

const fail = (message: string): never => {
  throw new EngineInputError('runGaugeCouplings', message)
}

/** Lowest and highest scale (GeV) the running accepts. */
export const MU_RANGE_GEV: readonly [number, number] = [1e-9, 1e30]

function checkScale(what: string, mu: number): void {
  if (!Number.isFinite(mu) || mu < MU_RANGE_GEV[0] || mu > MU_RANGE_GEV[1]) fail(`${what} must be a number of GeV between ${MU_RANGE_GEV[0]} and ${MU_RANGE_GEV[1]}, not ${mu}.`)
}

/** Check the input against the content and the state layout; returns the start state y. */
export function startState(input: GaugeRunInput, layout: SlotLayout): Float64Array {
  checkScale('The scale of the inputs', input.muFromGeV)
  checkScale('The scale wanted', input.muToGeV)
  if (input.loops !== 1 && input.loops !== 2) fail(`The running is at one or two loops, not ${input.loops}.`)
  const y = new Float64Array(layout.size)
  for (const name of Object.keys(input.alpha)) {
    if (!layout.groups.includes(name)) fail(`${name} is not a running gauge group of this theory (those are ${layout.groups.join(', ') || 'none'}).`)
  }
  layout.groups.forEach((name, i) => {
    const a = input.alpha[name]
    if (a === undefined) fail(`Give α_${name} at ${input.muFromGeV} GeV: every gauge coupling of the theory needs a starting value.`)
    if (!Number.isFinite(a) || a! <= 0 || a! >= 4 * Math.PI) fail(`α_${name} = ${a} is not a perturbative coupling: it must be positive and below 4π.`)
    y[i] = 1 / a!
  })
  for (const m of input.mixing ?? []) setMixing(m, input.alpha, layout, y)
  const n = layout.abelian.length
  const block = new Float64Array(n * n)
  for (let k = 0; k < n; k++) for (let l = 0; l < n; l++) block[k * n + l] = y[layout.pairSlot[k]![l]!]!
  if (n > 0 && !inverseSpd(block, n)) fail('The kinetic mixings given are too large together: the kinetic terms of the U(1)s must stay positive (for two U(1)s, |ε| < 1).')
  return y
}

function setMixing(m: KineticMixingInput, alpha: Record<string, number>, layout: SlotLayout, y: Float64Array): void {
  const [a, b] = m.groups
  const k = layout.abelian.indexOf(a)
  const l = layout.abelian.indexOf(b)
  if (k < 0 || l < 0) fail(`Kinetic mixing is between two U(1) gauge groups of the theory, and ${k < 0 ? a : b} is not one (the U(1)s are ${layout.abelian.join(', ') || 'none'}).`)
  if (k === l) fail(`Kinetic mixing needs two different U(1) groups, not ${a} with itself.`)
  if (!Number.isFinite(m.epsilon) || Math.abs(m.epsilon) >= 1) fail(`The kinetic mixing ε between ${a} and ${b} must lie strictly between −1 and 1, not ${m.epsilon}.`)
  y[layout.pairSlot[k]![l]!] = m.epsilon / Math.sqrt(alpha[a]! * alpha[b]!)
}

/** α⁻¹ per group and ε per pair at state y. @example readCouplings(layout, y).alphaInverse // [59.0, 29.6, 8.45] */
export function readCouplings(layout: SlotLayout, y: Float64Array): GaugeCouplingValues {
  const alphaInverse = layout.groups.map((_, i) => y[i]!)
  const epsilon: number[] = []
  const n = layout.abelian.length
  for (let k = 0; k < n; k++) {
    for (let l = k + 1; l < n; l++) {
      const kk = y[layout.pairSlot[k]![k]!]!
      const ll = y[layout.pairSlot[l]![l]!]!
      epsilon.push(y[layout.pairSlot[k]![l]!]! / Math.sqrt(kk * ll))
    }
  }
  return { alphaInverse, epsilon }
}
