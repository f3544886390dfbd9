import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { towerOf } from '../../../utils/db/towers'
import { gaugeTowerPath } from '../../../utils/scales/gaugeTower'
import { compute } from '../../../utils/compute/computePool'
import type { GaugeRunningInputs } from '../../../../shared/types/gaugeRunning'

// Everyone in the group reads what the running of the theory's own gauge couplings starts
// from: its running groups, its matter with the masses of the tower, suggested inputs. A tower
// the running cannot use comes back as `problem` (the page shows it), not as an error. The
// gauge content is read in the compute pool (remembered by input).
export default defineApiHandler(async (event): Promise<GaugeRunningInputs> => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { role, user } = await requireGroupRole(event, theory.group_id, 'viewer')
  const { steps, note } = gaugeTowerPath(await towerOf(theory), theory.id)
  const chain = steps.map(({ id, name, thresholdGeV }) => ({ id, name, thresholdGeV }))
  const inputs = await compute('gaugeInputs', steps, user.id, theory.group_id)
  return { theoryId: theory.id, role, chain, note, ...inputs }
})
