import { z } from 'zod'
import './zodMessages'

/**
 * Heavy-particle (non-relativistic) frame of a theory ("frame": "heavy").
 * A heavy fermion is described by a two-component Pauli field (particle.name, default "psi"),
 * optionally with its antiparticle field (antiparticle.name, e.g. "chi"), coupled to the gauge
 * field of `gaugeGroup` and to every other gauge group under which it carries a charge or a
 * non-singlet representation (e.g. SU(3) × U(1) for a heavy quark in QCD and QED).
 * Building blocks: psi, psi†, D_t, spatial D, E, B and the Pauli matrices sigma.
 * maxOrder: highest power of 1/m enumerated (1..4).
 * imposeParity / imposeTimeReversal (default true): impose P and T on the operators.
 */
const NameSchema = z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,15}$/, {
  message: 'a name is a letter followed by up to 15 letters, digits or "_"',
})

export const HeavyParticleSchema = z.object({
  name: NameSchema,
  reps: z.record(NameSchema, z.array(z.number().int().min(0).max(8)).max(7)).optional(),
  charges: z
    .record(NameSchema, z.union([z.string().regex(/^-?(0|[1-9]\d{0,8})(\/[1-9]\d{0,8})?$/, { message: 'a charge is a rational written "p/q" or an integer, e.g. "1/6"' }), z.number().int()]))
    .optional(),
  description: z.string().max(200).optional(),
})

export const HeavyFrameSchema = z
  .object({
    particle: HeavyParticleSchema,
    antiparticle: z.object({ name: NameSchema }).optional(),
    gaugeGroup: NameSchema,
    maxOrder: z.number().int().min(1).max(4),
    imposeParity: z.boolean({ error: 'must be true or false' }).optional(),
    imposeTimeReversal: z.boolean({ error: 'must be true or false' }).optional(),
  })
  .superRefine((h, ctx) => {
    if (h.antiparticle && h.antiparticle.name === h.particle.name) {
      ctx.addIssue({
        code: 'custom',
        path: ['antiparticle', 'name'],
        message: `must differ from the particle field's name "${h.particle.name}"`,
      })
    }
  })

export type HeavyFrame = z.infer<typeof HeavyFrameSchema>
export type HeavyParticle = z.infer<typeof HeavyParticleSchema>
