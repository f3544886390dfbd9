import { defineApiHandler } from '../../../utils/http/apiHandler'
import { intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { tagOr404 } from '../../../utils/db/tags'
import { restoreDeleted } from '../../../utils/db/softDelete'
import { touchBasesOfOperator } from '../../../utils/db/boardCache'

// Undo of a tag's removal, by those who may remove it.
export default defineApiHandler(async (event) => {
  const tag = await tagOr404(intParam(event, 'id'), { deleted: true })
  await requireGroupRole(event, tag.group_id, 'commenter')
  await restoreDeleted('tags', tag.id)
  await touchBasesOfOperator(tag.operator_id)
  return { restored: tag.id }
})
