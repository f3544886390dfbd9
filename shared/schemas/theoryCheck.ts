import { z } from 'zod'
import './zodMessages'

/**
 * POST /api/theory-check: the editor sends the theory it shows; the route validates it with
 * TheorySchema (400 naming the field at fault) and answers the failed gauge-anomaly conditions.
 * The theory is checked as a whole inside the route, so that its message lists every problem.
 */
export const TheoryCheckSchema = z
  .object({
    theory: z.record(z.string(), z.unknown(), { error: 'is required: a theory file (a JSON object)' }),
  })
  .strict()

export interface AnomalyFailure {
  /** e.g. "Y^3", "weak^2 Y", "gravity^2 Y", "weak Witten". */
  name: string
  /** The exact sum over left-handed Weyl fields, a rational string ("-3", "1/6"). */
  sum: string
  ok: false
}

export interface TheoryCheckReply {
  /** True when every gauge-anomaly condition holds. */
  ok: boolean
  /** One readable line per failed condition (empty when ok). */
  issues: string
  anomalies: AnomalyFailure[]
  /** How many conditions were checked (failed or not). */
  checked: number
}
