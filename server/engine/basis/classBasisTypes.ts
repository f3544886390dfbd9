// The result of one class's selection (ClassBasis) and its columns, apart from classBasis.ts so
// the helpers it calls (conjugation, parity columns) can name them without importing it.
import type { PrimeField } from '../finite/primeField'
import type { OperatorClass } from './classKey'
import type { Candidate } from './candidates'
import type { SamplePoint } from './evaluation'
import type { LegPermutation } from './symmetry'
import type { SuStructure } from './suStructure'
import type { LorentzStructure } from './lorentzStructures'
import type { ClassParity } from './parity'

/** One column of the selection: a candidate, or an operator the user asked to keep. */
export interface Column {
  text: string
  source: 'candidate' | 'kept' | 'hermitian'
  terms: { coeff: number[]; lorentz: LorentzStructure; gauge: SuStructure[] }[]
  candidate?: Candidate
  /** For 'hermitian' columns: +1 for O + h.c., −1 for O − h.c. */
  conjSign?: 1 | -1
  /** For 'hermitian' columns: the text of O. */
  hermitianBase?: string
  /** For 'hermitian' columns: the partner combination vanishes, so O itself is Hermitian (up to a phase). */
  selfHermitian?: boolean
  /** P-eigen columns (classes mapped to themselves by parity): +1 for c + P(c), −1 for c − P(c). */
  paritySign?: 1 | -1
  /** Text of c for a column c ± P(c). */
  parityBase?: string
  /** The chosen c ± P(c) equals 2c: c itself has definite parity. */
  selfParity?: boolean
  /** Parity eigenvalue known by construction (P(c ± P(c)) = ±(c ± P(c)), P² = 1). */
  parityEigen?: 1 | -1
}

export interface PrimeData {
  F: PrimeField
  points: SamplePoint[]
  /** Values of the chosen (pivot) columns at every point: rows × rank. */
  keptRows: number[][]
}

export interface ClassBasis {
  key: string
  class: OperatorClass
  conjugateKey: string
  selfConjugate: boolean
  dimension: number
  candidates: number
  rank: number
  /** Column texts of the kept operators, in selection order. */
  kept: Column[]
  gaugeStructures: SuStructure[][]
  perms: LegPermutation[]
  primes: PrimeData[]
  /**
   * A few redundant candidates (non-pivot columns) with their values at the sample points
   * (rows[primeIndex][point]); the board offers them as set-aside operators with rewrites.
   */
  alternatives: { column: Column; rows: number[][] }[]
  /** Parity of the class and of each kept operator (conventions in parity.ts). */
  parity: ClassParity
  note: string
}
