/**
 * Class keys: the one written form of an operator class, shared by counting, bases, counting
 * rules, the board and the client. A key is "D^k" first (omitted for k = 0, "D" for k = 1),
 * then the species labels in theory-file order (each field followed by its conjugate
 * "NAME*", a field strength as its chiral halves "NAME_L", "NAME_R"), powers "^n" for n > 1,
 * single spaces: "D^2 H^2 H*^2", "G_L^3", "Q Q* u u*". Pure: safe to import in the app.
 */
import { EngineInputError } from '../errors'
import type { TheoryModel } from './model'

/** One building block of a key: a species label (or "D") and its power. */
export interface KeyBlock {
  label: string
  power: number
}

/** A key read into its derivative number and its species blocks, in written order. */
export interface ClassKeyParts {
  derivatives: number
  blocks: KeyBlock[]
}

const TOKEN = /^([A-Za-z][A-Za-z0-9_]*\*?)(?:\^([1-9]\d*))?$/

/**
 * Read a key without a theory: derivatives and species blocks (a label written twice adds up).
 * @example readClassKey('D^2 H^2 H*^2') // { derivatives: 2, blocks: [{ label: 'H', power: 2 }, { label: 'H*', power: 2 }] }
 * Throws EngineInputError for an empty key or a token that is not LABEL or LABEL^n (n >= 1).
 */
export function readClassKey(key: string): ClassKeyParts {
  if (key.trim() === '') throw new EngineInputError('readClassKey', 'The class is empty; name its fields, e.g. "D^2 H^2 H*^2"')
  let derivatives = 0
  const blocks: KeyBlock[] = []
  for (const token of key.trim().split(/\s+/)) {
    const m = TOKEN.exec(token)
    if (!m) throw new EngineInputError('readClassKey', `Cannot read "${token}" in the class "${key}"; write a class as fields with powers, e.g. "D^2 H^2 H*^2"`)
    const power = m[2] === undefined ? 1 : Number(m[2])
    if (m[1] === 'D') {
      derivatives += power
      continue
    }
    const seen = blocks.find((b) => b.label === m[1])
    if (seen) seen.power += power
    else blocks.push({ label: m[1]!, power })
  }
  return { derivatives, blocks }
}

/**
 * Write a key from its parts (blocks in the order given; powers of 0 are left out).
 * @example formatClassKey(2, [{ label: 'H', power: 2 }, { label: 'H*', power: 2 }]) // "D^2 H^2 H*^2"
 * Convention: common practice for class labels (as in Grzadkowski et al., JHEP 10 (2010) 085,
 * written with chiral halves of field strengths).
 */
export function formatClassKey(derivatives: number, blocks: readonly KeyBlock[]): string {
  const parts: string[] = []
  if (derivatives > 0) parts.push(derivatives === 1 ? 'D' : `D^${derivatives}`)
  for (const b of blocks) if (b.power > 0) parts.push(b.power === 1 ? b.label : `${b.label}^${b.power}`)
  return parts.join(' ')
}

/**
 * Key of a field content (multiplicity per species of the model) with k derivatives.
 * @example classKeyOfCounts(smeftModel, countsOfClassKey(smeftModel, 'H^2 H*^2').counts, 2) // "D^2 H^2 H*^2"
 */
export function classKeyOfCounts(model: TheoryModel, counts: readonly number[], derivatives: number): string {
  return formatClassKey(
    derivatives,
    model.species.map((s, i) => ({ label: s.label, power: counts[i] ?? 0 })),
  )
}

/**
 * Species multiplicities (model order) and derivative number of a key.
 * @example countsOfClassKey(smeftModel, "D^2 H^2 H*^2").derivatives // 2
 * Throws EngineInputError naming a label the theory does not have.
 */
export function countsOfClassKey(model: TheoryModel, key: string): { counts: number[]; derivatives: number } {
  const { derivatives, blocks } = readClassKey(key)
  const counts = model.species.map(() => 0)
  for (const b of blocks) {
    const i = model.species.findIndex((s) => s.label === b.label)
    if (i < 0) {
      const known = model.species.map((s) => s.label).join(', ')
      throw new EngineInputError('countsOfClassKey', `The class "${key}" names "${b.label}", which is not a field of this theory (its fields are ${known})`)
    }
    counts[i]! += b.power
  }
  return { counts, derivatives }
}

/**
 * A class key as LaTeX: names longer than one letter upright, "_L"/"_R" as subscripts,
 * conjugation and powers as superscripts; text it cannot read (a heavy-frame key) escaped.
 * @example classKeyTex('D^2 H^2 H*^2') // "D^{2}\\,H^{2}\\,H^{*2}"
 */
export function classKeyTex(key: string, fieldTex: Readonly<Record<string, string>> = {}): string {
  return key
    .split(' ')
    .map((part) => {
      const m = /^([A-Za-z][A-Za-z0-9_]*?)(_[LR])?(\*)?(?:\^(\d+))?$/.exec(part)
      if (!m) return part.replace(/([&%$#_{}])/g, '\\$1')
      const [, name, chiral, star, power] = m
      const sub = chiral ? `_{${chiral.slice(1)}}` : ''
      const sup = [star ? '*' : '', power ?? ''].join('')
      const whole = chiral ? fieldTex[name! + chiral] : undefined // a field named "chi_L", not a field strength's half
      const symbol = whole ?? fieldTex[name!] ?? (name!.length > 1 ? `\\mathrm{${name!.replace(/_/g, '\\_')}}` : name!)
      const atom = /^([A-Za-z]|\\mathrm\{[^{}]*\}|\{.*\})$/.test(symbol) ? symbol : `{${symbol}}`
      return `${atom}${whole ? '' : sub}${sup ? `^{${sup}}` : ''}`
    })
    .join('\\,')
}
