/**
 * The antiparticle's bilinears χ†…χ in the one convention used everywhere in the heavy frame
 * (Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125): χ is the lower two components of
 * the Dirac field, so it creates the antiparticle and carries the particle's own gauge
 * representation and charge (E, B are the same fields for ψ and χ).
 *
 * Charge conjugation C: ψ → iσ₂χ*, χ → −iσ₂ψ*, A → −Aᵀ (Peskin & Schroeder §3.6) maps
 * ψ†Xψ to −χ†X†χ with X† the conjugate in the real algebra of algebra.ts, so an operator whose
 * combination is Hermitian (anti-Hermitian) there has the χ copy with coefficient −1 (+1)
 * times ψ's. For P- and T-even operators this is (−1)^n at order 1/m^n — the Dirac mass enters
 * χ's expansion with the opposite sign. When P or T is not imposed the relation comes from
 * CPT instead and picks up the operator's P and T signs.
 */
import type { HeavyOperator } from './heavyOperator'
import { fieldTex } from './fieldTex'

/** The same printed bilinear between the antiparticle's fields: f^†\, … \, f → a^†\, … \, a. */
function renamedLatex(latex: string, field: string, anti: string): string {
  const f = fieldTex(field)
  const a = fieldTex(anti)
  const head = `${f}^\\dagger`
  const tail = `\\, ${f}`
  if (!latex.startsWith(head) || !latex.endsWith(tail)) return latex
  return `${a}^\\dagger${latex.slice(head.length, latex.length - tail.length)}\\, ${a}`
}

export const ANTIPARTICLE_CONVENTION =
  'Antiparticle field χ: the lower two components of the Dirac field (Bodwin, Braaten, Lepage convention): χ creates the ' +
  "antiparticle and carries the particle's own gauge representation and charge, so E and B are the same fields in ψ†…ψ " +
  "and χ†…χ. Its bilinears repeat ψ's with coefficients fixed by charge conjugation: c(χ-copy) = (−1)^n c(ψ-operator) at " +
  'order 1/m^n for P- and T-even operators (χ†(iD_t − D²/2m − σ·B/2m + …)χ), so they add no free coefficient.'

/**
 * The coefficient factor of χ's copy of a ψ-bilinear: −1 for a Hermitian combination, +1
 * for an anti-Hermitian one, times the P and T signs when those are not imposed (CPT).
 * @example antiparticleFactor({ antiHermitian: false }) // −1 (kinetic D², σ·B)
 */
export function antiparticleFactor(op: { antiHermitian?: boolean; parityOdd?: boolean; timeOdd?: boolean }): number {
  return (op.antiHermitian ? 1 : -1) * (op.parityOdd ? -1 : 1) * (op.timeOdd ? -1 : 1)
}

function renameTerms(t: Record<string, number>, field: string, anti: string): Record<string, number> {
  const out: Record<string, number> = {}
  for (const [k, v] of Object.entries(t)) out[k === field ? anti : k === `${field}*` ? `${anti}*` : k] = v
  return out
}

/** χ's copy of one ψ-bilinear: the same combination between χ† and χ, coefficient fixed. */
export function antiparticleCopy(op: HeavyOperator, field: string, anti: string): HeavyOperator {
  const factor = antiparticleFactor(op)
  return {
    ...op,
    id: `${op.id}.C`,
    latex: renamedLatex(op.latex, field, anti),
    terms: op.terms.map((t) => renameTerms(t, field, anti)),
    fixedBy: { id: op.id, factor },
    relations: [
      {
        coefficient: `c(${op.id}.C)`,
        relation: `c(${op.id}.C) = ${factor < 0 ? '−' : ''}c(${op.id})`,
        source: op.parityOdd || op.timeOdd ? 'CPT (common practice)' : 'charge conjugation, Bodwin–Braaten–Lepage convention for χ (common practice)',
      },
    ],
  }
}
