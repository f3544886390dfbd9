import { getRouterParam } from 'h3'
import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { theoryForShareToken } from '../../../utils/db/shareLinks'
import { latestBasisOf } from '../../../utils/db/bases'
import { sendExport } from '../../../utils/db/exports'

export default defineApiHandler(async (event) => {
  const theoryId = await theoryForShareToken(getRouterParam(event, 'token')!)
  const latest = await latestBasisOf(theoryId)
  if (!latest) fail(404, 'This theory has no basis yet')
  return sendExport(event, latest.id, `share:${theoryId}`)
})
