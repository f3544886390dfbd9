import { z } from 'zod'
import './zodMessages'
import { DerivedScaleSchema, ExpansionParameterSchema, OrderListSchema, ScaleLadderInputSchema, ScaleSchema } from './scaleLadder'
import { SCALE_UNITS } from '../physics/scaleUnits'
import { ladderOverBudget, overBudgetMessage } from './ladderBudget'

// Requests of the scale ladder, the tower (integrate out) and the running-coupling routes.
// Every object is strict, so a misspelt key is a 400 naming it instead of being ignored.

/** A stored scale ladder: the engine's ladder input (strict) plus the orders to estimate. */
export const LadderDocumentSchema = ScaleLadderInputSchema.extend({
  scales: z.array(ScaleSchema.strict()).max(30, { message: 'may list at most 30 scales' }),
  parameters: z.array(ExpansionParameterSchema.strict()).max(20, { message: 'may list at most 20 expansion parameters' }),
  derived: z.array(DerivedScaleSchema.strict()).max(30, { message: 'may list at most 30 derived scales' }).optional(),
  orders: OrderListSchema.min(1, { message: 'must list at least one order to estimate' }),
})
  .strict()
  .superRefine((doc, ctx) => {
    // The size budget: exact numbers too long to compute quickly are refused before any work.
    for (const o of ladderOverBudget(doc).slice(0, 3)) ctx.addIssue({ code: 'custom', path: o.path, message: overBudgetMessage(o) })
  })
export type LadderDocument = z.infer<typeof LadderDocumentSchema>

export const LadderSaveSchema = z
  .object({
    ladder: LadderDocumentSchema,
    version: z.number({ error: 'is required: the ladder version you edited (0 for a new ladder)' }).int({ error: 'must be a whole number' }).min(0, { error: 'must be 0 or more' }),
  })
  .strict()

export const SetAsideBelowSchema = z
  .object({
    target: z.number({ error: 'is required: a number between 0 and 1' }).positive({ error: 'must be positive' }).lt(1, { error: 'must be below 1' }),
  })
  .strict()

const FieldNameSchema = z.string({ error: 'must be text' }).regex(/^[A-Za-z][A-Za-z0-9_]{0,15}$/, { error: 'a field name is a letter followed by up to 15 letters, digits or "_"' })

export const IntegrateOutSchema = z
  .object({
    fields: z
      .array(FieldNameSchema, { error: 'is required: the heavy fields to integrate out' })
      .min(1, { error: 'must list at least one heavy field' })
      .max(40, { error: 'may list at most 40 fields' }),
    scale: z
      .object(
        {
          name: z
            .string({ error: 'must be text' })
            .regex(/^[A-Za-z][A-Za-z0-9_]{0,23}$/, { error: 'a scale name is a letter followed by up to 23 letters, digits or "_"' })
            .optional(),
          value: z.number({ error: 'must be a number' }).positive({ error: 'must be positive' }).max(1e30, { error: 'must be at most 1e30' }),
          unit: z.enum(SCALE_UNITS, { error: `must be one of ${SCALE_UNITS.join(', ')}` }),
        },
        { error: 'is required: a value and a unit' },
      )
      .strict(),
  })
  .strict()

/** Scales of the running routes, in GeV: 0.5 GeV … 100 TeV (α_s); QED from 0.1 MeV. */
const gev = (_name: string, min: number, max: number) =>
  z
    .number({ error: 'must be a number of GeV' })
    .min(min, { error: `must be at least ${min} GeV` })
    .max(max, { error: `must be at most ${max} GeV` })

export const QcdThresholdSchema = z
  .object({
    name: z.string({ error: 'must be text' }).regex(/^[A-Za-z][A-Za-z0-9_]{0,7}$/, { error: 'a quark name is a letter and up to 7 letters or digits' }),
    mass: gev('mass', 0.5, 10_000),
    kind: z.enum(['msbar', 'pole'], { error: 'must be "msbar" or "pole"' }),
  })
  .strict()

const LOOPS = 'must be 1, 2, 3 or 4'
const LIGHT = 'must be a whole number from 0 to 6'

export const RunningQcdSchema = z
  .object({
    alphaS: z.number({ error: 'is required: α_s at the starting scale' }).gt(0, { error: 'must be positive' }).max(1.5, { error: 'must be at most 1.5' }),
    muFrom: gev('muFrom', 0.5, 100_000),
    muTo: gev('muTo', 0.5, 100_000),
    loops: z.number({ error: LOOPS }).int({ error: LOOPS }).min(1, { error: LOOPS }).max(4, { error: LOOPS }),
    thresholds: z.array(QcdThresholdSchema, { error: 'must be a list of heavy quarks, each with a name, a mass and a mass kind' }).max(6, { error: 'may list at most 6 quarks' }),
    lightFlavours: z.number({ error: LIGHT }).int({ error: LIGHT }).min(0, { error: LIGHT }).max(6, { error: LIGHT }).optional(),
    decouplingLoops: z.union([z.literal(1), z.literal(2)], { error: 'must be 1 or 2' }).optional(),
    plotFrom: gev('plotFrom', 0.5, 100_000).optional(),
    plotTo: gev('plotTo', 0.5, 100_000).optional(),
  })
  .strict()
export type RunningQcdRequest = z.infer<typeof RunningQcdSchema>

export const RunningQedSchema = z
  .object({
    muTo: gev('muTo', 1e-4, 10_000),
    alphaInverse0: z.number({ error: 'must be a number' }).min(100, { error: 'must be at least 100' }).max(200, { error: 'must be at most 200' }).optional(),
    quarks: z.boolean({ error: 'must be true (quark thresholds included, indicative only) or false (leptons only)' }).optional(),
    deltaAlphaHad5: z.number({ error: 'must be a number' }).min(0, { error: 'must be in [0, 0.1]' }).max(0.1, { error: 'must be in [0, 0.1]' }).optional(),
  })
  .strict()
export type RunningQedRequest = z.infer<typeof RunningQedSchema>
