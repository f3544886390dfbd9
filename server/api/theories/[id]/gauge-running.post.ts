import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam, readJson } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { towerOf } from '../../../utils/db/towers'
import { gaugeTowerPath } from '../../../utils/scales/gaugeTower'
import { compute } from '../../../utils/compute/computePool'
import { GaugeRunningSchema } from '../../../../shared/schemas/gaugeRunning'
import type { GaugeReport } from '../../../../shared/types/gaugeRunning'

// Any member runs the theory's own gauge couplings (nothing is stored): exact coefficients per
// threshold segment, curves and tables, computed in the compute pool's running lane (one per
// person, two per group at a time, 429 beyond) within its time budget (422 beyond, saying to
// choose a smaller range of scales); equal requests are remembered.
export default defineApiHandler(async (event): Promise<GaugeReport> => {
  const body = await readJson(event, GaugeRunningSchema)
  const theory = await theoryOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, theory.group_id, 'viewer')
  const { steps } = gaugeTowerPath(await towerOf(theory), theory.id)
  return await compute('gaugeRunning', { steps, request: body }, user.id, theory.group_id)
})
