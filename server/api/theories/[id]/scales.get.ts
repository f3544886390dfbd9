import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../utils/db/theories'
import { ladderOf } from '../../../utils/db/scaleLadders'
import { compute } from '../../../utils/compute/computePool'
import { frameOfDefinition } from '../../../utils/scales/ladderFrame'
import { EngineInputError } from '../../../engine/errors'
import { SCALE_UNITS } from '../../../../shared/physics/scaleUnits'

// Everyone in the group reads the scale ladder and its computed estimates (version 0: none saved yet).
// The estimates are computed in the compute pool and remembered by input (a stored ladder saved
// before the size budget existed may be over it: its problem is shown, and the read stays fast).
// It also answers the fermions' mass partners (which fields must be integrated out together),
// found in the compute pool from the theory file as the engine reads it (parseTheory).
export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  const { role, user } = await requireGroupRole(event, theory.group_id, 'viewer')
  const stored = await ladderOf(theory.id)
  const frame = frameOfDefinition(theory.definition)
  let computed = null
  let problem = ''
  try {
    computed = stored ? await compute('ladder', { doc: stored.ladder, frame }, user.id, theory.group_id) : null
  } catch (e) {
    // A stored ladder the engine refuses is shown with its message; anything else is a bug.
    if (!(e instanceof EngineInputError)) throw e
    problem = e.message
  }
  // For each fermion, the fields that can give it a mass: the integrate-out form ticks them along.
  const massPartners = await compute('massPartners', theory.definition, user.id, theory.group_id)
  return {
    massPartners,
    theory: { id: theory.id, name: theory.name, parentId: theory.parent_id },
    frame,
    role,
    ladder: stored?.ladder ?? null,
    version: stored?.version ?? 0,
    updatedAt: stored?.updatedAt ?? null,
    updatedBy: stored?.updatedBy ?? null,
    computed,
    problem,
    units: SCALE_UNITS,
  }
})
