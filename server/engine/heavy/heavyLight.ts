/**
 * Heavy–light contact operators (ψ†Γψ)(light fields): for every field content allowed by the
 * gauge and global symmetries and every order up to the maximum, the independent Hermitian,
 * rotation-scalar operators (P- and T-even when imposed) modulo integration by parts, the heavy
 * field's EOM and the light fields' massless EOM, from the rank of their contact vertices.
 */
import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../errors'
import type { CancelFlag } from '../finite'
import { fieldTex } from './fieldTex'
import { colourInvariantCount, lightContents, type HeavyQuantumNumbers, type LightContent } from './lightContent'
import { lightFields, type TheoryFieldLike, type TheoryGroupLike } from './lightFields'
import { conjugationPermutation, daggerLight, lightKey, lightStructures, lightTimeSign, type LightCombo, type LightStructure } from './lightStructure'
import { identicalPermutations, lightComboValue, lightTables, randomLightPoint, type LightPoint, type LightTables } from './lightVertex'
import { contactRank } from './contactSpace'
import { lightComboLatex, lightTerms } from './lightDisplay'
import type { HeavyOperator } from './heavyOperator'

export interface HeavyLightClass {
  key: string
  order: number
  content: string
  count: number
  /** Real Wilson-coefficient parameters (2 per operator of a content that is not its own conjugate, unless T fixes the phase). */
  realParameters: number
  basis: HeavyOperator[]
}

export interface HeavyLightInput {
  particle: string
  heavy: HeavyQuantumNumbers
  fields: readonly TheoryFieldLike[]
  groups: readonly TheoryGroupLike[]
  maxOrder: number
  parity: boolean
  timeReversal: boolean
}

export const HEAVY_LIGHT_NOTE =
  'Heavy–light contact operators (ψ†Γψ)(light fields), enumerated by the rank of their contact vertex: heavy legs static ' +
  "(the heavy field's EOM), light legs massless and on shell (their own EOM), all momenta summing to zero (integration by " +
  'parts). Light fermions enter as Dirac fermions (a left- and a right-handed field with the same charges); scalars are ' +
  'taken P-even. Gauge fields are absent at this vertex, so operators differing by field strengths are identified (the ' +
  'heavy–light operators with E or B start two orders higher and are not listed). Light flavors are counted for one flavor.'

function gcd(a: number, b: number): number {
  let x = Math.abs(a)
  let y = Math.abs(b)
  while (y) [x, y] = [y, x % y]
  return x
}

function simplify(c: LightCombo): LightCombo {
  const m = new Map<string, { coef: number; s: LightStructure }>()
  for (const { coef, s } of c) {
    const k = lightKey(s)
    if (!k) continue
    const e = m.get(k.key)
    if (e) e.coef += coef * k.sign
    else m.set(k.key, { coef: coef * k.sign, s })
  }
  return [...m.values()].filter((t) => t.coef !== 0)
}

/** Hermitian (and T-even when imposed) candidates of a content: combos with the i they carry. */
function candidates(content: LightContent, structures: LightStructure[], timeReversal: boolean): Array<{ combo: LightCombo; imaginary: boolean }> {
  if (!content.selfConjugate) return structures.map((s) => ({ combo: [{ coef: 1, s }], imaginary: timeReversal && lightTimeSign(s) < 0 }))
  const perm = conjugationPermutation(content)
  const out: Array<{ combo: LightCombo; imaginary: boolean }> = []
  const seen = new Set<string>()
  for (const s of structures) {
    const d = daggerLight(s, perm, content)
    if (!d) throw new EngineConsistencyError('heavyLight', `no conjugate colour structure in content ${content.key}`)
    for (const imaginary of [false, true]) {
      if (timeReversal && imaginary !== lightTimeSign(s) < 0) continue
      const raw = simplify([
        { coef: 1, s },
        { coef: imaginary ? -d.coef : d.coef, s: d.s },
      ])
      if (raw.length === 0) continue
      const g = raw.reduce((acc, t) => gcd(acc, t.coef), 0) * Math.sign(raw[0]!.coef)
      const combo = raw.map((t) => ({ coef: t.coef / g, s: t.s }))
      const key = combo
        .map((t) => `${t.coef}:${lightKey(t.s)!.key}`)
        .sort()
        .join('+')
      if (seen.has(key)) continue
      seen.add(key)
      out.push({ combo, imaginary })
    }
  }
  return out
}

