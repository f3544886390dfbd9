import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { operatorOr404 } from '../../../utils/db/bases'
import { rewriteOntoKept } from '../../../utils/db/boardMath'

export default defineApiHandler(async (event) => {
  const op = await operatorOr404(intParam(event, 'id'))
  const { user } = await requireGroupRole(event, op.group_id, 'viewer')
  return { rewrite: await rewriteOntoKept(op.basis_id, op.class_key, op.id, { user: user.id, group: op.group_id }) }
})
