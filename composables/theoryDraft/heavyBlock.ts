// The heavy-particle block of a theory file ("frame": "heavy") as editor text, and back.
// (Outside composables/' top level, so Nuxt does not auto-import it.)
import type { DraftGroup, DraftIssue } from './draftTypes'
import { type DraftLabels, asText, emptyLabels, isRecord, labelsToDraft, labelsToTheory } from './labels'

export interface DraftHeavy extends DraftLabels {
  particle: string
  /** Name of the antiparticle's Pauli field; empty when the theory has none. */
  antiparticle: string
  /** uid of a group of the draft, or "?NAME" for a group the file names but does not declare. */
  gaugeGroup: string
  /** Highest power of 1/m in the bilinear sector, typed (1 to 4). */
  maxOrder: string
  /** Impose parity and time reversal on the operators (the file omits them when true). */
  parity: boolean
  timeReversal: boolean
  description?: string
}

/** A fresh heavy block: "psi" coupled to the first gauge group, to second order in 1/m. */
export function newHeavy(groups: DraftGroup[]): DraftHeavy {
  const gauge = groups.find((g) => g.gauge && g.type !== 'Z')
  return { particle: 'psi', antiparticle: '', gaugeGroup: gauge?.uid ?? '', maxOrder: '2', parity: true, timeReversal: true, ...emptyLabels() }
}

export function heavyToDraft(input: unknown, byName: Map<string, string>): DraftHeavy {
  const h = isRecord(input) ? input : {}
  const particle = isRecord(h.particle) ? h.particle : {}
  return {
    particle: asText(particle.name),
    antiparticle: isRecord(h.antiparticle) ? asText(h.antiparticle.name) : '',
    gaugeGroup: h.gaugeGroup === undefined ? '' : (byName.get(asText(h.gaugeGroup)) ?? `?${asText(h.gaugeGroup)}`),
    maxOrder: asText(h.maxOrder),
    parity: h.imposeParity !== false,
    timeReversal: h.imposeTimeReversal !== false,
    ...labelsToDraft(particle.reps, particle.charges, byName),
    ...(particle.description !== undefined ? { description: asText(particle.description) } : {}),
  }
}

export function heavyToTheory(h: DraftHeavy, groups: DraftGroup[], issues: DraftIssue[]): Record<string, unknown> {
  const particle: Record<string, unknown> = { name: h.particle.trim() }
  labelsToTheory(h, groups, particle, ['heavy', 'particle'], issues)
  if (h.description !== undefined) particle.description = h.description
  const out: Record<string, unknown> = { particle }
  if (h.antiparticle.trim()) out.antiparticle = { name: h.antiparticle.trim() }
  const gauge = h.gaugeGroup.startsWith('?') ? h.gaugeGroup.slice(1) : groups.find((g) => g.uid === h.gaugeGroup)?.name
  if (gauge === undefined) issues.push({ path: ['heavy', 'gaugeGroup'], message: 'choose the gauge group the heavy particle couples to' })
  else out.gaugeGroup = gauge
  const order = h.maxOrder.trim()
  if (/^\d{1,2}$/.test(order)) out.maxOrder = Number(order)
  else issues.push({ path: ['heavy', 'maxOrder'], message: order ? `the highest power of 1/m is a whole number from 1 to 4, but got "${order}"` : 'choose the highest power of 1/m (1 to 4)' })
  if (h.parity === false) out.imposeParity = false
  if (h.timeReversal === false) out.imposeTimeReversal = false
  return out
}
