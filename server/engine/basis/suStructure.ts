// The data of an SU(N) invariant contraction and of a leg's wave-function, apart from the code
// that builds and evaluates them (gaugeStructures, suFastPath, tensorContraction), which all need them.
import type { TensorWave } from './tensorWaves'

/** A slot is one SU(N) index of one leg: box `box` of the leg's upper or lower Young shape (row by row). */
export interface Slot {
  leg: number
  upper: boolean
  box?: number
}

export interface SuStructure {
  group: string
  n: number
  /** δ contractions: [upper slot, lower slot] (indices into `slots`). */
  deltas: [number, number][]
  /** ε tensors, each contracting N slots of the same kind (upper slots for ε_{…}). */
  eps: number[][]
  slots: Slot[]
}

/** Random wave-function of one leg for one SU(N): vector (fund/anti), traceless matrix (adj) or tensor. */
export type SuWave = number[] | number[][] | TensorWave | null
