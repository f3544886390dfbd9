/**
 * The parsed form of an operator as printed: a sum of terms, each a rational coefficient
 * (with a power of the imaginary unit) times a product of items. Indices are kept by name;
 * what they mean (Lorentz vector, SU(N) fundamental or adjoint) is decided when lowering.
 */
import type { Rational } from '../exact/rational'

export interface Index {
  name: string
  /** Position in the typed text (0-based). */
  pos: number
}

export interface FieldItem {
  kind: 'field'
  /** Name of the theory field. */
  name: string
  pos: number
  /** Conjugated: a dagger on a boson, a bar (or dagger) on a fermion. */
  conj: boolean
  /** A tilde: the dual of a field strength, or H̃ = ε H* for a doublet. */
  tilde: boolean
  /** A fermion written transposed (ψ^T): it starts a Dirac chain as a row. */
  transpose: boolean
  indices: Index[]
  /** Derivatives acting on this field, by their Lorentz index. */
  derivs: Index[]
}

/** 'Dboth' and 'Box' mark a two-sided derivative and □ until parsing expands them. */
export type MatrixWhich = 'gamma' | 'sigma' | 'gamma5' | 'PL' | 'PR' | 'C' | 'gen' | 'Dboth' | 'Box'

export interface MatrixItem {
  kind: 'matrix'
  which: MatrixWhich
  /** For generators: T (= λ/2) or tau/lambda/pauli (twice a generator). */
  symbol?: 'T' | 'tau' | 'lambda'
  indices: Index[]
  pos: number
}

export interface TensorItem {
  kind: 'tensor'
  /** ε (Levi-Civita of an SU(N)), δ, structure constants f and d. */
  which: 'epsilon' | 'delta' | 'f' | 'd'
  indices: Index[]
  pos: number
}

export interface GroupItem {
  kind: 'group'
  items: Item[]
  /** ⟨…⟩ or tr(…): a trace over the implicit SU(N) indices. */
  trace: boolean
  /** (…)^† written on the bracket. */
  conj: boolean
  pos: number
}

export type Item = FieldItem | MatrixItem | TensorItem | GroupItem

export interface Term {
  coeff: Rational
  /** Power of the imaginary unit written in the term (i D_μ …). */
  iPower: number
  items: Item[]
  pos: number
}

export interface ParsedOperator {
  text: string
  terms: Term[]
}
