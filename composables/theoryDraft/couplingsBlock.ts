// The couplings of a theory file (symbols and values of order-0 operators) and a field's mass
// symbol, as the editor's form keeps them: every input as the text typed. See
// shared/schemas/couplings.ts for the file's format; the schema and the engine check the rest.
import { asText as text, isRecord } from './labels'

export interface DraftValue {
  number: string
  unit: string
}
export interface DraftMass extends DraftValue {
  symbol: string
}
export interface DraftCoupling extends DraftValue {
  uid: string
  /** The order-0 class as the board prints it ("S H H*") and, optionally, the operator's text. */
  class: string
  operator: string
  symbol: string
  description?: string
}

function valueToDraft(v: unknown): DraftValue {
  const r = isRecord(v) ? v : {}
  return { number: text(r.number), unit: text(r.unit) }
}

/** { number, unit? } when a number was typed; a unit alone is kept so that the schema names it. */
function valueToTheory(d: DraftValue): Record<string, unknown> | undefined {
  const number = d.number.trim()
  const unit = d.unit.trim()
  if (!number && !unit) return undefined
  return { number, ...(unit ? { unit } : {}) }
}

export function massToDraft(m: unknown): DraftMass | undefined {
  if (!isRecord(m)) return undefined
  return { symbol: text(m.symbol), ...valueToDraft(m.value) }
}

/** A mass with no symbol typed is left out (the form's empty row). */
export function massToTheory(m: DraftMass): Record<string, unknown> | undefined {
  if (!m.symbol.trim() && !m.number.trim() && !m.unit.trim()) return undefined
  const value = valueToTheory(m)
  return { symbol: m.symbol.trim(), ...(value ? { value } : {}) }
}

export function couplingToDraft(c: unknown, uid: string): DraftCoupling {
  const r = isRecord(c) ? c : {}
  return {
    uid,
    class: text(r.class),
    operator: text(r.operator),
    symbol: text(r.symbol),
    ...valueToDraft(r.value),
    ...(r.description !== undefined ? { description: text(r.description) } : {}),
  }
}

export function couplingToTheory(c: DraftCoupling): Record<string, unknown> {
  const value = valueToTheory(c)
  return {
    class: c.class.trim(),
    ...(c.operator.trim() ? { operator: c.operator.trim() } : {}),
    symbol: c.symbol.trim(),
    ...(value ? { value } : {}),
    ...(c.description !== undefined ? { description: c.description } : {}),
  }
}
