import { getRouterParam } from 'h3'
import { defineApiHandler, fail, created } from '../../../../utils/http/apiHandler'
import { readJson } from '../../../../utils/http/readJson'
import { requireGroupRole } from '../../../../utils/auth/currentUser'
import { groupBySlugOr404 } from '../../../../utils/db/groups'
import { publicTheory } from '../../../../utils/db/theories'
import { useDb } from '../../../../utils/db/connection'
import { TheoryCreateSchema } from '../../../../../shared/schemas/theoryRequests'
import { once } from '../../../../utils/http/requestKeys'

// Editors declare a new theory from a validated theory file (once per request key).
export default defineApiHandler(async (event) => {
  const group = await groupBySlugOr404(getRouterParam(event, 'slug')!)
  const { user } = await requireGroupRole(event, group.id, 'editor')
  const { definition } = await readJson(event, TheoryCreateSchema)
  return once(event, user.id, { definition }, async () => {
    const clash = await useDb()('theories').where({ group_id: group.id, name: definition.name }).whereNull('deleted_at').first('id')
    if (clash) fail(409, `The group already has a theory named "${definition.name}"`)
    const [row] = await useDb()('theories')
      .insert({ group_id: group.id, name: definition.name, definition: JSON.stringify(definition), created_by: user.id })
      .returning('*')
    created(event)
    return { theory: publicTheory(row) }
  })
})
