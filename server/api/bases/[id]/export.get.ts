import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { basisOr404 } from '../../../utils/db/bases'
import { exportOfBasis, sendExport } from '../../../utils/db/exports'

export default defineApiHandler(async (event) => {
  const basis = await basisOr404(intParam(event, 'id'))
  await requireGroupRole(event, basis.group_id, 'viewer')
  return sendExport(event, await exportOfBasis(basis.id))
})
