import { MATCHING_LIBRARY, coefficientText } from '../../engine/matching/library'
import { parseRational, toString as ratText, equals, neg, isZero } from '../../engine/exact/rational'
import type { Theory, TheoryField, TheoryGroup } from '../../../shared/schemas/theory'
import { isTrivialRep } from '../../engine/group/representation'

export interface AppliedMatching {
  id: string
  title: string
  source: string
  loops: number
  dimension: number
  group: string
  fields: [string, string]
  charge: string
  mass: string
  note: string
  forms: { name: string; note?: string; terms: { latex: string; text: string; coefficient: string }[] }[]
}

const charge = (f: TheoryField, g: TheoryGroup) => parseRational(String(f.charges?.[g.name] ?? '0'))
const isSuSinglet = (f: TheoryField, groups: TheoryGroup[]) => groups.every((g) => isTrivialRep(g.type, f.reps?.[g.name]))

/** Two removed Weyl fields that form one Dirac fermion: L and R with equal charges, or two of one chirality with opposite charges, under every U(1). */
function diracPartners(a: TheoryField, b: TheoryField, u1s: TheoryGroup[]): boolean {
  const weyl = ['left-weyl', 'right-weyl']
  if (!weyl.includes(a.lorentz) || !weyl.includes(b.lorentz)) return false
  if ((a.flavors ?? 1) !== (b.flavors ?? 1)) return false
  return u1s.every((g) => (a.lorentz !== b.lorentz ? equals(charge(a, g), charge(b, g)) : equals(charge(a, g), neg(charge(b, g)))))
}

/**
 * The worked matching results of MATCHING_LIBRARY that apply to one integrate-out step: every
 * pair of removed Weyl fields forming a Dirac fermion that is an SU(n) singlet and is charged
 * under a U(1) gauge group whose field strength stays in the light theory (the library's
 * "heavy charged Dirac fermion in QED" with the photon as the light field).
 */
export function applicableMatching(parent: Theory, removed: string[], scaleText: string): AppliedMatching[] {
  const fields = parent.fields.filter((f) => removed.includes(f.name) && isSuSinglet(f, parent.groups))
  const u1s = parent.groups.filter((g) => g.type === 'U1')
  const out: AppliedMatching[] = []
  const used = new Set<string>()
  for (const [i, a] of fields.entries()) {
    for (const b of fields.slice(i + 1)) {
      if (used.has(a.name) || used.has(b.name) || !diracPartners(a, b, u1s)) continue
      const gauge = u1s.find((g) => g.gauge && !isZero(charge(a, g)) && parent.fields.some((f) => f.lorentz === 'field-strength' && f.gaugeOf === g.name))
      if (!gauge) continue
      used.add(a.name).add(b.name)
      const q = ratText(charge(a, gauge))
      const flavors = a.flavors ?? 1
      for (const entry of MATCHING_LIBRARY) {
        out.push({
          id: entry.id,
          title: entry.title,
          source: entry.source,
          loops: entry.loops,
          dimension: entry.dimension,
          group: gauge.name,
          fields: [a.name, b.name],
          charge: q,
          mass: scaleText,
          note: `${a.name} and ${b.name} form a Dirac fermion of charge Q = ${q} under ${gauge.name}; m is its mass (the threshold ${scaleText})${flavors > 1 ? `; ${flavors} flavors add ${flavors} equal contributions` : ''}.`,
          forms: entry.forms.map((form) => ({ name: form.name, note: form.note, terms: form.terms.map((t) => ({ latex: t.latex, text: t.text, coefficient: coefficientText(t.coefficient) })) })),
        })
      }
    }
  }
  return out
}
