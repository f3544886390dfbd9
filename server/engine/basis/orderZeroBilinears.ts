/**
 * The two-field terms of the renormalizable Lagrangian (order 0), written out by hand because
 * a two-field class has no contact amplitude: kinetic terms of every field, the gauge kinetic
 * and θ terms, and the mass terms. A mass term exists exactly where the two fields' product
 * holds a singlet of every group (gauge and global): a representation with its conjugate, or a
 * field with itself in a real (scalar, or Majorana fermion) representation; a pseudo-real one
 * pairs only different flavours. Common practice (e.g. Srednicki, Quantum Field Theory, 2007,
 * ch. 35–36 for Weyl mass terms).
 */
import type { Theory, TheoryField, TheoryGroup } from '../../../shared/schemas/theory'
import type { TheoryModel } from '../theory/model'
import { classKeyOfCounts } from '../theory/classKey'
import { representationOf } from '../scales/massPartners'

export type OrderZeroRole = 'kinetic' | 'gauge kinetic' | 'theta' | 'mass' | 'cubic' | 'quartic' | 'Yukawa' | 'other'

export interface OrderZeroTerm {
  key: string
  conjugateKey: string
  dimension: number
  role: OrderZeroRole
  text: string
  latex: string
  hermitian: boolean
  /** Real parameters for one flavour of every field. */
  realParameters: number
  /** Real parameters with the declared flavours (null: not computed). */
  flavorParameters: number | null
  note?: string
}

// Fields as the engine's LaTeX writes them (latex.ts): the species' TeX, {X^{\dagger}} conjugated.
const tex = (model: TheoryModel, name: string) => model.species.find((s) => s.field === name)?.tex ?? name
const dagger = (model: TheoryModel, name: string) => `{${tex(model, name)}^{\\dagger}}`

function keyFor(model: TheoryModel, labels: string[], derivatives: number): string {
  const counts = model.species.map(() => 0)
  for (const l of labels) counts[model.species.findIndex((s) => s.label === l)]! += 1
  return classKeyOfCounts(model, counts, derivatives)
}
const conjLabel = (l: string) => (l.endsWith('*') ? l.slice(0, -1) : `${l}*`)

/** Kinetic terms: canonical, so they carry no free parameter (field rescaling). */
function kineticTerm(model: TheoryModel, f: TheoryField): OrderZeroTerm {
  const base = { dimension: 4, role: 'kinetic' as const, hermitian: true, realParameters: 0, flavorParameters: 0 }
  if (f.lorentz === 'scalar' && f.real) {
    const key = keyFor(model, [f.name, f.name], 2)
    return { ...base, key, conjugateKey: key, text: `kinetic ${f.name}`, latex: `\\tfrac12 (D_\\mu ${tex(model, f.name)})(D^\\mu ${tex(model, f.name)})` }
  }
  const key = keyFor(model, [f.name, `${f.name}*`], f.lorentz === 'scalar' ? 2 : 1)
  const latex =
    f.lorentz === 'scalar'
      ? `(D_\\mu ${tex(model, f.name)})^\\dagger (D^\\mu ${tex(model, f.name)})`
      : `i\\,${dagger(model, f.name)}\\,${f.lorentz === 'left-weyl' ? '\\bar\\sigma' : '\\sigma'}^\\mu D_\\mu ${tex(model, f.name)}`
  return { ...base, key, conjugateKey: key, text: `kinetic ${f.name}`, latex }
}

/** Gauge kinetic term (its coefficient is 1/g²) and θ term of a gauge field strength. */
function gaugeTerms(model: TheoryModel, f: TheoryField, group: TheoryGroup | undefined): OrderZeroTerm[] {
  const key = keyFor(model, [`${f.name}_L`, `${f.name}_L`], 0)
  const conjugateKey = keyFor(model, [`${f.name}_R`, `${f.name}_R`], 0)
  const a = group?.type === 'SU' ? '^a' : ''
  const base = { key, conjugateKey, dimension: 4, hermitian: true, realParameters: 1, flavorParameters: 1 }
  const abelian = group?.type !== 'SU'
  return [
    {
      ...base,
      role: 'gauge kinetic',
      text: `kinetic ${f.name}`,
      latex: `-\\tfrac{1}{4g^2} ${tex(model, f.name)}${a}_{\\mu\\nu} ${tex(model, f.name)}^{${a.slice(1)}\\mu\\nu}`,
      note: 'the coefficient 1/g² is the gauge coupling (fields normalised with g in the field strength)',
    },
    {
      ...base,
      role: 'theta',
      text: `theta ${f.name}`,
      latex: `\\tfrac{\\theta}{32\\pi^2} ${tex(model, f.name)}${a}_{\\mu\\nu} \\tilde{${tex(model, f.name)}}^{${a.slice(1)}\\mu\\nu}`,
      note: abelian
        ? 'a total derivative kept as a topological term; for an abelian group it has no effect in perturbation theory'
        : 'a total derivative kept as a topological term (instantons); it can be rotated into the fermion mass phases by an anomalous chiral rotation',
    },
  ]
}

/**
 * Kinetic mixing of two abelian field strengths, X_{μν} Y^{μν} and its θ-like partner X_{μν} Ỹ^{μν}:
 * gauge invariant at dimension 4; with the charges fixed by the theory file it is a parameter of its
 * own (Holdom, Phys. Lett. B 166 (1986) 196).
 */