function model(content: LightContent, combos: LightCombo[], groupNs: number[], perms: number[][]) {
  return {
    size: combos.length,
    sample: (F: Parameters<typeof randomLightPoint>[0], rng: Parameters<typeof randomLightPoint>[1]) => {
      const pt = randomLightPoint(F, rng, content, groupNs)
      return { pt, tb: lightTables(F, pt, content) }
    },
    values: (F: Parameters<typeof randomLightPoint>[0], x: { pt: LightPoint; tb: LightTables }) => combos.map((c) => lightComboValue(F, c, x.pt, x.tb, content, perms)),
  }
}

function checkColour(content: LightContent, input: HeavyLightInput, groupNs: number[]): void {
  const expected = colourInvariantCount(content, input.groups, input.heavy)
  const base = {
    heavySpin: false,
    tau: content.legs.some((l) => l.field!.kind === 'dirac') ? 3 : null,
    diracSpin: false,
    time: new Array<number>(content.legs.length + 2).fill(0),
    slots: [],
    pairs: [],
  }
  const combos = content.colours.map((_, colour) => [{ coef: 1, s: { ...base, colour } }])
  const got = contactRank(model(content, combos, groupNs, [[0, 1, ...content.legs.map((_, i) => i + 2)]]), { label: 'heavy–light colour' }).basis.length
  if (got !== expected) {
    throw new EngineInputError(
      'heavyLight',
      `The light fields ${content.key} form ${expected} colour invariants with the heavy pair, but only ${got} can be built from δ and the ε of SU(2); heavy–light operators that need an ε of SU(N ≥ 3) are not supported`,
    )
  }
}

/**
 * Heavy–light classes up to input.maxOrder, plus the light fields left out.
 * @example enumerateHeavyLight(muonWithElectron).classes.map(c => [c.order, c.count]) // [[2, 2], …] with chiral symmetry
 */
export function enumerateHeavyLight(input: HeavyLightInput, signal?: CancelFlag): { classes: HeavyLightClass[]; unpaired: string[] } {
  const { fields, unpaired } = lightFields(input.fields, input.groups)
  const groupNs = input.groups.filter((g) => g.type === 'SU').map((g) => g.n ?? 2)
  const contents = lightContents(fields, input.groups, input.heavy, 2 * (input.maxOrder + 1))
  const done = new Set<string>()
  const classes: HeavyLightClass[] = []
  for (const content of contents) {
    if (done.has(content.key)) continue
    const conjKey = content.legs
      .map((l) => `${l.field!.name}${l.field!.kind !== 'realScalar' && !l.conj ? '*' : ''}`)
      .sort()
      .join(' ')
    done.add(conjKey)
    checkColour(content, input, groupNs)
    const perms = identicalPermutations(content)
    for (let order = Math.max(0, content.dim2 / 2 - 1); order <= input.maxOrder; order++) {
      if (signal?.aborted) throw new EngineCancelledError('heavy–light enumeration')
      const nd = order + 1 - content.dim2 / 2
      const cands = candidates(content, lightStructures(content, nd, input.parity), input.timeReversal)
      const { basis } = contactRank(
        model(
          content,
          cands.map((c) => c.combo),
          groupNs,
          perms,
        ),
        { signal, label: 'heavy–light operators' },
      )
      if (basis.length === 0) continue
      const key = `${input.particle}* ${input.particle} ${content.key} (1/m^${order})`
      const ops = basis.map((b, i): HeavyOperator => ({
        id: `hl${order}.${content.key.replace(/\s+/g, '.')}.${i + 1}`,
        order,
        sector: 'heavyLight',
        latex: lightComboLatex(cands[b]!.combo, cands[b]!.imaginary, content, fieldTex(input.particle), order),
        terms: lightTerms(cands[b]!.combo, content, input.particle),
        lightCombo: cands[b]!.combo,
        antiHermitian: cands[b]!.imaginary,
        relations: [],
      }))
      const perOp = content.selfConjugate || input.timeReversal ? 1 : 2
      classes.push({ key, order, content: content.key, count: ops.length, realParameters: perOp * ops.length, basis: ops })
    }
  }
  return { classes: classes.sort((a, b) => a.order - b.order), unpaired }
}
