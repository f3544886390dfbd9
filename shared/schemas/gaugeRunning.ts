import { z } from 'zod'
import { NAME_PATTERN } from './theory'

// The request of the running of a theory's own gauge couplings: α of every running group and
// the kinetic mixings at one scale, the loops, and the range to plot. Strict, with limits, so
// that one request asks for bounded work (the range of ln μ sets the number of steps).

const FOUR_PI = 4 * Math.PI
/** Scales accepted, GeV (the engine accepts the same range). */
export const GAUGE_RUNNING_MU_RANGE = [1e-9, 1e30] as const

// Messages are predicates: the place ("Scale of the inputs", from fieldWords) goes in front.
const gev = () =>
  z
    .number({ error: 'is a number of GeV' })
    .min(GAUGE_RUNNING_MU_RANGE[0], { error: `must be at least ${GAUGE_RUNNING_MU_RANGE[0]} GeV` })
    .max(GAUGE_RUNNING_MU_RANGE[1], { error: `must be at most ${GAUGE_RUNNING_MU_RANGE[1]} GeV` })

const GroupName = z.string({ error: 'a gauge group is named by text' }).regex(NAME_PATTERN, { error: 'a gauge group name is a letter followed by up to 15 letters, digits or "_"' })

export const GaugeRunningSchema = z
  .object({
    loops: z.union([z.literal(1), z.literal(2)], { error: 'must be 1 or 2' }),
    muFromGeV: gev(),
    alpha: z
      .record(GroupName, z.number({ error: 'is a number' }).gt(0, { error: 'must be positive' }).lt(FOUR_PI, { error: 'must be below 4π to be perturbative' }), {
        error: 'is α = g²/4π per gauge group, e.g. { "colour": 0.118 }',
      })
      .refine((a) => Object.keys(a).length <= 32, { error: 'may name at most 32 gauge groups' }),
    mixing: z
      .array(
        z
          .object(
            {
              groups: z.tuple([GroupName, GroupName], { error: 'names the two U(1) groups, e.g. ["Y", "X"]' }),
              epsilon: z.number({ error: 'is a number' }).gt(-1, { error: 'must lie between −1 and 1' }).lt(1, { error: 'must lie between −1 and 1' }),
            },
            { error: 'is { groups, epsilon }' },
          )
          .strict(),
        { error: 'is a list of { groups, epsilon }' },
      )
      .max(28, { error: 'may hold at most 28 pairs' })
      .optional(),
    plotFromGeV: gev(),
    plotToGeV: gev(),
    muToGeV: gev().optional(),
  })
  .strict()
  .refine((r) => r.plotFromGeV < r.plotToGeV, { error: 'must be below the highest plotted scale', path: ['plotFromGeV'] })
export type GaugeRunningRequest = z.infer<typeof GaugeRunningSchema>
