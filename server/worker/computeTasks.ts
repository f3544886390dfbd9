// The engine calls that routes make, by name. They run in the compute pool's threads
// (server/utils/compute/computePool.ts), never on the server's event loop.
import { computeLadder, ordersBelowTarget } from '../utils/scales/ladderEstimates'
import { qcdRunning, qedRunning } from '../utils/scales/runningCurves'
import { anomalyConditions } from '../engine/theory/anomalies'
import { integrateOut } from '../engine/scales/integrateOut'
import { countOperators } from '../engine/counting/countOperators'
import { typedFingerprints } from '../engine/board/typedOperator'
import { goldstoneTypedFingerprints, type GoldstoneTypedInput } from '../engine/goldstone/explicit/typedGoldstone'
import { enumerateHeavyTheory } from '../engine/heavy/enumerate'
import { heavyReport } from '../engine/heavy/report'
import { parseTheory } from '../engine/theory/parseTheory'
import { resolveCouplings } from '../engine/basis/orderZeroCouplings'
import { checkOperatorList } from '../engine/notation/checkList'
import { translationCsv, translationLatex } from '../engine/notation/exportCheck'
import { BOARD_TASKS } from './boardTasks'
import { SCALE_TASKS } from './scaleTasks'
import { TheorySchema, formatTheoryIssues, type Theory } from '../../shared/schemas/theory'
import { EngineInputError } from '../engine/errors'
import type { Priorities } from '../engine/basis/classBasis'
import type { LadderDocument, RunningQcdRequest, RunningQedRequest } from '../../shared/schemas/scaleRequests'

interface QuickCount {
  theory: unknown
  maxDim: number
  nf?: number
}

/** A quick count (the editor's): light theories by dimension, heavy-frame theories by order. */
function quickCount({ theory, maxDim, nf }: QuickCount) {
  const parsed = parseTheory(theory)
  if (parsed.frame === 'heavy') return { heavy: true, byOrder: heavyReport(enumerateHeavyTheory(parsed, {}), false) }
  return countOperators(parsed, { maxDim, nf, flavorPolynomials: true })
}

/** Integrate fields out of a stored theory file; the theory left below must itself be valid. */
function integrateOutChecked(a: { parent: unknown; fields: string[]; scale: Parameters<typeof integrateOut>[2] }) {
  const step = integrateOut(parseTheory(a.parent), a.fields, a.scale)
  const check = TheorySchema.safeParse(step.child)
  if (!check.success) throw new EngineInputError('integrateOut', `The theory left below the threshold would not be valid:\n${formatTheoryIssues(step.child, check.error.issues)}`)
  return step
}

export const COMPUTE_TASKS = {
  ladder: (a: { doc: LadderDocument; frame: string }) => computeLadder(a.doc, a.frame),
  ordersBelowTarget: (a: { doc: LadderDocument; orders: number[]; target: number; frame: string }) => ordersBelowTarget(a.doc, a.orders, a.target, a.frame),
  qcdRunning: (req: RunningQcdRequest) => qcdRunning(req),
  qedRunning: (req: RunningQedRequest) => qedRunning(req),
  anomalies: (theory: Theory) => anomalyConditions(theory),
  couplings: (theory: Theory) => resolveCouplings(theory),
  integrateOut: integrateOutChecked,
  quickCount,
  goldstoneTypedFingerprints: (a: { input: GoldstoneTypedInput; texts: string[] }) => goldstoneTypedFingerprints(a.input, a.texts),
  typedFingerprints: (a: { theory: unknown; classKey: string; texts: string[]; priorities?: Priorities }) => typedFingerprints(parseTheory(a.theory), a.classKey, a.texts, a.priorities),
  checkOperatorList: (a: { theory: unknown; dimension: number; texts: string[]; aliases?: Record<string, string>; priorities?: Priorities }) => {
    const report = checkOperatorList(parseTheory(a.theory), a.dimension, a.texts, { aliases: a.aliases, priorities: a.priorities })
    return { report, csv: translationCsv(report), latex: translationLatex(report) }
  },
  ...BOARD_TASKS,
  ...SCALE_TASKS,
}

export type ComputeKind = keyof typeof COMPUTE_TASKS
export type ComputeInput<K extends ComputeKind> = Parameters<(typeof COMPUTE_TASKS)[K]>[0]
export type ComputeOutput<K extends ComputeKind> = ReturnType<(typeof COMPUTE_TASKS)[K]>
