import { defineApiHandler, fail } from '../../../utils/http/apiHandler'
import { readJson, intParam } from '../../../utils/http/readJson'
import { requireGroupRole } from '../../../utils/auth/currentUser'
import { theoryOr404, publicTheory } from '../../../utils/db/theories'
import { useDb } from '../../../utils/db/connection'
import { TheoryUpdateSchema } from '../../../../shared/schemas/theoryRequests'
import { once } from '../../../utils/http/requestKeys'

// Editors replace the theory file. The version check turns a concurrent edit into a 409
// that names the newer version instead of silently overwriting a collaborator's change; the
// same save sent twice (one request key) is done once and answered alike.
export default defineApiHandler(async (event) => {
  const id = intParam(event, 'id')
  const theory = await theoryOr404(id)
  const { user } = await requireGroupRole(event, theory.group_id, 'editor')
  const body = await readJson(event, TheoryUpdateSchema)
  return once(event, user.id, body, () => saveTheory(id, body))
})

async function saveTheory(id: number, body: { definition: { name: string }; version: number }) {
  const rows = await useDb()('theories')
    .where({ id, version: body.version })
    .whereNull('deleted_at')
    .update({ definition: JSON.stringify(body.definition), name: body.definition.name, version: body.version + 1, updated_at: useDb().fn.now() })
    .returning('*')
    .catch((e: { code?: string }) => {
      if (e.code === '23505') fail(409, `The group already has a theory named "${body.definition.name}"`)
      throw e
    })
  if (!rows.length) {
    const current = await theoryOr404(id)
    fail(409, `This theory changed meanwhile (now version ${current.version}, you edited version ${body.version}); reload and apply your change again`)
  }
  return { theory: publicTheory(rows[0]) }
}
