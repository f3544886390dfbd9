/** What a stored basis assumes, in one sentence for the page (auto-imported). */
export function assumption(basis: { countingRule?: string; note?: string }): string {
  if (basis.countingRule === '1/m') return `Heavy-particle frame, orders in 1/m. ${basis.note ?? ''}`
  return `Independent operators ${basis.note || 'modulo equations of motion and integration by parts; terms proportional to the equations of motion move into other classes'}.`
}
