import { z } from 'zod'
import './zodMessages'
import { SCALE_UNITS } from '../physics/scaleUnits'

/**
 * Couplings in the theory file: a symbol (and optionally a value) for each kept order-0
 * operator, and a mass symbol for a field (heavy fields: the one used when it is integrated
 * out). The symbols are what tree-level matching writes its coefficients in, so they must be
 * names nerdamer reads as plain variables.
 *
 * - couplings[]: { class, operator?, symbol, value? }. `class` is the order-0 class as the board
 *   prints it ("S H H*", either orientation); `operator` is the operator's text on the board, and
 *   may be left out when the class has one kept operator. The operator is checked against the
 *   basis by the engine (server/engine/basis/orderZeroCouplings.ts), not here.
 * - fields[].mass: { symbol, value? }.
 * - value: { number, unit? }: an exact rational ("1/3", "-2") or a decimal ("0.118", "1.5e3");
 *   the unit (eV … TeV) of a dimensionful coupling or of a mass; a mass value needs one.
 */
export const SYMBOL_PATTERN = /^[A-Za-z][A-Za-z0-9_]{0,15}$/
export const MAX_COUPLINGS = 200

/** Names nerdamer reads as constants or functions, so a symbol cannot be one of them (common practice: its built-ins). */
const RESERVED_SYMBOLS = new Set(['e', 'E', 'i', 'pi', 'PI', 'Infinity', 'sqrt', 'exp', 'log', 'ln', 'sin', 'cos', 'tan', 'abs', 'min', 'max', 'D'])

const SymbolSchema = z
  .string()
  .regex(SYMBOL_PATTERN, { message: 'a coupling or mass symbol is a letter followed by up to 15 letters, digits or "_" (e.g. "lambda", "mu_S", "M")' })
  .refine((s) => !RESERVED_SYMBOLS.has(s), { message: 'is a reserved name (a constant, function or the covariant derivative); choose another symbol' })

export const VALUE_PATTERN = /^\s*-?(\d{1,12}(\s*\/\s*\d{1,12})?|\d{0,12}\.?\d{1,12}([eE][-+]?\d{1,3})?)\s*$/

export const CouplingValueSchema = z
  .object({
    number: z.string().regex(VALUE_PATTERN, { message: 'a value is an exact rational ("1/3", "-2") or a decimal ("0.118", "1.5e3")' }),
    unit: z.enum(SCALE_UNITS.filter((u) => u.endsWith('eV')) as [string, ...string[]], { error: 'a unit is one of eV, keV, MeV, GeV, TeV' }).optional(),
  })
  .strict()

export const CouplingSchema = z
  .object({
    class: z.string().min(1).max(200),
    operator: z.string().min(1).max(400).optional(),
    symbol: SymbolSchema,
    value: CouplingValueSchema.optional(),
    description: z.string().max(200).optional(),
  })
  .strict()

export const MassSchema = z
  .object({
    symbol: SymbolSchema,
    value: CouplingValueSchema.optional(),
  })
  .strict()

export type Coupling = z.infer<typeof CouplingSchema>
export type CouplingValue = z.infer<typeof CouplingValueSchema>
export type FieldMass = z.infer<typeof MassSchema>

type Report = (path: (string | number)[], message: string) => void

/**
 * Symbols are distinct from each other and from the theory's field and group names (a
 * coefficient "y*H" would be ambiguous); one coupling per operator; a mass value has a unit.
 */
export function checkCouplingSymbols(t: { couplings?: Coupling[]; fields: { name: string; mass?: FieldMass }[]; groups: { name: string }[] }, report: Report): void {
  const roster = new Set([...t.fields.map((f) => f.name), ...t.groups.map((g) => g.name)])
  const seen = new Map<string, string>()
  const claim = (symbol: string, owner: string, path: (string | number)[]) => {
    if (roster.has(symbol)) report(path, `"${symbol}" is already the name of a field or symmetry; give the coupling its own symbol`)
    const before = seen.get(symbol)
    if (before !== undefined) report(path, `"${symbol}" is already the symbol of ${before}; give each coupling and mass its own symbol`)
    else seen.set(symbol, owner)
  }
  t.fields.forEach((f, i) => {
    if (!f.mass) return
    claim(f.mass.symbol, `the mass of ${f.name}`, ['fields', i, 'mass', 'symbol'])
    if (f.mass.value && f.mass.value.unit === undefined) report(['fields', i, 'mass', 'value', 'unit'], `a mass needs a unit; write e.g. { "number": "${f.mass.value.number.trim()}", "unit": "TeV" }`)
  })
  const operators = new Set<string>()
  t.couplings?.forEach((c, i) => {
    claim(c.symbol, `the coupling of "${c.class}"`, ['couplings', i, 'symbol'])
    const key = `${normalizeSpaces(c.class)}|${normalizeSpaces(c.operator ?? '')}`
    if (operators.has(key)) report(['couplings', i, 'class'], `this operator already has a coupling; give each operator one symbol`)
    operators.add(key)
  })
}

export function normalizeSpaces(s: string): string {
  return s.trim().replace(/\s+/g, ' ')
}