function abelianMixing(model: TheoryModel, strengths: TheoryField[], groups: Map<string, TheoryGroup>): OrderZeroTerm[] {
  const abelian = strengths.filter((f) => groups.get(f.gaugeOf ?? '')?.type === 'U1')
  return abelian.flatMap((x, i) =>
    abelian.slice(i + 1).flatMap((y): OrderZeroTerm[] => {
      const key = keyFor(model, [`${x.name}_L`, `${y.name}_L`], 0)
      const base = { key, conjugateKey: keyFor(model, [`${x.name}_R`, `${y.name}_R`], 0), dimension: 4, hermitian: true, realParameters: 1, flavorParameters: 1 }
      return [
        {
          ...base,
          role: 'gauge kinetic',
          text: `mixing ${x.name} ${y.name}`,
          latex: `${tex(model, x.name)}_{\\mu\\nu} ${tex(model, y.name)}^{\\mu\\nu}`,
          note: 'kinetic mixing of two abelian gauge fields',
        },
        {
          ...base,
          role: 'theta',
          text: `theta mixing ${x.name} ${y.name}`,
          latex: `${tex(model, x.name)}_{\\mu\\nu} \\tilde{${tex(model, y.name)}}^{\\mu\\nu}`,
          note: 'a total derivative kept as a topological term; no effect in perturbation theory',
        },
      ]
    }),
  )
}

interface Form {
  field: TheoryField
  label: string
  key: string
  conjugateKey: string
  reality: string
  n: number
  fermion: boolean
}

/** Each matter field as it enters a mass term: scalars as written, fermions as left-handed Weyl fields. */
function massForm(f: TheoryField, groups: readonly TheoryGroup[]): Form {
  const right = f.lorentz === 'right-weyl'
  const rep = representationOf(f, groups, right)
  return { field: f, label: right ? `${f.name}*` : f.name, ...rep, n: f.flavors ?? 1, fermion: f.lorentz !== 'scalar' }
}

/** The mass term of two forms (a before b in theory order), or null when no singlet exists. */
function massTerm(model: TheoryModel, a: Form, b: Form, bConjugated: boolean): OrderZeroTerm | null {
  const same = a.field === b.field
  const labels = [a.label, bConjugated ? conjLabel(b.label) : b.label]
  const key = keyFor(model, labels, 0)
  const conjugateKey = keyFor(
    model,
    labels.map((l) => (model.species.find((s) => s.label === conjLabel(l)) ? conjLabel(l) : l)),
    0,
  )
  const hermitian = key === conjugateKey
  const dimension = a.fermion ? 3 : 2
  let realParameters = hermitian ? 1 : 2
  let flavorParameters = hermitian ? (same ? a.n * a.n : a.n * b.n) : 2 * a.n * b.n
  let note: string | undefined
  if (same && !bConjugated) {
    // φφ or ψψ of one field: symmetric in flavour where the invariant is symmetric (real type).
    const sym = a.reality === 'real'
    realParameters = sym ? (hermitian ? 1 : 2) : 0
    const pairs = sym ? (a.n * (a.n + 1)) / 2 : (a.n * (a.n - 1)) / 2
    flavorParameters = hermitian ? pairs : 2 * pairs
    if (!sym) note = 'pseudo-real: antisymmetric in flavour, so it vanishes for one flavour'
    if (!sym && a.n < 2) return null
  }
  const text = `mass ${labels.join(' ')}`
  const factor = (l: string) => (l.endsWith('*') ? dagger(model, l.slice(0, -1)) : tex(model, l))
  const latex = `${labels.map(factor).join(' ')}${hermitian ? '' : ' + \\text{h.c.}'}`
  return { key, conjugateKey, dimension, role: 'mass', text, latex, hermitian, realParameters, flavorParameters, ...(note ? { note } : {}) }
}

/** Every mass term allowed by the theory's symmetries (pairs in theory order). */
function massTerms(model: TheoryModel, theory: Theory): OrderZeroTerm[] {
  const forms = theory.fields.filter((f) => f.lorentz !== 'field-strength').map((f) => massForm(f, theory.groups))
  const out: OrderZeroTerm[] = []
  const seen = new Set<string>()
  const push = (t: OrderZeroTerm | null) => {
    if (!t || seen.has(t.key) || seen.has(t.conjugateKey)) return
    seen.add(t.key).add(t.conjugateKey)
    out.push(t)
  }
  forms.forEach((a, i) => {
    for (const b of forms.slice(i)) {
      if (a.fermion !== b.fermion) continue
      // ab: needs b in the conjugate representation of a; ab*: the same representation (scalars).
      if (b.key === a.conjugateKey) push(massTerm(model, a, b, false))
      if (!a.fermion && b.key === a.key && !(a.field === b.field && a.field.real)) push(massTerm(model, a, b, !b.field.real))
    }
  })
  return out
}

/** Kinetic, gauge kinetic, θ and mass terms of a relativistic theory. */
export function orderZeroBilinears(model: TheoryModel, theory: Theory): OrderZeroTerm[] {
  const groups = new Map(theory.groups.map((g) => [g.name, g]))
  return [
    ...theory.fields.filter((f) => f.lorentz !== 'field-strength').map((f) => kineticTerm(model, f)),
    ...theory.fields.filter((f) => f.lorentz === 'field-strength').flatMap((f) => gaugeTerms(model, f, groups.get(f.gaugeOf ?? ''))),
    ...abelianMixing(
      model,
      theory.fields.filter((f) => f.lorentz === 'field-strength'),
      groups,
    ),
    ...massTerms(model, theory),
  ]
}
