/**
 * Zod schema of a scale-ladder request: the physical scales of a theory, the expansion
 * parameters built from them, a precision target, and the orders to estimate.
 * Size limits live here so one request cannot ask for unbounded work.
 */
import { z } from 'zod'
import './zodMessages'
import { SCALE_UNITS } from '../physics/scaleUnits'

const NameSchema = z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,23}$/, {
  message: 'a name is a letter followed by up to 23 letters, digits or "_"',
})

/** A literal number: a JS number, or text "0.511", "4.18e3", "1/137" (text stays exact). */
const LiteralSchema = z.union([
  z.number().finite(),
  z.string().regex(/^\s*[+-]?\d+(\.\d*)?([eE][+-]?\d{1,4})?\s*$|^\s*[+-]?\d+\s*\/\s*\d+\s*$/, {
    message: 'a number must be written like 0.511, 4.18e3 or 1/137',
  }),
])

export const ScaleSchema = z.object({
  name: NameSchema,
  value: LiteralSchema,
  unit: z.enum(SCALE_UNITS, { message: `must be one of ${SCALE_UNITS.join(', ')}` }),
})

/** numerator / denominator: each a scale name or a literal number (both of the same kind). */
export const ExpansionParameterSchema = z.object({
  name: NameSchema,
  numerator: z.union([z.number().finite(), z.string().min(1).max(40)]),
  denominator: z.union([z.number().finite(), z.string().min(1).max(40)]),
})

/** A derived scale: from × factor × Π parameter^power (e.g. Rydberg = m_e × 1/2 × α²), shown in `unit`. */
export const DerivedScaleSchema = z.object({
  name: NameSchema,
  from: NameSchema,
  factor: LiteralSchema.optional(),
  powers: z.record(NameSchema, z.number().int().min(-40).max(40)),
  unit: z.enum(SCALE_UNITS, { message: `must be one of ${SCALE_UNITS.join(', ')}` }).optional(),
})

export const OrderSpecSchema = z.union(
  [
    z.number().int().min(0).max(40),
    z.object({
      order: z.union([z.number().int(), z.string().min(1).max(24)]),
      powers: z.record(NameSchema, z.number().int().min(-40).max(40)),
    }),
  ],
  { error: 'must be a whole number from 0 to 40, e.g. 2' },
)

export const ScaleLadderInputSchema = z.object({
  scales: z.array(ScaleSchema).max(30, { message: 'may list at most 30 scales' }),
  parameters: z.array(ExpansionParameterSchema).max(20, { message: 'may list at most 20 expansion parameters' }),
  derived: z.array(DerivedScaleSchema).max(30, { message: 'may list at most 30 derived scales' }).optional(),
  precisionTarget: z.number().positive().lt(1).optional(),
  countingParameter: NameSchema.optional(),
})

export type ScaleInput = z.infer<typeof ScaleSchema>
export type ExpansionParameterInput = z.infer<typeof ExpansionParameterSchema>
export type DerivedScaleInput = z.infer<typeof DerivedScaleSchema>
export type OrderSpec = z.infer<typeof OrderSpecSchema>
export type ScaleLadderInput = z.infer<typeof ScaleLadderInputSchema>
export const OrderListSchema = z.array(OrderSpecSchema).max(50, { message: 'may list at most 50 orders' })
