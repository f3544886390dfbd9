import { defineApiHandler } from '../../../../utils/http/apiHandler'
import { intParam } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { theoryOr404 } from '../../../../utils/db/theories'
import { annotationsOfTheory } from '../../../../utils/db/annotations'

export default defineApiHandler(async (event) => {
  const theory = await theoryOr404(intParam(event, 'id'))
  await requireGroupRole(event, theory.group_id, 'viewer')
  return { annotations: await annotationsOfTheory(theory.id) }
})
