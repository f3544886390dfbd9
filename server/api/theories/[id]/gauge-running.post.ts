import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { intParam, readJson } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { towerOf } from '../../../utils/db/towers'
import { gaugeTowerPath } from '../../../utils/scales/gaugeTower'
import { startEngineTask } from '../../../worker/engineTask'
import { GaugeRunningSchema } from '../../../../shared/schemas/gaugeRunning'
import type { GaugeReport } from '../../../engine/running/gauge/report'

// The limit includes the start of the engine thread, which alone takes seconds on a loaded
// machine (10 s was exceeded by a 1-segment running under load); the running itself is bounded
// by the schema's range of scales.
const LIMIT_MS = 30_000

// Any member runs the theory's own gauge couplings (nothing is stored): exact coefficients per
// threshold segment, curves and tables, computed in an engine thread with a time limit.
export default defineApiHandler(async (event) => {
  const body = await readJson(event, GaugeRunningSchema)
  const theory = await theoryOr404(intParam(event, 'id'))
  await requireGroupRole(event, theory.group_id, 'viewer')
  const { steps } = gaugeTowerPath(await towerOf(theory), theory.id)
  const handle = startEngineTask<GaugeReport>({ kind: 'gauge-running', steps: steps.map(({ theory: t, thresholdGeV }) => ({ theory: t, thresholdGeV })), request: body }, () => {})
  const timer = setTimeout(() => handle.cancel(), LIMIT_MS)
  try {
    return await handle.result
  } catch (error) {
    if ((error as Error).name === 'EngineCancelledError') fail(422, `This running takes longer than ${LIMIT_MS / 1000} s; choose a smaller range of scales`)
    throw error
  } finally {
    clearTimeout(timer)
  }
})
