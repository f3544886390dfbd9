/**
 * The heavy-frame part of the count and basis commands: enumerate a heavy theory up to
 * --max-order N (a power of 1/m, 1 to 4) and report it order by order, class by class.
 */
import type { Theory } from '../shared/schemas/theory'
import { enumerateHeavyTheory } from '../server/engine/heavy/enumerate'
import { heavyReport } from '../server/engine/heavy/report'

export const HEAVY_MAX_ORDER = 4

/** The enumeration of a heavy theory to order maxOrder in 1/m, as the commands print it. */
export function heavyOutput(theory: Theory, maxOrder: number, withOperators: boolean): Record<string, unknown> {
  if (!theory.heavy) throw new Error('a heavy-frame theory needs its "heavy" block (particle, gaugeGroup, maxOrder)')
  if (!Number.isInteger(maxOrder) || maxOrder < 1 || maxOrder > HEAVY_MAX_ORDER) {
    throw new Error(`--max-order for a heavy-frame theory is a power of 1/m from 1 to ${HEAVY_MAX_ORDER}, got ${maxOrder}`)
  }
  const e = enumerateHeavyTheory({ ...theory, heavy: { ...theory.heavy, maxOrder } })
  return {
    theory: theory.name,
    frame: 'heavy',
    orderMeaning: "power of 1/m (m = the heavy particle's mass)",
    symmetries: e.symmetries,
    notes: [e.eomNote, e.antiparticleNote, e.fourFermionNote, e.heavyHeavyNote, e.heavyLightNote].filter(Boolean),
    byOrder: heavyReport(e, withOperators),
  }
}
