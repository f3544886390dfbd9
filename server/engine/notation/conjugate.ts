/**
 * Hermitian conjugation of a printed product: the order reverses, every field is conjugated
 * (a dagger on a boson, a bar on a fermion), (ψ̄ Γ χ)† = χ̄ γ⁰Γ†γ⁰ ψ with γ⁰γ^μ†γ⁰ = γ^μ,
 * γ⁰σ^{μν}†γ⁰ = σ^{μν}, γ⁰γ_5†γ⁰ = −γ_5, γ⁰P_L†γ⁰ = P_R; generators, ε, δ, f and d are real.
 * A product with C (ψ^T C χ = ψ^α χ_α) conjugates to the same product of the conjugate fields,
 * both read as columns (χ̄_α̇ ψ̄^α̇), C kept: its sign convention is not tracked (an overall sign).
 * Reference: common practice (Peskin & Schroeder, An Introduction to QFT, 1995, §3.4).
 */
import { EngineInputError } from '../errors'
import type { Item } from './ast'

/**
 * The conjugate items and the sign they pick up (−1 per γ_5).
 * @example conjugateItems([H†, H]).items // [H†, H] (reversed, each conjugated)
 */
export function conjugateItems(items: Item[]): { items: Item[]; sign: 1 | -1 } {
  if (items.some((it) => it.kind === 'matrix' && it.which === 'C')) return { items: conjugateMajorana(items), sign: 1 }
  let sign: 1 | -1 = 1
  const out = items
    .slice()
    .reverse()
    .map((it): Item => {
      if (it.kind === 'field') {
        if (it.transpose) throw new EngineInputError('readOperator', `At position ${it.pos + 1}: the conjugate of a transposed field (ψ^T C χ) is not read; write the conjugate term out`)
        return { ...it, conj: !it.conj }
      }
      if (it.kind === 'group') {
        const inner = conjugateItems(it.items)
        if (inner.sign === -1) sign = sign === 1 ? -1 : 1
        return { ...it, items: inner.items }
      }
      if (it.kind === 'matrix') {
        if (it.which === 'gamma5') sign = sign === 1 ? -1 : 1
        if (it.which === 'PL' || it.which === 'PR') return { ...it, which: it.which === 'PL' ? 'PR' : 'PL' }
      }
      return { ...it }
    })
  return { items: out, sign }
}

function conjugateMajorana(items: Item[]): Item[] {
  return items.map((it): Item => {
    if (it.kind === 'field') return { ...it, conj: !it.conj, transpose: true }
    if (it.kind === 'group') return { ...it, items: conjugateMajorana(it.items) }
    return { ...it }
  })
}
