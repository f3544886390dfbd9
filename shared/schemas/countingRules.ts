import { z } from 'zod'
import './zodMessages'

/**
 * Counting rules of a theory (power counting): how the order of an operator is computed
 * from its building blocks. A theory file may hold several ("countingRules": [...]); the
 * board switches between them.
 *
 * - "massRatio": order = mass dimension − 4, suppression (E/M)^n. Weights optional
 *   (default: each block weighs its mass dimension; the rule subtracts 4, or the
 *   dimension of the leading Lagrangian in the heavy frame).
 * - "velocity": each building block has a velocity scaling v^w; order = total scaling
 *   relative to the leading Lagrangian (heavy frame default weights from Lepage et al.,
 *   Phys. Rev. D 46 (1992) 4052; Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125).
 * - "momentumRatio": λ = p/Λ with per-block weights (e.g. derivatives O(p), light masses O(p²)).
 * - "custom": weights per building block, all given explicitly.
 *
 * Weights are exact rationals written as strings "p/q" (or integers "3", "-1").
 */
export const RationalStringSchema = z.string().regex(/^-?(0|[1-9]\d{0,8})(\/[1-9]\d{0,8})?$/, {
  message: 'a weight must be an exact rational written "p/q" or an integer, e.g. "3/2"',
})

/** Building-block key: a field name, "D", "D_t", "E", "B", "sigma", "m", a conjugate "psi*". */
export const BlockNameSchema = z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,23}\*?$/, {
  message: 'a building-block name is a letter followed by letters, digits or "_" (optionally a trailing "*")',
})

export const CountingRuleKindSchema = z.enum(['massRatio', 'velocity', 'momentumRatio', 'custom'])

export const CountingRuleSchema = z
  .object({
    name: z.string().min(1).max(40),
    kind: CountingRuleKindSchema,
    weights: z.record(BlockNameSchema, RationalStringSchema).optional(),
    /** Order of the leading Lagrangian, subtracted from the summed weights ("p/q"). Defaults:
     *  massRatio 4; velocity (heavy frame) 5, the scaling of ψ†iD_tψ; otherwise 0. */
    offset: RationalStringSchema.optional(),
    parameter: z
      .object({
        symbol: z.string().min(1).max(16),
        description: z.string().max(200),
      })
      .optional(),
    description: z.string().max(400).optional(),
  })
  .superRefine((rule, ctx) => {
    if (rule.kind === 'custom' && (!rule.weights || Object.keys(rule.weights).length === 0)) {
      ctx.addIssue({
        code: 'custom',
        path: ['weights'],
        message: 'are required: a rule of kind "custom" needs a weight for each building block',
      })
    }
  })

export type CountingRule = z.infer<typeof CountingRuleSchema>
export type CountingRuleKind = z.infer<typeof CountingRuleKindSchema>
