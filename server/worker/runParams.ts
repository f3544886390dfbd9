// The parameters a run was queued with (runs.params), as the writers of its result read them.
import type { Priorities } from '../engine/basis/classBasis'

export interface RunParams {
  maxDim?: number
  maxOrder?: number
  nf?: number
  theory: unknown
  theoryVersion: number
  priorities?: Priorities
}
