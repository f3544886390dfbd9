// The scale and tower pages' engine work (mass partners, matching and generated-class hints
// along a tower, the gauge running's inputs and the running itself), run in the compute pool's
// threads (computeTasks.ts), never on the event loop.
import { partnerMap } from '../engine/scales/massPartners'
import { generatedClassHints } from '../engine/scales/generatedClasses'
import { towerGaugeContent, type TowerStep } from '../engine/running/gauge/gaugeContent'
import { gaugeRunningReport, type GaugeReportRequest } from '../engine/running/gauge/report'
import { EngineError, EngineInputError } from '../engine/errors'
import { parseTheory } from '../engine/theory/parseTheory'
import { applicableMatching } from '../utils/scales/applicableMatching'
import { gaugeRunningInputs } from '../utils/scales/gaugeInputs'
import type { StoredTowerStep } from '../utils/scales/gaugeTower'

/**
 * For each fermion of a stored theory file, the fields that can give it a mass. A file the
 * engine no longer accepts (stored under older rules) has none: the ladder page still opens.
 */
function massPartners(theory: unknown): Record<string, string[]> {
  const parsed = storedTheory(theory)
  return parsed ? partnerMap(parsed) : {}
}

/** A stored theory file through the engine's reader; null when it was stored under older rules. */
function storedTheory(definition: unknown) {
  try {
    return parseTheory(definition)
  } catch (e) {
    if (e instanceof EngineInputError) return null
    throw e
  }
}

export interface TowerStepHintInput {
  parent: unknown
  removed: string[]
  scaleText: string
}
/** Per tower step below a threshold: the worked matching results that apply and the classes the removed fields generate. */
function towerHints(steps: TowerStepHintInput[]) {
  return steps.map(({ parent, removed, scaleText }) => {
    const theory = storedTheory(parent)
    if (!theory) return { matching: [], generatedClasses: [] }
    return {
      matching: applicableMatching(theory, removed, scaleText),
      generatedClasses: theory.fields.filter((f) => removed.includes(f.name)).flatMap((f) => generatedClassHints(f, theory.groups)),
    }
  })
}

/** Parse the stored theory files of a path (they were validated when stored). */
function parsedSteps(steps: readonly StoredTowerStep[]): TowerStep[] {
  return steps.map((s) => ({ theory: parseTheory(s.theory), thresholdGeV: s.thresholdGeV }))
}

/** The gauge running's inputs, or the engine's words for why the tower cannot run (shown by the page). */
function gaugeInputs(steps: StoredTowerStep[]) {
  try {
    return { problem: null, ...gaugeRunningInputs(parsedSteps(steps)) }
  } catch (e) {
    if (!(e instanceof EngineError)) throw e
    return { problem: e.message, groups: [], multiplets: [], defaults: null, assumptions: [] }
  }
}

/** The running of a tower's gauge couplings (curves, tables, exact coefficients per segment). */
function gaugeRunning({ steps, request }: { steps: StoredTowerStep[]; request: GaugeReportRequest }) {
  return gaugeRunningReport(towerGaugeContent(parsedSteps(steps)), request)
}

export const SCALE_TASKS = { massPartners, towerHints, gaugeInputs, gaugeRunning }
