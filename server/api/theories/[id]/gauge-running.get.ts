import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { towerOf } from '../../../utils/db/towers'
import { gaugeTowerPath, parsedSteps } from '../../../utils/scales/gaugeTower'
import { gaugeRunningInputs } from '../../../utils/scales/gaugeInputs'
import { EngineError } from '../../../engine/errors'
import type { GaugeRunningInputs } from '../../../../shared/types/gaugeRunning'

// Everyone in the group reads what the running of the theory's own gauge couplings starts
// from: its running groups, its matter with the masses of the tower, suggested inputs. A tower
// the running cannot use comes back as `problem` (the page shows it), not as an error.
export default defineApiHandler(async (event): Promise<GaugeRunningInputs> => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { role } = await requireGroupRole(event, theory.group_id, 'viewer')
  const { steps, note } = gaugeTowerPath(await towerOf(theory), theory.id)
  const chain = steps.map(({ id, name, thresholdGeV }) => ({ id, name, thresholdGeV }))
  try {
    return { theoryId: theory.id, role, chain, note, problem: null, ...gaugeRunningInputs(parsedSteps(steps)) }
  } catch (e) {
    if (!(e instanceof EngineError)) throw e
    return { theoryId: theory.id, role, chain, note, problem: e.message, groups: [], multiplets: [], defaults: null, assumptions: [] }
  }
})
