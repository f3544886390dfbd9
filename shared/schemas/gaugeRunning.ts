import { z } from 'zod'
import { NAME_PATTERN } from './theory'

// The request of the running of a theory's own gauge couplings: α of every running group and
// the kinetic mixings at one scale, the loops, and the range to plot. Strict, with limits, so
// that one request asks for bounded work (the range of ln μ sets the number of steps).

const FOUR_PI = 4 * Math.PI
/** Scales accepted, GeV (the engine accepts the same range). */
export const GAUGE_RUNNING_MU_RANGE = [1e-9, 1e30] as const

const gev = (what: string) => z.number({ error: `${what} is a number of GeV` })
  .min(GAUGE_RUNNING_MU_RANGE[0], { error: `${what} must be at least ${GAUGE_RUNNING_MU_RANGE[0]} GeV` })
  .max(GAUGE_RUNNING_MU_RANGE[1], { error: `${what} must be at most ${GAUGE_RUNNING_MU_RANGE[1]} GeV` })

const GroupName = z.string({ error: 'a gauge group is named by text' }).regex(NAME_PATTERN, { error: 'a gauge group name is a letter followed by up to 15 letters, digits or "_"' })

export const GaugeRunningSchema = z.object({
  loops: z.union([z.literal(1), z.literal(2)], { error: 'loops: the running is at 1 or 2 loops' }),
  muFromGeV: gev('the scale of the inputs'),
  alpha: z.record(GroupName, z.number({ error: 'α is a number' }).gt(0, { error: 'α must be positive' }).lt(FOUR_PI, { error: 'α must be below 4π to be perturbative' }), { error: 'alpha: give α = g²/4π per gauge group, e.g. { "SU3c": 0.118 }' })
    .refine((a) => Object.keys(a).length <= 32, { error: 'alpha: at most 32 gauge groups' }),
  mixing: z.array(z.object({
    groups: z.tuple([GroupName, GroupName], { error: 'mixing: name the two U(1) groups, e.g. ["Y", "X"]' }),
    epsilon: z.number({ error: 'ε is a number' }).gt(-1, { error: 'ε must lie between −1 and 1' }).lt(1, { error: 'ε must lie between −1 and 1' }),
  }, { error: 'mixing: each entry is { groups, epsilon }' }).strict(), { error: 'mixing: a list of { groups, epsilon }' }).max(28, { error: 'mixing: at most 28 pairs' }).optional(),
  plotFromGeV: gev('the lowest plotted scale'),
  plotToGeV: gev('the highest plotted scale'),
  muToGeV: gev('the chosen scale').optional(),
}).strict().refine((r) => r.plotFromGeV < r.plotToGeV, { error: 'the lowest plotted scale must be below the highest', path: ['plotFromGeV'] })
export type GaugeRunningRequest = z.infer<typeof GaugeRunningSchema>
