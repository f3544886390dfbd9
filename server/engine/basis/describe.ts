/**
 * Structured description of kept operators: fields, derivatives, spinor and gauge
 * contractions, the input-syntax text and two-component LaTeX.
 */
import type { ClassBasis, Column } from './classBasis'
import { operatorLatex } from './latex'
import { hermiticityOf } from './hermiticity'
import { parseOperatorText } from './inputSyntax'
import { fourComponentLatex } from './fourComponent'

export interface BasisOperator {
  /** Input-syntax text (see inputSyntax.ts), e.g. "<12>^2[34]^2". */
  text: string
  latex: string
  /** Four-component form with Dirac bilinears (proportional, real factor), or null. */
  latex4: string | null
  source: 'candidate' | 'kept' | 'hermitian'
  fields: string[]
  /** Derivatives per leg (legs in class-key order). */
  derivatives: number[]
  angle: [number, number][]
  square: [number, number][]
  /** δ and ε contractions per SU(N) group, as slot lists. */
  gauge: { group: string; deltas: [number, number][]; eps: number[][] }[]
  /** Hermitian up to a phase (self-conjugate classes); false when the conjugate lies in the conjugate class. */
  hermitian: boolean
  /** Real parameters carried by this operator for one flavor (1 Hermitian, 2 otherwise). */
  realParameters: number
  /** Flavor components (filled by the flavor decomposition; 1 for one flavor). */
  flavorComponents: number
  /**
   * CP (convention of counting/cpCount.ts: CP maps each field to its conjugate with parity on
   * its indices; every Hermitian operator without ε^{μνρσ} is CP-even): "even"/"odd" for a
   * Hermitian combination of a self-conjugate class, "both" for an operator whose conjugate
   * lies in the conjugate class (its complex coefficient is one CP-even and one CP-odd real
   * parameter), null where not a CP eigenvector (operators kept as typed by the user).
   * In amplitudes: CP(O) = (−1)^{F/2} × the structural conjugate with ⟨ij⟩* = [ji], F the number
   * of fermion legs (Hermitian conjugation reverses the order of the F Grassmann fields).
   */
  cp: 'even' | 'odd' | 'both' | null
  /**
   * Parity eigenvalue where the class is mapped to itself by P and the operator is a P
   * eigenvector (conventions in parity.ts: ⟨ij⟩ ↔ [π(i)π(j)], legs to parity partners,
   * η = 1 for a Dirac pair, P² = 1 on every field); null where P is undefined (chiral fermions),
   * maps the class to another class (operators paired across classes, counted per class
   * as pEven/pOdd), or for set-aside alternatives.
   */
  parity: 'even' | 'odd' | null
  /** Values of the symmetrised amplitude at the class's sample points, per prime (board math). */
  fingerprint?: { primes: number[]; values: number[][] }
}

function fourOf(b: ClassBasis, col: Column, hc: string): string | null {
  if (col.source === 'kept') return null
  const t = col.terms[0]!
  const f = fourComponentLatex(b.class.legs, t.lorentz, t.gauge)
  return f === null ? null : f + hc
}

/** LaTeX of a user-kept operator: Σ (rational) · term, terms as in operatorLatex. */
function keptLatex(b: ClassBasis, text: string): string {
  const terms = parseOperatorText(b.class, text, b.gaugeStructures.length)
  return terms
    .map((t, i) => {
      const neg = t.coeff.num < 0n
      const mag = neg ? -t.coeff.num : t.coeff.num
      const c = t.coeff.den === 1n ? (mag === 1n ? '' : `${mag}\\,`) : `\\tfrac{${mag}}{${t.coeff.den}}\\,`
      const sign = neg ? '-' : i === 0 ? '' : '+'
      return `${sign}${c}${operatorLatex(b.class.legs, t.lorentz, b.gaugeStructures[t.gaugeIndex]!)}`
    })
    .join(' ')
}

/**
 * Describe every kept operator of a class basis.
 * @example describeOperators(classBasis(phi, "phi^6"))[0].latex // "phi\\,phi\\,…"
 */
export function describeOperators(b: ClassBasis): BasisOperator[] {
  const herm = hermiticityOf(b)
  return b.kept.map((col: Column, i) => ({ ...describeColumn(b, col, herm[i]!), parity: b.parity.operators[i] ?? null }))
}

/**
 * Describe a redundant candidate offered as an alternative (set aside on the board): an
 * O ± h.c. column of a self-conjugate class is Hermitian up to a phase, any other is not.
 */
export function describeAlternative(b: ClassBasis, col: Column): BasisOperator {
  return describeColumn(b, col, b.selfConjugate && col.source === 'hermitian')
}

/** CP label of a column (see BasisOperator.cp). */
function cpOf(b: ClassBasis, col: Column): BasisOperator['cp'] {
  if (!b.selfConjugate) return 'both'
  if (col.source !== 'hermitian' || col.conjSign === undefined) return null
  const t = col.terms[0]!
  const brackets = (t.lorentz.angle.length + t.lorentz.square.length) % 2 === 0 ? 1 : -1
  const fermions = b.class.legs.filter((p) => p.fermion).length
  const reorder = (fermions / 2) % 2 === 0 ? 1 : -1
  return col.conjSign * brackets * reorder > 0 ? 'even' : 'odd'
}

function describeColumn(b: ClassBasis, col: Column, hermitian: boolean): BasisOperator {
  const t = col.terms[0]!
  const herm1 = col.source === 'hermitian'
  const single = col.terms.length === 1 || herm1
  const base = col.source === 'kept' ? keptLatex(b, col.text) : operatorLatex(b.class.legs, t.lorentz, t.gauge)
  const hc = herm1 && !col.selfHermitian ? (col.conjSign === 1 ? ' + \\text{h.c.}' : ' - \\text{h.c.}') : ''
  const pSign = col.paritySign === undefined ? '' : col.paritySign === 1 ? ' + \\mathcal{P}' : ' - \\mathcal{P}'
  return {
    text: col.text,
    latex: pSign ? `\\big(${base + hc}\\big)${pSign}` : base + hc,
    latex4: pSign ? null : fourOf(b, col, hc),
    cp: cpOf(b, col),
    parity: null,
    source: col.source,
    fields: b.class.legs.map((p) => p.label),
    derivatives: single ? t.lorentz.derivs : [],
    angle: single ? t.lorentz.angle : [],
    square: single ? t.lorentz.square : [],
    gauge: single ? t.gauge.map((s) => ({ group: s.group, deltas: s.deltas, eps: s.eps })) : [],
    hermitian,
    realParameters: hermitian ? 1 : 2,
    flavorComponents: 1,
  }
}
