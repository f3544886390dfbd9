import { getQuery, getRouterParam } from 'h3'
import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { theoryForShareToken } from '../../../utils/db/shareLinks'
import { latestBasisOf } from '../../../utils/db/bases'
import { ordersUnderRule } from '../../../utils/db/ruleView'

export default defineApiHandler(async (event) => {
  const theoryId = await theoryForShareToken(getRouterParam(event, 'token')!)
  const latest = await latestBasisOf(theoryId)
  if (!latest) fail(404, 'This theory has no basis yet')
  const rule = getQuery(event).rule
  return ordersUnderRule(latest.id, typeof rule === 'string' && rule ? rule : undefined, `share:${theoryId}`)
})
